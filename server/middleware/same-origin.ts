import type { NextFunction, Request, Response } from 'express'
import { AppError } from '../http/app-error'

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS'])

const crossSite = (why: string) =>
  new AppError('cross-site-request', `Refused: ${why}. Use the app at its own address.`, 403)

/**
 * Refuses a state-changing request that a browser sends on behalf of another site (CSRF), on
 * top of the SameSite=Strict cookie. A browser says where a request comes from in
 * Sec-Fetch-Site (Fetch Metadata) and, for every cross-origin POST, in Origin; anything but our
 * own origin is refused. A request with neither header does not come from a browser page (a
 * script or the SDK), so it carries no ambient cookie to abuse and is let through.
 * @param publicUrl read per request: a test rig may learn its address after the app is built
 */
export function refuseCrossSite(publicUrl: () => string) {
  return (req: Request, _res: Response, next: NextFunction) => {
    if (SAFE_METHODS.has(req.method)) return next()
    const site = req.get('sec-fetch-site')
    if (site !== undefined) {
      // 'none' is a request the user made directly (typed address, bookmark), never a page's.
      return next(site === 'same-origin' || site === 'none' ? undefined : crossSite(site))
    }
    const origin = req.get('origin')
    if (origin === undefined) return next()
    let ours: string
    try {
      ours = new URL(publicUrl()).origin
    } catch {
      return next(crossSite('the server has no valid public address'))
    }
    next(origin === ours ? undefined : crossSite(`request from ${origin.slice(0, 100)}`))
  }
}
