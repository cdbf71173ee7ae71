/** The requests the server benchmark makes as a signed-in user would. */
import { seeded } from '../../../shared/dynamics/eigen/seeded'
import type { SizingInput } from '../../../shared/schemas/sizing'

/** Signs in; returns the session cookie to send back. */
export async function signIn(base: string, email: string, password: string): Promise<string> {
  const r = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
  })
  if (!r.ok) throw new Error(`sign-in ${email}: ${r.status}`)
  return r.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ')
}

/**
 * An invented heel-drop-like record of about `bytes` bytes: time and acceleration columns at
 * 1 kHz, a decaying 6 Hz response with seeded noise. Written row by row into one buffer, so
 * making it leaves little garbage for a collection to clear while the server is timed.
 */
export function recordFile(bytes: number): Uint8Array<ArrayBuffer> {
  const rnd = seeded(8)
  const encoder = new TextEncoder()
  const out = new Uint8Array(bytes + 64) // a row is < 32 bytes: the last one always fits
  let size = encoder.encodeInto('time_s,acceleration_m_s2\n', out).written
  for (let i = 0; size < bytes; i++) {
    const t = i / 1000
    const a =
      0.05 * Math.exp(-0.4 * (t % 10)) * Math.sin(2 * Math.PI * 6 * t) + 0.002 * (rnd() - 0.5)
    size += encoder.encodeInto(`${t.toFixed(3)},${a.toFixed(7)}\n`, out.subarray(size)).written
  }
  return out.slice(0, size)
}

/** Uploads a record to a site as the measurements screen does (multipart field "record"). */
export function upload(
  base: string,
  cookie: string,
  siteId: number,
  file: Uint8Array<ArrayBuffer>,
) {
  const form = new FormData()
  form.append('record', new Blob([file], { type: 'text/csv' }), 'bench-record.csv')
  return fetch(`${base}/api/sites/${siteId}/records`, {
    method: 'POST',
    headers: { cookie },
    body: form,
  })
}

/** One sizing and one record upload at once; what failed of them, as lines. */
export async function sizeAndUpload(
  base: string,
  cookie: string,
  sizing: SizingInput,
  record: Uint8Array<ArrayBuffer>,
) {
  const failures: string[] = []
  const check = async (r: Response) => {
    if (!r.ok) failures.push(`${r.url}: ${r.status} ${(await r.text()).slice(0, 300)}`)
  }
  await Promise.all([
    fetch(`${base}/api/sizings`, {
      method: 'POST',
      headers: { cookie, 'content-type': 'application/json' },
      body: JSON.stringify({ input: sizing }),
    }).then(check),
    upload(base, cookie, sizing.siteId, record).then(check),
  ])
  return failures
}
