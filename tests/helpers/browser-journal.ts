import { mkdirSync } from 'node:fs'
import path from 'node:path'
import type { Browser, Page } from 'puppeteer-core'

/**
 * What each page of the browser tests did, kept so that a failed test can say it: the requests
 * the server refused or never answered, the browser's errors, and where each page stood. A
 * browser test that times out otherwise says only "waited 30000 ms", which is not enough to tell
 * a slow machine from a page that went somewhere else.
 */
const journals = new Map<Page, string[]>()
const browsers = new Set<Browser>()
const KEPT_LINES = 40
export const REPORT_MARK = '[page report]'

function note(page: Page, line: string) {
  const lines = journals.get(page) ?? []
  lines.push(`${new Date().toISOString().slice(11, 23)} ${line}`)
  if (lines.length > KEPT_LINES) lines.shift()
  journals.set(page, lines)
}

function watchPage(page: Page) {
  journals.set(page, [])
  page.on('console', (m) => {
    if (m.type() === 'error' || m.type() === 'warn') note(page, `console.${m.type()}: ${m.text()}`)
  })
  page.on('pageerror', (e) => note(page, `page error: ${String(e)}`))
  page.on('requestfailed', (r) =>
    note(page, `no answer: ${r.method()} ${r.url()} (${r.failure()?.errorText ?? '?'})`),
  )
  page.on('response', (r) => {
    const api = r.url().includes('/api/')
    if (r.status() >= 400 || api) note(page, `${r.status()} ${r.request().method()} ${r.url()}`)
  })
  page.on('framenavigated', (f) => {
    if (f === page.mainFrame()) note(page, `at ${f.url()}`)
  })
  page.on('close', () => journals.delete(page))
}

/** Journals every page the browser opens from now on. */
export function journalBrowser(browser: Browser) {
  browsers.add(browser)
  browser.on('targetcreated', async (target) => {
    const page = await target.page().catch(() => null)
    if (page) watchPage(page)
  })
  browser.on('disconnected', () => browsers.delete(browser))
}

/**
 * Prints why the test failed, then, for every page still open, its address, the start of its main
 * area and its journal, and saves a screenshot of it under `dir`, named after the test.
 */
export async function reportOpenPages(testName: string, dir: string, why = '') {
  const slug = testName.replace(/[^a-z0-9]+/gi, '-').slice(0, 60)
  let i = 0
  console.error(`${REPORT_MARK} "${testName}" failed: ${why}`)
  for (const browser of browsers) {
    for (const page of await browser.pages().catch(() => [] as Page[])) {
      if (page.isClosed() || page.url() === 'about:blank') continue
      i += 1
      const main = await page
        .$eval('main', (m) => (m.textContent ?? '').replace(/\s+/g, ' ').slice(0, 600))
        .catch(() => '(no main area)')
      // whether the page still draws frames (waits on a click need two) and is shown
      const drawing = await page
        .evaluate(() =>
          Promise.race([
            new Promise<string>((r) => requestAnimationFrame(() => r('draws frames'))),
            new Promise<string>((r) => setTimeout(() => r('NO frame within 2 s'), 2000)),
          ]).then((f) => `${f}, ${document.visibilityState}, focus ${document.hasFocus()}`),
        )
        .catch((e: unknown) => `not answering (${String(e)})`)
      const file = path.join(dir, `failed-${slug}-${i}.png`) as `${string}.png`
      mkdirSync(dir, { recursive: true })
      await page.screenshot({ path: file, fullPage: true }).catch(() => undefined)
      const lines = [
        `page ${i} at ${page.url()} when "${testName}" failed (screenshot ${file})`,
        `page: ${drawing}; main: ${main}`,
        ...(journals.get(page) ?? []).map((l) => `  ${l}`),
      ]
      // one marker on every line, so that `npm test` can print the report again at its end
      console.error(lines.map((l) => `${REPORT_MARK} ${l}`).join('\n'))
    }
  }
}
