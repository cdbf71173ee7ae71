import { beforeAll, describe, expect, it } from 'vitest'
import type { Role } from '../../shared/schemas/auth'
import { seedPeople } from '../../seed/seed-people'
import { DEMO_USERS } from '../../seed/demo-people'
import { navLabels, navigate, newPage, shot, signInAs, browserRigPerFile } from '../helpers/browser'

/**
 * What each role finds in the menu, written out by hand rather than read from the access table
 * the client renders, so that a change of access shows up here as a deliberate edit.
 */
const MENU_BY_ROLE: Record<Role, string[]> = {
  engineer: ['Overview', 'Sites', 'Sizings'],
  sales: ['Overview', 'Sites', 'Sizings', 'Quotes', 'Customers'],
  customer: ['Overview', 'My quotes'],
  production: ['Overview', 'Work orders'],
  admin: [
    'Overview',
    'Sites',
    'Sizings',
    'Quotes',
    'Customers',
    'Catalogue',
    'Users',
    'Refunds',
    'Tax rates',
    'Audit trail',
    'Work orders',
  ],
}

const rig = browserRigPerFile()
beforeAll(async () => {
  await seedPeople(rig.t.services)
})

describe('navigation by role, in Chromium on a portrait tablet', () => {
  for (const demo of DEMO_USERS) {
    it(`shows the ${demo.role} their own menu, and every entry in it opens`, async () => {
      const page = await newPage(rig)
      await signInAs(page, rig.url, demo.email, demo.password)
      const labels = MENU_BY_ROLE[demo.role]
      expect(await navLabels(page)).toEqual(labels)
      await shot(page, `roles-${demo.role}`)
      for (const label of labels) {
        await navigate(page, label)
        // the route guard lets the role in (the entry turns active) or refuses (not-found page)
        await page.waitForFunction(
          (l) =>
            document.title.startsWith('Not found') ||
            [...document.querySelectorAll('nav[aria-label="Main"] a.active')].some(
              (a) => a.textContent?.trim() === l,
            ),
          {},
          label,
        )
        expect(await page.title(), `${demo.role} opening ${label}`).not.toContain('Not found')
      }
      await page.browserContext().close()
    })
  }

  it('sends a signed-out visitor to the sign-in page and a wrong role to the not-found page', async () => {
    const page = await newPage(rig)
    await page.goto(`${rig.url}/admin/users`)
    await page.waitForSelector('#email')
    expect(page.url()).toContain('/sign-in?next=')
    const engineer = DEMO_USERS.find((u) => u.role === 'engineer')!
    await signInAs(page, rig.url, engineer.email, engineer.password)
    await page.goto(`${rig.url}/admin/users`)
    await page.waitForSelector('h1')
    expect(await page.$eval('h1', (h) => h.textContent)).toBe('Nothing here')
    await page.browserContext().close()
  })

  it('shows the wrong-password message on the sign-in page', async () => {
    const page = await newPage(rig)
    await page.goto(`${rig.url}/sign-in`)
    await page.locator('#email').fill('admin@quellnode.test')
    await page.locator('#password').fill('not-the-password')
    await page.locator('button[type="submit"]').click()
    const alert = await page.waitForSelector('[role="alert"]')
    expect(await alert!.evaluate((e) => e.textContent)).toContain('wrong')
    await shot(page, 'sign-in-error')
    await page.browserContext().close()
  })

  it('shows the sign-in page, never the previous user, when Back is pressed after signing out', async () => {
    const page = await newPage(rig)
    const engineer = DEMO_USERS.find((u) => u.role === 'engineer')!
    await signInAs(page, rig.url, engineer.email, engineer.password)
    const name = await page.$eval('header .name', (e) => e.textContent ?? '')
    await navigate(page, 'Sizings')
    await page.waitForSelector('#sizings-search')
    await page.locator('button ::-p-text(Sign out)').click()
    await page.waitForSelector('#email')
    await page.goBack()
    await page.waitForSelector('#email')
    expect(page.url()).toContain('/sign-in')
    expect(await page.$('nav[aria-label="Main"]')).toBeNull()
    expect(await page.$eval('body', (b) => b.textContent ?? '')).not.toContain(name)
    await page.reload()
    await page.waitForSelector('#email')
    expect(await page.$eval('body', (b) => b.textContent ?? '')).not.toContain(name)
    await shot(page, 'sign-out-back')
    await page.browserContext().close()
  })
})
