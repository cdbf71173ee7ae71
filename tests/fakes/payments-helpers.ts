import Stripe from 'stripe'

export const SECRET_KEY = 'sk_test_fake_suite'
export const WEBHOOK_SECRET = 'whsec_fake_suite'

/** The official SDK pointed at the fake, configured as the app configures it. */
export function sdkFor(baseUrl: string, key = SECRET_KEY): Stripe {
  return new Stripe(key, {
    host: '127.0.0.1',
    port: Number(new URL(baseUrl).port),
    protocol: 'http',
    maxNetworkRetries: 0,
    telemetry: false,
  })
}

/** A session for 2 × 125 000 + 1 × 30 000 cents = 280 000 cents, summed by hand. */
export function createQuoteSession(
  stripe: Stripe,
  extra: Partial<Stripe.Checkout.SessionCreateParams> = {},
) {
  return stripe.checkout.sessions.create({
    mode: 'payment',
    line_items: [
      {
        price_data: {
          currency: 'eur',
          unit_amount: 125000,
          product_data: { name: 'Absorber unit' },
        },
        quantity: 2,
      },
      {
        price_data: {
          currency: 'eur',
          unit_amount: 30000,
          product_data: { name: 'Site tuning visit' },
        },
        quantity: 1,
      },
    ],
    success_url: 'http://127.0.0.1:9/paid?session={CHECKOUT_SESSION_ID}',
    cancel_url: 'http://127.0.0.1:9/cancelled',
    client_reference_id: 'quote-17-r2',
    customer_email: 'buyer@example.test',
    metadata: { quoteId: '17', revision: '2' },
    ...extra,
  })
}

/** Submits the pay page's form as a browser would, without following the redirect. */
export function submitPayForm(
  sessionUrl: string,
  fields: Record<string, string>,
): Promise<Response> {
  return fetch(sessionUrl, {
    method: 'POST',
    headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams(fields).toString(),
    redirect: 'manual',
  })
}
