export { startMailCatcher } from './catcher'
export type { MailCatcherOptions, RunningMailCatcher } from './catcher'
export type { CaughtAttachment, CaughtMessage, MessageSummary } from './types'
