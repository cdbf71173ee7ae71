import type { MailMessage } from '../../integrations/mail'
import type { UserSummary } from '../../../shared/schemas/auth'
import { formatMoney, type Currency } from '../../../shared/money'

export interface PaidOrder {
  orderNumber: string
  reference: string
  amount: number
  currency: string
  companyId: number
}

/** The receipt to the customer's users and the order notice to production. */
export function paidOrderMails(users: UserSummary[], o: PaidOrder, publicUrl: string) {
  const customers = users.filter(
    (u) => u.active && u.role === 'customer' && u.companyId === o.companyId,
  )
  const production = users.filter((u) => u.active && u.role === 'production')
  const amount = formatMoney(o.amount, o.currency as Currency)
  const mails: MailMessage[] = customers.map((u) => ({
    to: u.email,
    subject: `Payment received for quote ${o.reference}`,
    text: `Hello ${u.name},\n\nwe have received ${amount} for quote ${o.reference}. Your order ${o.orderNumber} is confirmed and goes to production.\n\nFollow its progress: ${publicUrl}/portal\n\nTessera Damping Works Ltd`,
  }))
  for (const u of production) {
    mails.push({
      to: u.email,
      subject: `New order ${o.orderNumber} (quote ${o.reference})`,
      text: `Order ${o.orderNumber} for quote ${o.reference} is paid (${amount}); its specification is frozen and ready to build.\n\n${publicUrl}`,
    })
  }
  return mails
}
