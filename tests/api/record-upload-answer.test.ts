import { readFileSync } from 'node:fs'
import path from 'node:path'
import { describe, expect, it } from 'vitest'
import { appWithOwnUploads } from '../helpers/app'
import { signedIn } from '../helpers/factories'
import { buildingDefinition, makeCompany, siteBody } from '../helpers/records'

// The upload's answer is made from what was stored, without reading the row back, and the list
// counts peaks in MariaDB without reading the identifications: these check both against the
// record as GET /api/records/:id shows it.

const t = appWithOwnUploads('record-answer')

/** The seed's heel-drop record without its time column: read with a sample rate from the form. */
const ACCELERATION_ONLY = Buffer.from(
  readFileSync(path.resolve('seed/records/heel-drop-office-floor.csv'), 'utf8')
    .trimEnd()
    .split('\n')
    .map((line) => line.split(',')[1])
    .join('\n') + '\n',
)

/** A multipart form written by hand, to name the file in RFC 5987 form (`filename*`). */
function form(fields: Record<string, string>, filenameUtf8: string, bytes: Buffer) {
  const boundary = 'qn-answer-boundary'
  const parts = Object.entries(fields).map(
    ([k, v]) => `--${boundary}\r\nContent-Disposition: form-data; name="${k}"\r\n\r\n${v}\r\n`,
  )
  const fileHead =
    `--${boundary}\r\nContent-Disposition: form-data; name="record"; ` +
    `filename*=UTF-8''${encodeURIComponent(filenameUtf8)}\r\nContent-Type: text/csv\r\n\r\n`
  const body = Buffer.concat([
    Buffer.from(parts.join('') + fileHead),
    bytes,
    Buffer.from(`\r\n--${boundary}--\r\n`),
  ])
  return { body, type: `multipart/form-data; boundary=${boundary}` }
}

describe('the answer to a record upload', () => {
  it('is the record as GET shows it, with its model, node, form sample rate and a long name', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const company = await makeCompany(t)
    const site = (await agent.post('/api/sites').send(siteBody(company.id))).body as { id: number }
    const model = (
      await agent
        .post('/api/models')
        .send({ siteId: site.id, name: 'Five storeys', definition: buildingDefinition() })
    ).body as { id: number }
    // 199 letters and a character outside the BMP: the 200-character limit cuts its pair
    const name = `${'a'.repeat(199)}\u{1F4C8}.csv`
    const { body, type } = form(
      { sampleRateHz: '200', modelId: String(model.id), nodeId: 'storey-5', kind: 'decay' },
      name,
      ACCELERATION_ONLY,
    )
    const res = await agent
      .post(`/api/sites/${site.id}/records`)
      .set('content-type', type)
      .send(body)
    expect(res.status).toBe(201)
    expect(res.body.filename).toBe(`${'a'.repeat(199)}\uFFFD`)
    expect(res.body.modelId).toBe(model.id)
    expect(res.body.channels[0].nodeId).toBe('storey-5')
    expect(res.body.sampleRateHz).toBe(200)
    expect(res.body.analysisCount).toBe(0)
    const again = await agent.get(`/api/records/${res.body.id}`)
    expect(again.status).toBe(200)
    expect(res.text).toBe(again.text)
  })

  it('is the record as GET shows it for a file with a time column, named plainly', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const company = await makeCompany(t)
    const site = (await agent.post('/api/sites').send(siteBody(company.id))).body as { id: number }
    const res = await agent
      .post(`/api/sites/${site.id}/records`)
      .attach('record', path.resolve('seed/records/heel-drop-office-floor.csv'), 'floor.csv')
    expect(res.status).toBe(201)
    expect(res.body.ownerName).not.toBe('')
    const again = await agent.get(`/api/records/${res.body.id}`)
    expect(res.text).toBe(again.text)
  })

  it('lists the record with the summary GET shows and the count of its peaks after a drop', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const company = await makeCompany(t)
    const site = (await agent.post('/api/sites').send(siteBody(company.id))).body as { id: number }
    const upload = (file: string) =>
      agent
        .post(`/api/sites/${site.id}/records`)
        .attach('record', path.resolve('seed/records/heel-drop-office-floor.csv'), file)
    const first = (await upload('first.csv')).body as { id: number; peakCount: number }
    const second = (await upload('second.csv')).body as { id: number }
    expect(first.peakCount).toBeGreaterThan(1)
    expect((await agent.delete(`/api/records/${first.id}/peaks/0`)).status).toBe(200)
    const list = (await agent.get(`/api/sites/${site.id}/records`)).body as { id: number }[]
    expect(list.map((r) => r.id)).toEqual([second.id, first.id])
    for (const listed of list) {
      const { result, ...summary } = (await agent.get(`/api/records/${listed.id}`)).body
      expect(listed).toEqual({ ...summary, peakCount: result.peaks.length })
      expect(summary.peakCount).toBe(result.peaks.length)
    }
    expect(list[1]).toMatchObject({ peakCount: first.peakCount - 1 })
  })
})
