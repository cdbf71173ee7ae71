import { randomUUID } from 'node:crypto'
import type { Readable } from 'node:stream'
import { simpleParser, type AddressObject } from 'mailparser'
import type { CaughtMessage } from './types'

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = field === undefined ? [] : Array.isArray(field) ? field : [field]
  return list.flatMap((group) => group.value.map((a) => a.address ?? '').filter(Boolean))
}

/**
 * Parses one message from the SMTP data stream into the stored shape.
 * @param envelope the SMTP MAIL FROM and RCPT TO addresses
 * @param receivedAt arrival time, used when the message has no Date header
 */
export async function parseMessage(
  stream: Readable,
  envelope: CaughtMessage['envelope'],
  receivedAt: Date,
): Promise<CaughtMessage> {
  const parsed = await simpleParser(stream)
  return {
    id: randomUUID(),
    from: parsed.from?.text ?? envelope.from ?? '',
    to: addresses(parsed.to),
    cc: addresses(parsed.cc),
    envelope,
    subject: parsed.subject ?? '',
    text: parsed.text ?? null,
    html: typeof parsed.html === 'string' ? parsed.html : null,
    attachments: parsed.attachments.map((a) => ({
      filename: a.filename ?? null,
      contentType: a.contentType,
      size: a.size,
      content: a.content,
    })),
    date: (parsed.date ?? receivedAt).toISOString(),
    receivedAt: receivedAt.toISOString(),
  }
}
