import { describe, expect, it } from 'vitest'
import { loadConfig } from '../../server/config'

const base = { JWT_SECRET: 'a-secret-of-thirty-two-characters-or-more' }

describe('the password hash cost', () => {
  it('is 10 unless set', () => {
    expect(loadConfig(base).PASSWORD_HASH_COST).toBe(10)
  })

  it('refuses a cheap cost in production, naming the setting, and allows it elsewhere', () => {
    expect(() => loadConfig({ ...base, NODE_ENV: 'production', PASSWORD_HASH_COST: '4' })).toThrow(
      /PASSWORD_HASH_COST: at least 10 in production/,
    )
    expect(
      loadConfig({ ...base, NODE_ENV: 'test', PASSWORD_HASH_COST: '4' }).PASSWORD_HASH_COST,
    ).toBe(4)
    expect(() => loadConfig({ ...base, PASSWORD_HASH_COST: '3' })).toThrow(/PASSWORD_HASH_COST/)
  })
})
