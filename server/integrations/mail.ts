import nodemailer from 'nodemailer'
import type { Config } from '../config'

export interface MailAttachment {
  filename: string
  content: Buffer
  contentType: string
}

export interface MailMessage {
  to: string
  subject: string
  text: string
  html?: string
  attachments?: MailAttachment[]
}

export interface Mailer {
  send(message: MailMessage): Promise<void>
}

/** nodemailer over SMTP: the local catcher in development and tests, real SMTP by config. */
export function smtpMailer(
  config: Pick<
    Config,
    'SMTP_HOST' | 'SMTP_PORT' | 'SMTP_SECURE' | 'SMTP_USER' | 'SMTP_PASS' | 'MAIL_FROM'
  >,
): Mailer {
  const transport = nodemailer.createTransport({
    host: config.SMTP_HOST,
    port: config.SMTP_PORT,
    secure: config.SMTP_SECURE ?? false,
    ignoreTLS: !config.SMTP_SECURE && !config.SMTP_USER,
    auth: config.SMTP_USER ? { user: config.SMTP_USER, pass: config.SMTP_PASS ?? '' } : undefined,
  })
  return {
    async send(message) {
      await transport.sendMail({ from: config.MAIL_FROM, ...message })
    },
  }
}
