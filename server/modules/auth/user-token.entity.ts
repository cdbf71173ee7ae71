import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm'
import { CreatedRecord } from '../../db/record-columns'

/** A single-use link token (invitation or password reset); only its SHA-256 is stored. */
@Entity('user_tokens')
export class UserTokenEntity extends CreatedRecord {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('int')
  userId: number

  @Column('varchar', { length: 16 })
  purpose: 'invite' | 'reset'

  @Index({ unique: true })
  @Column('char', { length: 64 })
  tokenHash: string

  @Column('datetime', { precision: 3 })
  expiresAt: Date

  @Column('datetime', { precision: 3, nullable: true })
  usedAt: Date | null
}
