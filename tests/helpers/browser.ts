import { mkdirSync } from 'node:fs'
import type { AddressInfo } from 'node:net'
import type { Server } from 'node:http'
import path from 'node:path'
import { afterAll, beforeAll } from 'vitest'
import puppeteer, { type Browser, type Page } from 'puppeteer-core'
import { CHROMIUM_ARGS } from '../../server/integrations/pdf/renderer'
import { makeTestApp, type TestApp } from './app'
import { PASSWORD } from './factories'
import { journalBrowser } from './browser-journal'

export const SHOTS_DIR = path.resolve('.local/screenshots')
export const PORTRAIT = { width: 820, height: 1180 }
export const LANDSCAPE = { width: 1180, height: 820 }

/**
 * The one Chromium launcher of the browser tests: Debian's Chromium, headless, with the same
 * switches as the server's PDF renderer. Its pages are journalled for the report of a failed test.
 */
export async function launchBrowser(): Promise<Browser> {
  const browser = await puppeteer.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: CHROMIUM_ARGS,
  })
  journalBrowser(browser)
  return browser
}

export interface BrowserRig {
  t: TestApp
  url: string
  browser: Browser
  close: () => Promise<void>
}

/** The built client and the API on one port, driven by Debian's Chromium. */
export async function startBrowserRig(extraEnv: Record<string, string> = {}): Promise<BrowserRig> {
  const t = await makeTestApp({ CLIENT_DIR: 'dist/client', ...extraEnv })
  const server: Server = await new Promise((resolve) => {
    const s = t.app.listen(0, '127.0.0.1', () => resolve(s))
  })
  const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`
  t.config.publicUrl = url
  const browser = await launchBrowser()

  mkdirSync(SHOTS_DIR, { recursive: true })
  return {
    t,
    url,
    browser,
    close: async () => {
      await browser.close()
      await new Promise((r) => server.close(r))
      await t.close()
    },
  }
}

/**
 * The rig of one test file: started before its tests and closed after them. The object is filled
 * in when the rig has started, so read its fields inside the tests.
 */
export function browserRigPerFile(): BrowserRig {
  const rig = {} as BrowserRig
  beforeAll(async () => {
    Object.assign(rig, await startBrowserRig())
  })
  afterAll(() => rig.close?.())
  return rig
}

export async function newPage(
  rig: Pick<BrowserRig, 'browser'>,
  viewport = PORTRAIT,
): Promise<Page> {
  const context = await rig.browser.createBrowserContext()
  const page = await context.newPage()
  await page.setViewport({ ...viewport, hasTouch: true, isMobile: false })
  // A wait is a hang detector, not a speed check: in a full run on two cores, with the API tests
  // alongside, a save and the page it opens once took over 15 s (the test's own limit is 120 s).
  page.setDefaultTimeout(30_000)
  return page
}

export async function shot(page: Page, name: string, fullPage = true) {
  mkdirSync(SHOTS_DIR, { recursive: true })
  await page.screenshot({
    path: path.join(SHOTS_DIR, `${name}.png`) as `${string}.png`,
    fullPage,
  })
}

export async function signInAs(page: Page, url: string, email: string, password: string) {
  await page.goto(`${url}/sign-in`)
  await page.locator('#email').fill(email)
  await page.locator('#password').fill(password)
  await page.locator('button[type="submit"]').click()
  await page.waitForSelector('nav[aria-label="Main"]')
}

/**
 * A fresh page (portrait unless told) signed in as the user: a demo user with its own password or
 * a test user with the shared PASSWORD.
 */
export async function pageSignedInAs(
  rig: Pick<BrowserRig, 'browser' | 'url'>,
  user: { email: string; password?: string },
  viewport = PORTRAIT,
): Promise<Page> {
  const page = await newPage(rig, viewport)
  await signInAs(page, rig.url, user.email, user.password ?? PASSWORD)
  return page
}

/** Follows a main-menu entry, opening the menu first where the bar is too narrow for the links. */
export async function navigate(page: Page, label: string) {
  const toggle = await page.$('header button[aria-controls="main-nav"]')
  if (toggle && (await toggle.evaluate((b) => b.getAttribute('aria-expanded'))) !== 'true')
    await toggle.click()
  await page.locator(`nav[aria-label="Main"] a ::-p-text(${label})`).click()
}

/** The visible labels of the main navigation, in order. */
export async function navLabels(page: Page) {
  return page.$$eval('nav[aria-label="Main"] a', (links) =>
    links.map((a) => a.textContent?.trim() ?? ''),
  )
}

/** Longer than the app's longest debounce (the live preview waits 150 ms after a change). */
export const KEY_PAUSE_MS = 200

/**
 * Types into a field one key at a time with a pause between keys, as a person on a tablet does,
 * and checks after every key that the field holds exactly what was typed so far: a field that
 * rewrites its text while someone types fails here. Leaves the field focused and uncommitted.
 */
export async function typeSlowly(page: Page, selector: string, text: string) {
  const field = await page.waitForSelector(selector, { visible: true })
  await field!.focus()
  await field!.evaluate((e) => (e as HTMLInputElement).select())
  let typed = ''
  for (const ch of text) {
    await page.keyboard.type(ch)
    typed += ch
    await new Promise((r) => setTimeout(r, KEY_PAUSE_MS))
    const now = await field!.evaluate((e) => (e as HTMLInputElement).value)
    if (now !== typed) {
      await shot(page, 'typing-failure')
      throw new Error(`${selector}: typed "${typed}" but the field shows "${now}"`)
    }
  }
}

/** Types slowly, then commits the text as a person does by leaving the field. */
export async function enter(page: Page, selector: string, text: string) {
  await typeSlowly(page, selector, text)
  await page.keyboard.press('Tab')
}

/** The current text of an input. */
export function valueOf(page: Page, selector: string) {
  return page.$eval(selector, (e) => (e as HTMLInputElement).value)
}

/** The visible text of the page's main area. */
export function mainText(page: Page) {
  return page.$eval('main', (m) => m.textContent ?? '')
}

/** Waits until the page's main area shows the text. */
export async function waitForText(page: Page, needle: string) {
  await page.waitForFunction(
    (n) => document.querySelector('main')?.textContent?.includes(n),
    {},
    needle,
  )
}

/** Clicks the sizing workspace's step button (role tab) whose text names the step. */
export async function openStep(page: Page, name: string) {
  for (const t of await page.$$('button[role="tab"]')) {
    if ((await t.evaluate((e) => e.textContent ?? '')).includes(name)) return t.click()
  }
  throw new Error(`no step ${name}`)
}

/**
 * Taps the first enabled button whose visible text is exactly `label` (inside `within`, an XPath
 * such as `//div[@role="dialog"]`, when given). Through a locator, so a button that the page
 * re-renders between finding and tapping is found again instead of failing the test.
 */
export async function tapButton(page: Page, label: string, within = '') {
  const xpath = `${within}//button[not(@disabled) and normalize-space(.)="${label}"]`
  await page.locator(`::-p-xpath(${xpath})`).click()
}

/** Opens a PrimeVue Select by its input id and picks the option that starts with the text. */
export async function choose(page: Page, inputId: string, option: string) {
  const item = `li[role="option"][aria-label^="${option}"]`
  // a tap that lands while the page is still re-rendering may not open the list: tap again
  for (let tries = 1; ; tries++) {
    await page.locator(`#${inputId}`).click()
    const opened = await page
      .waitForSelector(item, { visible: true, timeout: 3000 })
      .then(() => true)
      .catch(() => false)
    if (opened || tries === 3) break
  }
  await page.locator(item).click()
}
