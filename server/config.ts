import { z } from 'zod'

const bool = z
  .enum(['true', 'false', '1', '0'])
  .transform((v) => v === 'true' || v === '1')
  .optional()

const port = z.coerce.number().int().min(0).max(65535)
const count = (fallback: number) => z.coerce.number().int().min(1).default(fallback)
const ms = (fallback: number) => z.coerce.number().int().min(10).default(fallback)

/**
 * Which proxies to believe about the client's address (Express's `trust proxy`): off unless
 * set, so a client cannot pick its own address with X-Forwarded-For. A hop count ("1") or a
 * comma list of addresses, subnets or the names loopback, linklocal, uniquelocal; "true"
 * (believe anyone) is refused.
 */
const trustProxy = z
  .string()
  .trim()
  .default('false')
  .refine((v) => v !== 'true', 'name the proxies or give a hop count; "true" trusts anyone')
  .transform((v): false | number | string[] => {
    if (v === '' || v === 'false' || v === '0') return false
    if (/^[0-9]+$/.test(v)) return Number(v)
    return v.split(',').map((x) => x.trim())
  })

const MIN_PRODUCTION_HASH_COST = 10

const EnvSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: port.default(4300),
  PUBLIC_URL: z.url().optional(),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  DB_HOST: z.string().default('127.0.0.1'),
  DB_PORT: port.default(3307),
  DB_USER: z.string().default('app'),
  DB_PASSWORD: z.string().default(''),
  DB_NAME: z
    .string()
    .regex(/^[A-Za-z0-9_]+$/, 'letters, digits and _ only')
    .default('quellnode'),
  JWT_SECRET: z.string().min(32, 'at least 32 characters'),
  TOKEN_TTL_HOURS: z.coerce.number().positive().default(12),
  /**
   * bcrypt's cost (2^cost rounds per password hash); at least 10 in production. The tests use 4
   * (common practice: a test suite hashes hundreds of passwords and proves nothing by slowness).
   */
  PASSWORD_HASH_COST: z.coerce.number().int().min(4).max(15).default(10),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: port.default(4325),
  SMTP_SECURE: bool,
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  MAIL_FROM: z.string().default('Quellnode <no-reply@quellnode.test>'),
  MAILBOX_URL: z.url().default('http://127.0.0.1:4380'),
  STRIPE_SECRET_KEY: z.string().default('sk_test_quellnode'),
  STRIPE_WEBHOOK_SECRET: z.string().default('whsec_quellnode'),
  STRIPE_API_HOST: z.string().optional(),
  STRIPE_API_PORT: port.optional(),
  STRIPE_API_PROTOCOL: z.enum(['http', 'https']).optional(),
  UPLOAD_DIR: z.string().default('.local/uploads'),
  CHROMIUM_PATH: z.string().default('/usr/bin/chromium'),
  WORKER_THREADS: z.coerce.number().int().min(1).max(16).default(2),
  /** engine jobs waiting for a worker thread; one more is refused with 503 and Retry-After */
  ENGINE_QUEUE_LIMIT: z.coerce.number().int().min(0).max(1000).default(8),
  /** ms an engine job (a sizing, a record's identification) may take before it is cancelled */
  ENGINE_BUDGET_MS: z.coerce.number().int().min(100).max(600_000).default(60_000),
  /** how far below the event loop the engine's threads are scheduled (nice increment, Linux) */
  ENGINE_NICE: z.coerce.number().int().min(0).max(19).default(10),
  TRUST_PROXY: trustProxy,
  /** failed sign-ins per account, and per client address, within 15 minutes */
  SIGN_IN_LIMIT: count(5),
  SIGN_IN_ADDRESS_LIMIT: count(20),
  /** reset requests per account, and per client address, within an hour */
  RESET_LIMIT: count(3),
  RESET_ADDRESS_LIMIT: count(10),
  /** invitations per invited address within a day, and per client address within an hour */
  INVITE_LIMIT: count(5),
  INVITE_ADDRESS_LIMIT: count(30),
  /** how often open payment sessions are checked with the payment service */
  RECONCILE_INTERVAL_MS: ms(60_000),
  /** how often the mail outbox is looked at for mail due (new mail is sent at once anyway) */
  OUTBOX_INTERVAL_MS: ms(5_000),
  CLIENT_DIR: z.string().default('dist/client'),
})

export type Config = z.infer<typeof EnvSchema> & { publicUrl: string }

const DbEnvSchema = EnvSchema.pick({
  DB_HOST: true,
  DB_PORT: true,
  DB_USER: true,
  DB_PASSWORD: true,
  DB_NAME: true,
})
export type DbConfig = z.infer<typeof DbEnvSchema>

/** The database part alone, for the migration command line, which needs no other setting. */
export function loadDbConfig(env: NodeJS.ProcessEnv = process.env): DbConfig {
  return DbEnvSchema.parse(env)
}

/**
 * Parses the environment once. A wrong value stops the process with one line per field,
 * before anything listens or connects.
 */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = EnvSchema.safeParse(env)
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`)
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`)
  }
  const c = parsed.data
  if (c.NODE_ENV === 'production' && c.PASSWORD_HASH_COST < MIN_PRODUCTION_HASH_COST)
    throw new Error(
      `Invalid configuration:\n  PASSWORD_HASH_COST: at least ${MIN_PRODUCTION_HASH_COST} in production`,
    )
  return { ...c, publicUrl: c.PUBLIC_URL ?? `http://${c.HOST}:${c.PORT}` }
}
