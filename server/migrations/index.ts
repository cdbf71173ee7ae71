import { Foundation1796194970085 } from './1796194970085-Foundation'
import { Sites1796195382472 } from './1796195382472-Sites'

/** Every migration class in order; a new migration is added here too. */
export const migrations = [Foundation1796194970085, Sites1796195382472]
