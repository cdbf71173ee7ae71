import { createHash } from 'node:crypto'
import { RateLimiterMySQL, RateLimiterRes } from 'rate-limiter-flexible'
import type { DataSource } from 'typeorm'
import { AppError } from '../http/app-error'

/** So many attempts within so many seconds. */
export interface Allowance {
  points: number
  seconds: number
}

/** What one action allows per account (an e-mail address) and per client address. */
export interface LimitRule {
  account: Allowance
  address: Allowance
  message: string
}

export interface ThrottleKeys {
  /** The e-mail address the attempt is about (normalised lower-case). */
  account: string
  /** The client's address as Express sees it (trust proxy decides). */
  address: string
}

/** The table the migration made; counters live in MariaDB so every instance shares them. */
const TABLE = 'rate_limits'

// Stored hashed: the counter table need not hold people's addresses in plain text.
const hashed = (value: string) => createHash('sha256').update(value).digest('hex')

function tooMany(rule: LimitRule, res: RateLimiterRes) {
  const retryAfterSeconds = Math.max(1, Math.ceil(res.msBeforeNext / 1000))
  return new AppError('too-many-attempts', rule.message, 429, { retryAfterSeconds })
}

/**
 * Counters per account and per client address for one action, kept with
 * rate-limiter-flexible's MySQL store on the app's own mysql2 pool: one atomic
 * INSERT … ON DUPLICATE KEY UPDATE per count, so two instances count together.
 */
export function throttle(ds: DataSource, dbName: string, name: string, rule: LimitRule) {
  const pool = (ds.driver as unknown as { pool: unknown }).pool
  const limiter = (kind: 'account' | 'address', a: Allowance) =>
    new RateLimiterMySQL({
      storeClient: pool,
      storeType: 'pool',
      dbName,
      tableName: TABLE,
      tableCreated: true,
      clearExpiredByTimeout: false,
      keyPrefix: `${name}:${kind}`,
      points: a.points,
      duration: a.seconds,
    })
  const account = limiter('account', rule.account)
  const address = limiter('address', rule.address)
  const pairs = (k: ThrottleKeys) =>
    [
      [account, hashed(k.account), rule.account.points],
      [address, hashed(k.address), rule.address.points],
    ] as const

  return {
    /** Refuses (429) when the account or the address has used up its attempts; counts nothing. */
    async assertOpen(keys: ThrottleKeys) {
      for (const [l, key, points] of pairs(keys)) {
        const res = await l.get(key)
        if (res && res.consumedPoints >= points) throw tooMany(rule, res)
      }
    },
    /** Counts one attempt for the account and the address; 429 when it is one too many. */
    async take(keys: ThrottleKeys) {
      let over: RateLimiterRes | null = null
      for (const [l, key] of pairs(keys)) {
        // consume() rejects with the counter itself once it is past the allowance.
        await l.consume(key).catch((e: unknown) => {
          if (!(e instanceof RateLimiterRes)) throw e
          over ??= e
        })
      }
      if (over) throw tooMany(rule, over)
    },
    /** Forgets the account's count, after a good sign-in. */
    async forgive(accountKey: string) {
      await account.delete(hashed(accountKey))
    },
  }
}
export type Throttle = ReturnType<typeof throttle>

/** Removes counters whose window ended more than an hour ago; run by the housekeeping loop. */
export async function clearExpiredLimits(ds: DataSource, nowMs: number) {
  await ds.query(`DELETE FROM \`${TABLE}\` WHERE \`expire\` < ?`, [nowMs - 3600_000])
}
