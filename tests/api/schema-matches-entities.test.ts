import 'reflect-metadata'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { inject } from 'vitest'
import type { DataSource } from 'typeorm'
import { loadDbConfig } from '../../server/config'
import { createDataSource } from '../../server/data-source'
import { testEnv } from '../helpers/test-env'

let ds: DataSource
beforeAll(async () => {
  ds = await createDataSource(loadDbConfig(testEnv(inject('dbName')))).initialize()
})
afterAll(() => ds.destroy())

describe('database schema', () => {
  it('the migrated database is exactly what the entities describe, so no change is pending', async () => {
    const pending = await ds.driver.createSchemaBuilder().log()
    expect(pending.upQueries.map((q) => q.query)).toEqual([])
  })
})
