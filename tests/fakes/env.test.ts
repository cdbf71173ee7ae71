import { describe, expect, it } from 'vitest'
import { loadFakesConfig } from '../../fakes/env'

describe('fakes configuration', () => {
  it('uses the documented defaults when nothing is set', () => {
    expect(loadFakesConfig({})).toEqual({
      PAYMENTS_FAKE_PORT: 4310,
      MAIL_SMTP_PORT: 4325,
      MAIL_WEB_PORT: 4380,
      PAYMENTS_SECRET_KEY: 'sk_test_quellnode',
      PAYMENTS_WEBHOOK_SECRET: 'whsec_quellnode',
      PAYMENTS_WEBHOOK_URL: 'http://127.0.0.1:4300/api/payments/webhook',
      PAYMENTS_PUBLIC_URL: 'http://127.0.0.1:4310',
    })
  })

  it('lets the pay page URL follow a changed payments port', () => {
    expect(loadFakesConfig({ PAYMENTS_FAKE_PORT: '5010' }).PAYMENTS_PUBLIC_URL).toBe(
      'http://127.0.0.1:5010',
    )
  })

  it('names the field of a bad port', () => {
    expect(() => loadFakesConfig({ MAIL_SMTP_PORT: '70000' })).toThrow(/MAIL_SMTP_PORT/)
  })
})
