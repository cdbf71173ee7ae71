import type { Role } from '../../../shared/schemas/auth'

/** A user account as sign-in sees it: who, the password hash and the session version. */
export interface Account {
  id: number
  email: string
  name: string
  role: Role
  passwordHash: string | null
  active: boolean
  tokenVersion: number
  companyId: number | null
  companyName: string | null
}

/**
 * What auth needs of the user accounts. The users module owns them; the composition root hands
 * its store in, so auth never imports the users module.
 */
export interface AccountStore {
  findById(id: number): Promise<Account | null>
  findByEmail(email: string): Promise<Account | null>
  update(id: number, patch: { passwordHash: string }): Promise<void>
  /** Ends every session of the user at once (raises the token version). */
  endSessions(id: number): Promise<void>
}
