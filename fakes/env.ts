import { z } from 'zod'

const port = z.coerce.number().int().min(0).max(65535)

const FakesEnvSchema = z.object({
  PAYMENTS_FAKE_PORT: port.default(4310),
  MAIL_SMTP_PORT: port.default(4325),
  MAIL_WEB_PORT: port.default(4380),
  PAYMENTS_SECRET_KEY: z.string().min(1).default('sk_test_quellnode'),
  PAYMENTS_WEBHOOK_SECRET: z.string().min(1).default('whsec_quellnode'),
  PAYMENTS_WEBHOOK_URL: z.url().default('http://127.0.0.1:4300/api/payments/webhook'),
  PAYMENTS_PUBLIC_URL: z.url().optional(),
})

export type FakesConfig = z.infer<typeof FakesEnvSchema> & { PAYMENTS_PUBLIC_URL: string }

/**
 * Reads the fakes' settings from the environment; a bad value fails with one line per field.
 * The pay page's public URL follows the payments port unless set.
 */
export function loadFakesConfig(env: NodeJS.ProcessEnv = process.env): FakesConfig {
  const parsed = FakesEnvSchema.safeParse(env)
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`)
    throw new Error(`Invalid fakes configuration:\n${lines.join('\n')}`)
  }
  const c = parsed.data
  return {
    ...c,
    PAYMENTS_PUBLIC_URL: c.PAYMENTS_PUBLIC_URL ?? `http://127.0.0.1:${c.PAYMENTS_FAKE_PORT}`,
  }
}
