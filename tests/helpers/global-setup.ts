import 'reflect-metadata'
import { randomBytes } from 'node:crypto'
import type { TestProject } from 'vitest/node'
import { loadDbConfig } from '../../server/config'
import { createDataSource } from '../../server/data-source'

declare module 'vitest' {
  export interface ProvidedContext {
    dbName: string
  }
}

/**
 * Makes a throwaway database (the app user may create `app_test_*`), migrates it, hands its name
 * to the tests and drops it afterwards.
 */
export default async function setup(project: TestProject) {
  const dbName = `app_test_${randomBytes(4).toString('hex')}`
  const db = loadDbConfig(process.env)
  const admin = createDataSource({ ...db, DB_NAME: 'information_schema' })
  await admin.initialize()
  await admin.query(
    `CREATE DATABASE \`${dbName}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
  )
  const ds = await createDataSource({ ...db, DB_NAME: dbName }).initialize()
  await ds.runMigrations()
  await ds.destroy()
  project.provide('dbName', dbName)
  return async () => {
    await admin.query(`DROP DATABASE IF EXISTS \`${dbName}\``)
    await admin.destroy()
  }
}
