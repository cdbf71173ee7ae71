import { describe, expect, it } from 'vitest'
import type { Page } from 'puppeteer-core'
import { toAuthUser } from '../../server/modules/auth/auth.service'
import { browserRigPerFile, mainText, pageSignedInAs, shot, waitForText } from '../helpers/browser'
import { makeUser } from '../helpers/factories'
import { makeCompany } from '../helpers/records'

const rig = browserRigPerFile()

/** A fresh engineer and a site of theirs (invented). */
async function engineerWithSite() {
  const engineer = await makeUser(rig.t, 'engineer')
  const user = toAuthUser((await rig.t.services.users.findByEmail(engineer.email))!)
  const site = await rig.t.services.sites.create(user, {
    name: `Start-from-site floor ${engineer.id}`,
    companyId: (await makeCompany(rig.t)).id,
    structureKind: 'floor',
    address: '',
    contactName: '',
    contactPhone: '',
    notes: '',
  })
  return { engineer, site }
}

/** The workspace at an address, once it has stopped loading: the reason shown, or the form. */
async function opened(page: Page, address: string) {
  await page.goto(`${rig.url}${address}`)
  await page.waitForSelector('.workspace [role="alert"], #sizing-title')
  expect(await page.$('[aria-label="Loading"]')).toBeNull()
  return mainText(page)
}

describe('starting a new sizing from an address', () => {
  it('says a new sizing starts from a site, and links to the sites, when the address names none, a mangled one or an unknown one', async () => {
    const { engineer } = await engineerWithSite()
    const page = await pageSignedInAs(rig, engineer)

    expect(await opened(page, '/sizings/new/target')).toContain(
      'A new sizing starts from a site: open the site, then start it there.',
    )
    await shot(page, 'sizing-start-without-site')
    expect(await opened(page, '/sizings/new/absorber?siteId=abc')).toContain(
      '"abc" is not a site number',
    )
    // MAX_ID in shared/schemas/ids.ts: a well-formed id that no site has
    expect(await opened(page, '/sizings/new/results?siteId=2147483647')).toContain(
      'The site does not exist or is not yours to see.',
    )
    await page.locator('::-p-aria([name="Go to the sites"][role="link"])').click()
    await page.waitForFunction(() => location.pathname === '/sites')
    await page.browserContext().close()
  })

  it('opens the new sizing on its site, and a reload that lost the site offers the unsaved draft again', async () => {
    const { engineer, site } = await engineerWithSite()
    const page = await pageSignedInAs(rig, engineer)
    await opened(page, `/sizings/new/structure?siteId=${site.id}`)
    await waitForText(page, site.name)
    await page.locator('#sizing-title').fill('Bay D floor absorber')
    await waitForText(page, 'Unsaved changes')

    expect(await opened(page, '/sizings/new/target')).toContain(
      'Unsaved new sizings on this tablet',
    )
    await shot(page, 'sizing-start-kept-draft')
    await page.locator('::-p-aria([name="Bay D floor absorber"][role="link"])').click()
    await page.waitForSelector('#sizing-title')
    expect(page.url()).toBe(`${rig.url}/sizings/new/target?siteId=${site.id}`)
    expect(await page.$eval('#sizing-title', (e) => (e as HTMLInputElement).value)).toBe(
      'Bay D floor absorber',
    )
    await page.browserContext().close()
  })
})
