import request from 'supertest'
import type { HTTPRequest, Page } from 'puppeteer-core'
import { toAuthUser } from '../../server/modules/auth/auth.service'
import { seedPeople } from '../../seed/seed-people'
import { DEMO_OFFICE_SITE, DEMO_OFFICE_SIZING, seedSizings } from '../../seed/seed-sizings'
import { CUSTOMERS, DEMO_USERS } from '../../seed/demo-people'
import type { Role } from '../../shared/schemas/auth'
import type { PaymentRig } from '../api/payments-rig'
import { catalogueIds, daysFromNow } from '../api/quotes-rig'

/** Signs a demo user in on a supertest agent of the rig's app. */
export async function demoAgent(rig: PaymentRig, role: Role) {
  const demo = DEMO_USERS.find((u) => u.role === role)!
  const agent = request.agent(rig.t.app)
  await agent.post('/api/auth/sign-in').send({ email: demo.email, password: demo.password })
  return agent
}

/**
 * The demo scenario carried through the whole chain with real sizings: the office sizing quoted
 * to the demo customer, accepted, paid on the fake's page, so a work order exists; and a second
 * quote left as a draft. Answers the ids every detail route needs.
 */
export async function demoChain(rig: PaymentRig) {
  const s = rig.t.services
  const { companyIds } = await seedPeople(s)
  await seedSizings(s, { companyIds })
  const admin = toAuthUser((await s.users.findByEmail('admin@quellnode.test'))!)
  const [sizing] = await s.sizings.list(admin, { search: DEMO_OFFICE_SIZING })
  const [site] = await s.sites.list({ search: DEMO_OFFICE_SITE })
  const companyId = companyIds.get(CUSTOMERS[0].name)!
  const sales = await demoAgent(rig, 'sales')
  const contact = await sales
    .post(`/api/customers/${companyId}/contacts`)
    .send({ name: 'Priya Halloran', email: 'customer@marlowquay.test', position: 'Facilities' })
  const ids = await catalogueIds(sales)
  const draft = async () => {
    const res = await sales.post('/api/quotes').send({
      sizingId: sizing!.id,
      contactId: contact.body.id,
      validUntil: daysFromNow(rig.t, 30),
      terms: 'Payment with order.',
      lines: [{ kind: 'unit', productLineId: ids.unit('FLR-M'), quantity: 1 }],
    })
    if (res.status !== 201) throw new Error(`quote: ${JSON.stringify(res.body)}`)
    return res.body as { id: number }
  }
  const paid = await draft()
  await sales.post(`/api/quotes/${paid.id}/send`).send({ confirmDesignChecks: true }).expect(200)
  const customer = await demoAgent(rig, 'customer')
  await customer
    .post(`/api/quotes/${paid.id}/accept`)
    .send({ name: 'Priya Halloran', purchaseOrder: 'MQ-PO-77' })
    .expect(200)
  const checkout = await customer.post(`/api/quotes/${paid.id}/checkout`).expect(201)
  await rig.payOnPage(checkout.body.url)
  const workOrder = await waitForWorkOrder(rig, paid.id)
  const open = await draft()
  return {
    siteId: site!.id,
    sizingId: sizing!.id,
    companyId,
    paidQuoteId: paid.id,
    draftQuoteId: open.id,
    workOrderId: workOrder.id,
  }
}
export type DemoChain = Awaited<ReturnType<typeof demoChain>>

async function waitForWorkOrder(rig: PaymentRig, quoteId: number) {
  for (let i = 0; i < 100; i++) {
    const wo = (await rig.t.services.production.list()).find((w) => w.quoteId === quoteId)
    if (wo) return wo
    await new Promise((r) => setTimeout(r, 100))
  }
  throw new Error(`no work order for quote ${quoteId}`)
}

/** What a page measures of its own width and of the controls that fall outside it. */
export function measureLayout(page: Page) {
  return page.evaluate(() => {
    const width = window.innerWidth
    const insideScroller = (el: HTMLElement) => {
      for (let p = el.parentElement; p && p !== document.body; p = p.parentElement) {
        const o = getComputedStyle(p).overflowX
        if ((o === 'auto' || o === 'scroll') && p.getBoundingClientRect().right <= width + 1)
          return true
      }
      return false
    }
    const offscreen: string[] = []
    for (const el of document.querySelectorAll<HTMLElement>(
      'main button, main input, main a, main select, main textarea, header button, header a',
    )) {
      const r = el.getBoundingClientRect()
      if (r.width === 0 || r.height === 0) continue
      // a control inside a box that scrolls sideways (a table in its card) is reached there
      if (insideScroller(el)) continue
      if (r.right > width + 1 || r.left < -1)
        offscreen.push(
          `${el.tagName.toLowerCase()} "${(el.textContent ?? '').trim().slice(0, 30)}"`,
        )
    }
    const header = document.querySelector('header')
    const tabs = [...document.querySelectorAll('button[role="tab"]')].map(
      (t) => t.getBoundingClientRect().top,
    )
    return {
      width,
      scrollWidth: document.documentElement.scrollWidth,
      headerHeight: header ? header.getBoundingClientRect().height : 0,
      tabRows: new Set(tabs.map((t) => Math.round(t))).size,
      offscreen,
    }
  })
}

/**
 * Follows the page's own API requests, so a visit can wait until its data has come. (Chromium's
 * network-idle wait also counts the service worker's and preview worker's traffic, which in a
 * long run kept a whole browser context "busy" for its full timeout on every page.)
 */
export function apiTraffic(page: Page) {
  let settled = trackers.get(page)
  if (!settled) trackers.set(page, (settled = trackApi(page)))
  return settled
}
const trackers = new WeakMap<Page, ReturnType<typeof trackApi>>()

function trackApi(page: Page) {
  const open = new Set<HTTPRequest>()
  let lastChange = Date.now()
  const done = (r: HTTPRequest) => {
    if (open.delete(r)) lastChange = Date.now()
  }
  page.on('request', (r) => {
    if (!new URL(r.url()).pathname.startsWith('/api/')) return
    open.add(r)
    lastChange = Date.now()
  })
  page.on('requestfinished', done)
  page.on('requestfailed', done)
  /** Resolves once no API request has been open for `quietMs` (or after `timeoutMs` anyway). */
  return async function settled(quietMs = 250, timeoutMs = 5000) {
    const end = Date.now() + timeoutMs
    while (Date.now() < end && (open.size > 0 || Date.now() - lastChange < quietMs))
      await new Promise((r) => setTimeout(r, 50))
  }
}

/**
 * Moves the app to `path` through its router, as a tap on one of its links does, and answers once
 * the new route's page has rendered.
 */
export async function navigateInApp(page: Page, path: string) {
  await page.evaluate(async (to) => {
    type Mounted = { __vue_app__: { config: { globalProperties: { $router: Router } } } }
    interface Router {
      push(to: string): Promise<unknown>
    }
    const app = (document.querySelector('#app') as unknown as Mounted).__vue_app__
    await app.config.globalProperties.$router.push(to)
    await new Promise((r) => requestAnimationFrame(() => setTimeout(r, 0)))
  }, path)
}
