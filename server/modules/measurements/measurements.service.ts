import type { RecordUpload } from '../../../shared/schemas/measurement'
import type { IdentificationResult } from '../../../shared/measurements'
import { AppError, forbidden, notFound, nullIfMissing } from '../../http/app-error'
import { JsonText } from '../../http/json-text'
import type { FileStore } from '../../integrations/file-store'
import type { AuthUser } from '../../middleware/authenticate'
import type { ModelsService } from '../models/models.service'
import type { SitesService } from '../sites/sites.service'
import type { MeasurementsRepository, StoredRecord } from './measurements.repository'
import type { SizingPool } from '../../workers/pool'
import { checkRecordFile, readAsStored } from './record-file'

/** An upload the route streamed into the file store: `filename` is its stored name. */
type StoredUpload = { originalname: string; filename: string; size: number }
type UploadedFile = StoredUpload | undefined

/**
 * A text as the driver stores it (UTF-8): the answer is made from what was stored, and a
 * surrogate pair cut in half by a length limit is stored as U+FFFD.
 */
const asStored = (text: string) => Buffer.from(text, 'utf8').toString('utf8')

export function measurementsService(deps: {
  records: MeasurementsRepository
  sites: SitesService
  models: ModelsService
  files: FileStore
  pool: Pick<SizingPool, 'identify' | 'peakAt'>
}) {
  async function stored(id: number): Promise<StoredRecord> {
    const r = await deps.records.findById(id)
    if (!r) throw notFound('record')
    return r
  }

  /** The record's summary, as the calibration and the model update check it. */
  async function get(id: number) {
    const { storedName: _s, rateFromForm: _r, ...record } = await stored(id)
    return record
  }

  /** The record with its identification, for a change of its peaks by its engineer. */
  async function editable(user: AuthUser, id: number) {
    const r = await deps.records.findWithResult(id)
    if (!r) throw notFound('record')
    assertCanEdit(user, r)
    return r
  }

  /** The record as the API answers it: its identification passed on as the stored text. */
  async function view(id: number) {
    const r = await deps.records.viewById(id)
    if (!r) throw notFound('record')
    return r
  }

  function assertCanEdit(user: AuthUser, r: StoredRecord) {
    if (user.role !== 'admin' && r.ownerId !== user.id)
      throw forbidden('Only the engineer who uploaded this record may change it.')
  }

  async function assertModelOfSite(modelId: number | undefined, siteId: number) {
    if (modelId === undefined) return
    const modelSite = await nullIfMissing(deps.models.siteOf(modelId))
    if (modelSite !== siteId) {
      throw new AppError('invalid-input', 'The model is not one of this site.', 400, [
        { path: 'body.modelId', message: 'not a model of this site' },
      ])
    }
  }

  /** Reads and identifies a stored upload off the event loop and stores its row. */
  async function keep(
    user: AuthUser,
    siteId: number,
    input: RecordUpload,
    file: StoredUpload,
    signal?: AbortSignal,
  ) {
    await deps.sites.get(siteId)
    await assertModelOfSite(input.modelId, siteId)
    // Reading and identifying an 8 MB record takes seconds: in the worker pool, not here.
    const read = await deps.pool.identify(
      {
        file: deps.files.pathOf(file.filename),
        readAs: {
          ...(input.sampleRateHz !== undefined && { sampleRateHz: input.sampleRateHz }),
          ...(input.timeUnit !== undefined && { timeUnit: input.timeUnit }),
        },
        kind: input.kind,
      },
      { signal },
    )
    if (!read.ok) throw new AppError(read.code, read.message, read.status, read.details)
    const { record } = read
    const row = {
      siteId,
      modelId: input.modelId ?? null,
      nodeId: input.nodeId ?? null,
      ownerId: user.id,
      filename: asStored(file.originalname.slice(0, 200)),
      storedName: file.filename,
      size: file.size,
      sampleRateHz: read.sampleRateHz,
      samples: read.samples,
      rateFromForm: input.sampleRateHz !== undefined,
      kind: read.kind,
      result: new JsonText<IdentificationResult>(read.resultJson),
      channels: record.channels.map((c, i) => ({
        name: c.name.slice(0, 60),
        column: c.column,
        nodeId: i === 0 ? (input.nodeId ?? null) : null,
        direction: null,
      })),
      timeUnit: record.timeUnit,
      timeUnitSource: record.timeUnitSource,
    }
    return { id: await deps.records.insert(row), row, peakCount: read.peakCount }
  }

  return {
    get,
    view,
    stored,
    assertCanEdit,
    async list(siteId: number) {
      await deps.sites.get(siteId)
      return deps.records.listBySite(siteId)
    },

    /** Where an upload's bytes are written as they arrive: a new file in the store. */
    placeUpload: () => deps.files.place('.csv'),

    /**
     * Takes an upload already stored (streamed to disk by the route), then reads and identifies
     * it in the worker pool, which reads the file itself; a refused or cancelled upload removes
     * the file again, so it leaves nothing behind.
     */
    async upload(
      user: AuthUser,
      siteId: number,
      input: RecordUpload,
      upload: UploadedFile,
      signal?: AbortSignal,
    ) {
      let kept: Awaited<ReturnType<typeof keep>>
      try {
        kept = await keep(user, siteId, input, checkRecordFile(upload), signal)
      } catch (e) {
        if (upload) await deps.files.remove(upload.filename)
        throw e
      }
      // stored: the file stays even if what MariaDB set cannot be read (an outage answers 503)
      const view = await deps.records.inserted(kept.id, kept.row, kept.peakCount)
      if (!view) throw notFound('record')
      return view
    },

    async remove(user: AuthUser, id: number) {
      const r = await stored(id)
      assertCanEdit(user, r)
      await deps.records.remove(id)
      await deps.files.remove(r.storedName)
    },

    /** A mode the automatic search missed, identified from the stored file around a frequency. */
    async addPeak(user: AuthUser, id: number, frequencyHz: number) {
      const r = await editable(user, id)
      const near = r.result.peaks.find(
        (p) => Math.abs(p.frequencyHz - frequencyHz) < 2 * r.result.resolutionHz,
      )
      if (near) {
        throw new AppError(
          'peak-exists',
          `A peak at ${near.frequencyHz.toFixed(3)} Hz is already listed.`,
          409,
        )
      }
      // An 8 MB record takes a while to read: in the worker pool, which reads the file itself.
      const found = await deps.pool.peakAt({
        file: deps.files.pathOf(r.storedName),
        readAs: readAsStored(r),
        frequencyHz,
        kind: r.result.kind,
        otherPeaksHz: r.result.peaks.map((p) => p.frequencyHz),
      })
      if (!found.ok) throw new AppError(found.code, found.message, found.status, found.details)
      const { peak } = found
      const result = { ...r.result, peaks: [...r.result.peaks, peak] }
      await deps.records.saveResult(id, result)
      return { peak, record: await view(id) }
    },

    /** Drops a false peak (noise, a machine harmonic) from the record's list. */
    async dropPeak(user: AuthUser, id: number, index: number) {
      const r = await editable(user, id)
      if (index >= r.result.peaks.length) throw notFound('peak')
      const peaks = r.result.peaks.filter((_, i) => i !== index)
      await deps.records.saveResult(id, { ...r.result, peaks })
      return view(id)
    },
  }
}
export type MeasurementsService = ReturnType<typeof measurementsService>
