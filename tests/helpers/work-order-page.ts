import type { Page } from 'puppeteer-core'
import { enter } from './browser'

/**
 * Moves a work order one step by the button's words; the button is off for a moment after each
 * answer, so wait until it is on. The history says the new state in words.
 */
export async function move(page: Page, button: string, toWords: string) {
  await page.locator(`button:not([disabled]) ::-p-text(${button})`).click()
  await page.waitForSelector(`::-p-text(→ ${toWords})`)
}

/** Searches the production queue (on the server) and waits until it shows that work order alone. */
export async function searchQueueFor(page: Page, query: string, workOrderId: number) {
  await enter(page, '#wo-search', query)
  await page.waitForFunction(
    (href) =>
      [...document.querySelectorAll('a[href^="/work-orders/"]')]
        .map((a) => a.getAttribute('href'))
        .join() === href,
    {},
    `/work-orders/${workOrderId}`,
  )
}

/** Fills the shipment form, one serial number per absorber, and ships the order. */
export async function ship(
  page: Page,
  to: { carrier: string; tracking: string; serials: string[] },
) {
  await page.locator('#ship-carrier').fill(to.carrier)
  await page.locator('#ship-tracking').fill(to.tracking)
  for (const [i, serial] of to.serials.entries())
    await page.locator(`#ship-serial-${i}`).fill(serial)
  await page.locator('button:not([disabled]) ::-p-text(Record shipment and mark shipped)').click()
  await page.waitForSelector('::-p-text(→ Shipped)')
}
