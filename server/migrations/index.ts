import { Foundation1796194970085 } from './1796194970085-Foundation'

/** Every migration class in order; a new migration is added here too. */
export const migrations = [Foundation1796194970085]
