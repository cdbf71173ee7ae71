import { Column, Entity, Index } from 'typeorm'
import { NumberedCreatedRecord } from '../../db/record-columns'
import { IntColumn, MomentColumn, VarcharColumn } from '../../db/columns'

/** A single-use link token (invitation or password reset); only its SHA-256 is stored. */
@Entity('user_tokens')
export class UserTokenEntity extends NumberedCreatedRecord {
  @IntColumn() userId: number
  @VarcharColumn(16) purpose: 'invite' | 'reset'

  @Index({ unique: true })
  @Column('char', { length: 64 })
  tokenHash: string

  @MomentColumn() expiresAt: Date
  @MomentColumn({ nullable: true }) usedAt: Date | null
}
