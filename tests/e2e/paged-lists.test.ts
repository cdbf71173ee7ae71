import { randomBytes } from 'node:crypto'
import { beforeAll, describe, expect, it } from 'vitest'
import { seedPeople } from '../../seed/seed-people'
import { browserRigPerFile, newPage, shot, signInAs, typeSlowly } from '../helpers/browser'

const rig = browserRigPerFile()
const tag = randomBytes(3).toString('hex')
beforeAll(async () => {
  await seedPeople(rig.t.services)
  // More customers than one page holds, all findable by the tag.
  for (let i = 0; i < 30; i++)
    await rig.t.services.companies.create({
      name: `Paging ${tag} ${String(i).padStart(2, '0')}`,
      kind: 'customer',
    })
})

const rowNames = (page: import('puppeteer-core').Page) =>
  page.$$eval('table tbody tr td:first-child a', (as) => as.map((a) => a.textContent?.trim()))

describe('the customers list, paged on the server, in Chromium on a portrait tablet', () => {
  it('shows one page of customers, searches on the server and turns to the next page', async () => {
    const page = await newPage(rig)
    await signInAs(page, rig.url, 'sales@quellnode.test', 'demo-sales-1')
    await page.goto(`${rig.url}/customers`)
    await page.waitForSelector('#customers-search')
    await typeSlowly(page, '#customers-search', tag)
    await page.waitForFunction(
      (t) =>
        [...document.querySelectorAll('table tbody tr td:first-child a')].every((a) =>
          a.textContent?.includes(t),
        ),
      {},
      tag,
    )
    const first = await rowNames(page)
    expect(first).toHaveLength(25)
    expect(first[0]).toBe(`Paging ${tag} 00`)
    await shot(page, 'customers-paged')
    await page.locator('button[aria-label="Next Page"]').click()
    await page.waitForFunction(
      (t) =>
        document.querySelector('table tbody tr td:first-child a')?.textContent?.trim() ===
        `Paging ${t} 25`,
      {},
      tag,
    )
    expect(await rowNames(page)).toEqual([25, 26, 27, 28, 29].map((i) => `Paging ${tag} ${i}`))
    await page.browserContext().close()
  })
})
