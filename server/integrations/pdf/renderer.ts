import { readFileSync } from 'node:fs'
import { createRequire } from 'node:module'
import puppeteer, { type Browser } from 'puppeteer-core'

/** HTML in, PDF bytes out. */
export interface PdfRenderer {
  render(html: string, options?: { footer?: string }): Promise<Buffer>
  close(): Promise<void>
}

/** Headless Chromium without the background calls a closed network refuses (tests use it too). */
export const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-dev-shm-usage',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--mute-audio',
]

const require = createRequire(import.meta.url)
let fontCss: string | null = null

/**
 * @font-face rules for Lato 400 and 700 as data: URIs, read once from the package the app
 * ships (@fontsource/lato), so a PDF never fetches a font.
 */
export function inlineFontCss(): string {
  if (fontCss) return fontCss
  fontCss = [400, 700]
    .map((weight) => {
      const file = require.resolve(`@fontsource/lato/files/lato-latin-${weight}-normal.woff2`)
      const data = readFileSync(file).toString('base64')
      return `@font-face{font-family:'Lato';font-style:normal;font-weight:${weight};src:url(data:font/woff2;base64,${data}) format('woff2')}`
    })
    .join('\n')
  return fontCss
}

/**
 * One headless Chromium, launched on the first render and reused; pages are closed after each
 * render. Every request other than data: URIs is refused, so a template cannot reach the
 * network. Signal handling stays with the server (close() on shutdown); puppeteer still kills
 * the child when the process exits.
 */
export function chromiumPdf(executablePath: string): PdfRenderer {
  let browser: Promise<Browser> | null = null
  const launch = () =>
    puppeteer.launch({
      executablePath,
      headless: true,
      args: CHROMIUM_ARGS,
      handleSIGINT: false,
      handleSIGTERM: false,
      handleSIGHUP: false,
    })
  async function getBrowser() {
    if (!browser) {
      browser = launch()
      browser.catch(() => (browser = null))
      void browser.then((b) => b.once('disconnected', () => (browser = null)))
    }
    return browser
  }
  return {
    async render(html, options = {}) {
      const page = await (await getBrowser()).newPage()
      try {
        await page.setJavaScriptEnabled(false)
        await page.setRequestInterception(true)
        page.on('request', (r) => {
          if (r.url().startsWith('data:')) void r.continue()
          else void r.abort('blockedbyclient')
        })
        await page.setContent(html, { waitUntil: 'load' })
        const pdf = await page.pdf({
          format: 'A4',
          printBackground: true,
          margin: { top: '16mm', bottom: '18mm', left: '14mm', right: '14mm' },
          displayHeaderFooter: Boolean(options.footer),
          headerTemplate: '<span></span>',
          footerTemplate: options.footer ?? '<span></span>',
        })
        return Buffer.from(pdf)
      } finally {
        await page.close().catch(() => undefined)
      }
    },
    async close() {
      const b = browser
      browser = null
      if (b) await (await b.catch(() => null))?.close()
    },
  }
}

const shared = new Map<string, PdfRenderer>()

/** The process's renderer for a Chromium binary: every caller shares one browser. */
export function pdfRenderer(executablePath: string): PdfRenderer {
  let r = shared.get(executablePath)
  if (!r) {
    r = chromiumPdf(executablePath)
    shared.set(executablePath, r)
  }
  return r
}

/** Closes every shared browser; call on shutdown (and after tests). */
export async function closePdfRenderers() {
  const all = [...shared.values()]
  shared.clear()
  await Promise.all(all.map((r) => r.close()))
}
