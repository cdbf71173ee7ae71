import { randomBytes } from 'node:crypto'
import type { TestApp } from './app'

/** A fresh customer company. */
export async function makeCompany(t: TestApp, kind: 'customer' | 'supplier' = 'customer') {
  return t.services.companies.create({ name: `Company ${randomBytes(4).toString('hex')}`, kind })
}

export function siteBody(companyId: number, overrides: Record<string, unknown> = {}) {
  return {
    name: `Level 3 office floor ${randomBytes(2).toString('hex')}`,
    companyId,
    address: '1 Harbour Row',
    structureKind: 'floor',
    contactName: 'Site manager',
    ...overrides,
  }
}

/** The smallest valid PNG (1×1), for photo uploads. */
export const TINY_PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==',
  'base64',
)
