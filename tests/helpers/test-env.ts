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
    ...extra,
  }
}
