import type { Request } from 'express'

/** The client's address as Express resolved it; TRUST_PROXY decides whom to believe. */
export const clientAddress = (req: Request) => req.ip ?? req.socket.remoteAddress ?? 'unknown'
