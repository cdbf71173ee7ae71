import { formatMoney } from '../../../shared/money'
import type { CustomerQuote as Quote } from '../../../shared/schemas/quote'
import type { MailMessage } from '../../integrations/mail'

/** The portal page of a quote; the customer signs in to read, accept and pay it. */
export const portalLink = (publicUrl: string, id: number) => `${publicUrl}/portal/quotes/${id}`

/** The name of the quote's PDF as attached to the mail and downloaded. */
export const pdfName = (reference: string) => `${reference.replace(/\s+/g, '-')}.pdf`

/**
 * The "quote sent" message: the PDF attached and the portal link, with the personal message of
 * sales (if any) under the greeting. The send preview renders this same function.
 */
export function quoteMail(
  q: Quote,
  pdf: Buffer,
  link: string,
  supplierName: string,
  message = '',
): MailMessage {
  const total = formatMoney(q.total, q.currency)
  const greeting = q.contactName ? `Dear ${q.contactName},` : 'Hello,'
  const text = [
    greeting,
    '',
    ...(message ? [message, ''] : []),
    `Please find attached our quotation ${q.reference} for ${q.siteName}: ${total} including tax, valid until ${q.validUntil}.`,
    '',
    `You can read and accept it in the customer portal:`,
    link,
    '',
    ...(q.sizing.designAcknowledgement
      ? [
          'Please read the section "Design checks not met" in the quotation: the design does not meet every check, and the quotation says which and why it was accepted.',
          '',
        ]
      : []),
    'The sizing it rests on is a design aid: the final design, the anchorage of the absorber mass and its fall restraint are for a licensed engineer under the local codes.',
    '',
    `Kind regards,`,
    `${q.createdByName}`,
    supplierName,
  ].join('\n')
  return {
    to: q.contactEmail ?? '',
    subject: `Quotation ${q.reference} from ${supplierName}`,
    text,
    attachments: [
      {
        filename: pdfName(q.reference),
        content: pdf,
        contentType: 'application/pdf',
      },
    ],
  }
}
