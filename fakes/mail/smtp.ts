import { SMTPServer } from 'smtp-server'
import { parseMessage } from './parse'
import type { CaughtMessage } from './types'

/** Big enough for a quote PDF with drawings; larger mails are refused as a real relay would. */
const MAX_MESSAGE_BYTES = 25 * 1024 * 1024

/**
 * An SMTP server that accepts every message, with or without AUTH, over plain TCP. The
 * message is stored before the server answers 250, so once `sendMail` resolves it is there.
 */
export function createSmtpCatcher(onMessage: (message: CaughtMessage) => void): SMTPServer {
  return new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    // close() waits this long for open sessions; a stuck client must not stall shutdown.
    closeTimeout: 1000,
    allowInsecureAuth: true,
    // Accept any credentials: the app may be configured with a user and password.
    onAuth: (auth, _session, callback) => callback(null, { user: auth.username ?? 'anonymous' }),
    onData(stream, session, callback) {
      const envelope = {
        from: session.envelope.mailFrom ? session.envelope.mailFrom.address : null,
        to: session.envelope.rcptTo.map((r) => r.address),
      }
      parseMessage(stream, envelope, new Date())
        .then((message) => {
          if ((stream as { sizeExceeded?: boolean }).sizeExceeded) {
            callback(Object.assign(new Error('Message too large'), { responseCode: 552 }))
            return
          }
          onMessage(message)
          callback()
        })
        .catch((err: unknown) => callback(err instanceof Error ? err : new Error(String(err))))
    },
  })
}
