import { mkdirSync } from 'node:fs'
import { afterAll, beforeAll, describe, it } from 'vitest'
import type { Browser, Page } from 'puppeteer-core'
import { DEMO_USERS } from '../../seed/demo-people'
import type { Role } from '../../shared/schemas/auth'
import { SIZING_STEPS } from '../../src/features/sizing/steps'
import { makePaymentRig, type PaymentRig } from '../api/payments-rig'
import {
  launchBrowser,
  LANDSCAPE,
  newPage,
  PORTRAIT,
  shot,
  signInAs,
  SHOTS_DIR,
} from '../helpers/browser'
import { apiTraffic, demoChain, measureLayout, navigateInApp, type DemoChain } from './layout-rig'

let rig: PaymentRig
let browser: Browser
let ids: DemoChain
beforeAll(async () => {
  mkdirSync(SHOTS_DIR, { recursive: true })
  rig = await makePaymentRig({ CLIENT_DIR: 'dist/client' }, { solvedSizings: true })
  browser = await launchBrowser()
  ids = await demoChain(rig)
})
afterAll(async () => {
  await browser?.close()
  await rig?.close()
})

const PHONE = { width: 390, height: 844 }
const VIEWPORTS = [
  { name: 'portrait', size: PORTRAIT, tablet: true },
  { name: 'landscape', size: LANDSCAPE, tablet: true },
  { name: 'phone', size: PHONE, tablet: false },
]

/** Every route each role may open (as the router's meta says), with the demo chain's ids. */
function routesFor(role: Role): string[] {
  const office = [`/sites`, `/sites/${ids.siteId}`, `/sites/${ids.siteId}/records`, '/sizings']
  const steps = SIZING_STEPS.map((s) => `/sizings/${ids.sizingId}/${s.slug}`)
  const selling = [
    '/quotes',
    '/quotes/new',
    `/quotes/${ids.paidQuoteId}`,
    `/quotes/${ids.draftQuoteId}`,
    `/quotes/${ids.draftQuoteId}/edit`,
    '/customers',
    `/customers/${ids.companyId}`,
  ]
  const workshop = ['/work-orders', `/work-orders/${ids.workOrderId}`]
  const admin = ['/admin/users', '/admin/refunds', '/admin/catalogue', '/admin/tax', '/admin/audit']
  const byRole: Record<Role, string[]> = {
    engineer: [...office, `/sizings/new/structure?siteId=${ids.siteId}`, ...steps],
    sales: [...office, ...steps, ...selling],
    customer: ['/portal', `/portal/quotes/${ids.paidQuoteId}`, '/portal/payment/done'],
    production: workshop,
    admin: [
      ...office,
      `/sizings/new/structure?siteId=${ids.siteId}`,
      ...steps,
      ...selling,
      ...workshop,
      ...admin,
    ],
  }
  return ['/', ...byRole[role], '/no-such-page']
}

/**
 * Opens a route as the app's own links do (a full load only for a page's first route: reloading
 * the whole app for every route made this test CPU-bound) and waits until its heading shows and
 * its data and tables have loaded.
 */
async function visit(page: Page, path: string) {
  const settled = apiTraffic(page)
  if (!page.url().startsWith(rig.appUrl)) await page.goto(`${rig.appUrl}${path}`)
  else await navigateInApp(page, path)
  await page.waitForSelector('main :is(h1, [role="tablist"])')
  // a page that keeps a request open (a live preview) is measured after 5 s anyway
  await settled()
  await page.waitForFunction(() => !document.querySelector('.p-datatable-mask, .p-skeleton'))
}

/** Visits a route, saves its screenshot and answers what does not fit, in words. */
async function problemsOf(page: Page, path: string, label: string, tablet: boolean) {
  await visit(page, path)
  const m = await measureLayout(page)
  // what the person sees first (a full-page capture of every route costs a minute per role)
  await shot(page, `layout-${label}-${path.replace(/\W+/g, '_')}`, false)
  const found: string[] = []
  if (m.scrollWidth > m.width) found.push(`${path}: page ${m.scrollWidth} px on ${m.width} px`)
  for (const c of m.offscreen) found.push(`${path}: ${c} off-screen`)
  // one row of header: the touch-size controls and the bar's padding, nothing wrapped
  if (m.headerHeight > 72) found.push(`${path}: header ${m.headerHeight} px high`)
  if (tablet && m.tabRows > 1) found.push(`${path}: step bar on ${m.tabRows} rows`)
  return found
}

// Every viewport and role in its own browser context, a few at a time (the e2e project's
// maxConcurrency): the visits mostly wait for the page, so they overlap well.
describe.concurrent('every screen fits a tablet in both orientations and a phone', () => {
  for (const v of VIEWPORTS) {
    const screen = `a ${v.name} screen (${v.size.width}×${v.size.height})`
    it(`fits the pages a signed-out visitor sees on ${screen}`, async ({ expect }) => {
      const page = await newPage({ browser }, v.size)
      const found: string[] = []
      for (const path of ['/sign-in', '/forgot-password', '/set-password?token=x']) {
        found.push(...(await problemsOf(page, path, `${v.name}-visitor`, v.tablet)))
      }
      await page.browserContext().close()
      expect(found).toEqual([])
    })

    for (const demo of DEMO_USERS) {
      it(`fits every page the ${demo.role} may open on ${screen}, with the header on one row`, async ({
        expect,
      }) => {
        const page = await newPage({ browser }, v.size)
        await signInAs(page, rig.appUrl, demo.email, demo.password)
        const found: string[] = []
        for (const path of routesFor(demo.role)) {
          found.push(...(await problemsOf(page, path, `${v.name}-${demo.role}`, v.tablet)))
        }
        await page.browserContext().close()
        expect(found).toEqual([])
      }, 240_000)
    }
  }
})
