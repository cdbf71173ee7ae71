import type { Response } from 'express'

/**
 * Answers a rendered PDF, kept out of shared caches: shown in the browser (`inline`) or saved
 * as a file (`attachment`) under its name.
 */
export function sendPdf(
  res: Response,
  pdf: { bytes: Buffer; filename: string },
  disposition: 'inline' | 'attachment' = 'inline',
) {
  res
    .type('application/pdf')
    .set('content-disposition', `${disposition}; filename="${pdf.filename}"`)
    .set('cache-control', 'private, no-store')
    .send(pdf.bytes)
  return undefined
}
