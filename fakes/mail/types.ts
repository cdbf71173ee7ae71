export interface CaughtAttachment {
  filename: string | null
  contentType: string
  size: number
  content: Buffer
}

/** One message as the catcher stored it after parsing. */
export interface CaughtMessage {
  id: string
  from: string
  /** Addresses from the To header. */
  to: string[]
  cc: string[]
  /** SMTP envelope: who the client actually delivered to, Bcc included. */
  envelope: { from: string | null; to: string[] }
  subject: string
  text: string | null
  html: string | null
  attachments: CaughtAttachment[]
  /** The Date header, or the time of arrival without one; ISO 8601. */
  date: string
  receivedAt: string
}

/** A message for JSON: attachment bytes left out, their index given for download. */
export type MessageSummary = Omit<CaughtMessage, 'attachments'> & {
  attachments: (Omit<CaughtAttachment, 'content'> & { index: number; url: string })[]
}

export function summarise(message: CaughtMessage): MessageSummary {
  return {
    ...message,
    attachments: message.attachments.map(({ content: _content, ...meta }, index) => ({
      ...meta,
      index,
      url: `/messages/${message.id}/attachments/${index}`,
    })),
  }
}
