/** Settings every API and browser test shares; the database name comes from the global setup. */
export function testEnv(dbName: string, extra: Record<string, string> = {}): NodeJS.ProcessEnv {
  return {
    ...process.env,
    NODE_ENV: 'test',
    LOG_LEVEL: 'silent',
    DB_NAME: dbName,
    DB_PASSWORD: process.env.DB_PASSWORD ?? '',
    JWT_SECRET: process.env.JWT_SECRET ?? 'test-secret-test-secret-test-secret-0123',
    UPLOAD_DIR: '.local/test-uploads',
    // bcrypt's cheapest cost: every test signs people in (server/config.ts, PASSWORD_HASH_COST)
    PASSWORD_HASH_COST: '4',
    // Every test request comes from 127.0.0.1 and the counters are shared in the database:
    // per-address allowances are wide here; the rate-limit tests set their own.
    SIGN_IN_ADDRESS_LIMIT: '10000',
    RESET_ADDRESS_LIMIT: '10000',
    INVITE_ADDRESS_LIMIT: '10000',
    ...extra,
  }
}
