/** A throwaway, migrated database `app_test_bench_*` on the private MariaDB, dropped afterwards. */
import 'reflect-metadata'
import { randomBytes } from 'node:crypto'
import { loadDbConfig } from '../../config'
import { createDataSource } from '../../data-source'

export async function throwawayDatabase() {
  const name = `app_test_bench_${randomBytes(4).toString('hex')}`
  const db = loadDbConfig(process.env)
  const admin = await createDataSource({ ...db, DB_NAME: 'information_schema' }).initialize()
  await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`)
  const ds = await createDataSource({ ...db, DB_NAME: name }).initialize()
  await ds.runMigrations()
  await ds.destroy()
  return {
    name,
    drop: async () => {
      await admin.query(`DROP DATABASE IF EXISTS \`${name}\``)
      await admin.destroy()
    },
  }
}
