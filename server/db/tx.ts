import type { EntityManager } from 'typeorm'

/** A database transaction handed between repositories, so one story commits as one. */
export type Tx = EntityManager
