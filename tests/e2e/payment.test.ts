import { expect, it } from 'vitest'
import { TEST_CARDS } from '../../fakes/payments'
import { PASSWORD, makeUser, signedIn } from '../helpers/factories'
import { newPage, shot, signInAs } from '../helpers/browser'
import { paymentBrowserRigPerFile } from './payment-browser-rig'

const rig = paymentBrowserRigPerFile()

it('lets a customer accept a quote, pay on the payment page and see the order confirmed; double taps change it once', async () => {
  const { quote, company } = await rig.sentQuote()
  const customer = await makeUser(rig.t, 'customer', { companyId: company.id })
  const page = await newPage(rig)
  await signInAs(page, rig.appUrl, customer.email, PASSWORD)
  await page.goto(`${rig.appUrl}/portal/quotes/${quote.id}`)
  await page.locator('#accept-name').fill('Dana Whitlock')
  await page.locator('#accept-po').fill('PO-88120')
  await shot(page, 'payment-1-accept')
  await page.locator('button[type="submit"]').click({ count: 2 })
  await page.waitForSelector('::-p-text(Accepted by Dana Whitlock)')
  await page.locator('button:not([disabled]) ::-p-text(Pay)').click({ count: 2 })
  await page.waitForSelector('#card')
  const { agent: sales } = await signedIn(rig.t, 'sales')
  const events = (await sales.get(`/api/quotes/${quote.id}`)).body.events as { toState: string }[]
  expect(events.filter((e) => e.toState === 'accepted')).toHaveLength(1)
  const [sessions] = await rig.t.ds.query(
    'SELECT COUNT(*) AS n FROM payment_sessions WHERE quoteId = ?',
    [quote.id],
  )
  expect(Number(sessions.n)).toBe(1)
  await shot(page, 'payment-2-pay-page')
  await page.locator('#card').fill(TEST_CARDS.succeeds)
  await Promise.all([page.waitForNavigation(), page.locator('button[value="pay"]').click()])
  await page.waitForSelector('::-p-text(Payment received)')
  expect(await page.$$('.p-toast-message-error')).toHaveLength(0)
  expect(page.url()).toContain('/portal/payment/done')
  await shot(page, 'payment-3-confirmed')
  const mailbox = (await (await fetch(`${rig.t.mail.httpUrl}/api/messages`)).json()) as {
    subject: string
    to: string[]
  }[]
  expect(
    mailbox.some(
      (m) => m.subject.startsWith('Payment received') && m.to.join().includes(customer.email),
    ),
  ).toBe(true)
  await page.browserContext().close()
})

it('tells a customer who opens the payment return page without a quote where to look, and does not wait', async () => {
  const customer = await makeUser(rig.t, 'customer')
  const page = await newPage(rig)
  const errors: string[] = []
  page.on('pageerror', (e) => errors.push(String(e)))
  await signInAs(page, rig.appUrl, customer.email, PASSWORD)
  for (const path of ['/portal/payment/done', '/portal/payment/done?quote=abc&session_id=x']) {
    await page.goto(`${rig.appUrl}${path}`)
    await page.waitForSelector('::-p-text(does not say which quote was paid)')
    expect(await page.$('[aria-label="Waiting for the confirmation"]')).toBeNull()
    await page.locator('nav[aria-label="Where next"] a ::-p-text(My quotes)').wait()
  }
  // another company's quote: the page says so instead of waiting
  const { quote } = await rig.sentQuote()
  await page.goto(`${rig.appUrl}/portal/payment/done?quote=${quote.id}`)
  await page.waitForSelector('::-p-text(not yours or does not exist)')
  expect(errors).toEqual([])
  await shot(page, 'payment-return-without-quote')
  await page.browserContext().close()
})

it('tells a customer back on the return page with a payment this quote never had that nothing is waited for, with the way back', async () => {
  const { quote, customer } = await rig.acceptedQuote()
  const page = await newPage(rig)
  await signInAs(page, rig.appUrl, customer.user.email, PASSWORD)
  for (const session of ['', '&session_id=cs_never_made', '&session_id=not-a-session']) {
    await page.goto(`${rig.appUrl}/portal/payment/done?quote=${quote.id}${session}`)
    await page.waitForSelector('::-p-text(does not name a payment of this quote)')
    expect(await page.$('[aria-label="Waiting for the confirmation"]')).toBeNull()
  }
  await page.locator('nav[aria-label="Where next"] a ::-p-text(Back to the quote)').click()
  await page.waitForSelector('::-p-text(Pay )')
  await shot(page, 'payment-return-unknown-session')
  await page.browserContext().close()
})
