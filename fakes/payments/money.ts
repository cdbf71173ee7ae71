/**
 * Formats an amount in minor units for people, e.g. 123456 eur → "€1,234.56". The number of
 * decimals comes from the currency (ISO 4217 via Intl), so JPY has none.
 */
export function formatMinor(amount: number, currency: string): string {
  const code = currency.toUpperCase()
  try {
    const format = new Intl.NumberFormat('en-GB', { style: 'currency', currency: code })
    const digits = format.resolvedOptions().maximumFractionDigits ?? 2
    return format.format(amount / 10 ** digits)
  } catch {
    return `${(amount / 100).toFixed(2)} ${code}`
  }
}
