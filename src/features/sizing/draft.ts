import type { BandInput, ExplicitTuning, TuningName } from '@shared/schemas/model'
import type { SizingRecordLink } from '@shared/schemas/measurement'
import type { SizingUnit } from '@shared/schemas/sizing-units'
import type { Acceptance, ModelDefinition, Orientation, SizingInput } from '@shared/schemas/sizing'
import { acceptancePreset } from '@shared/acceptance-presets'
import { LOAD_PRESETS } from '@shared/load-presets'
import { singleModeModel } from '@shared/dynamics'

/** The load kind and its amplitudes, stroke limit and second absorber node, as in the API. */
type LoadFields =
  | 'loadKind'
  | 'forces'
  | 'loadMode'
  | 'baseAcceleration'
  | 'speed'
  | 'unbalance'
  | 'strokeLimit'
  | 'relativeToNode'

/** The engineer's choices, without the server's ids. SI units. */
export interface SizingForm extends Pick<SizingInput, LoadFields> {
  title: string
  targetMode: number
  absorberNode: string
  excitationNode: string
  responseNode: string
  forceAmplitude: number
  loadPresetId?: string
  massRatio: number
  /** a method, or a tuning the engineer gives (frequency ratio and damping ratio) */
  tuning: TuningName | ExplicitTuning
  orientation: Orientation
  acceptance: Acceptance
  detuningTolerance: number
  /** Hz; absent: the band around the target mode (see the engine's default) */
  band?: BandInput
  /** site records linked as evidence, with their peaks paired with modes */
  records: SizingRecordLink[]
  /** further absorbers beside the first, each at its node and mode; absent for one absorber */
  absorbers?: SizingUnit[]
}

/** One sizing being edited, as kept in the browser until the server has it. */
export interface SizingDraft {
  /** "sizing-12" once saved, "new-site-3" before */
  key: string
  siteId: number
  sizingId: number | null
  sizingRevision: number | null
  modelId: number | null
  modelRevision: number | null
  modelName: string
  definition: ModelDefinition
  /** the structure differs from the saved model revision */
  structureChanged: boolean
  revisionReason: string
  form: SizingForm
  /** anything not yet on the server */
  changed: boolean
  /** a save was asked for and could not reach the server */
  pendingSync: boolean
  updatedAt: string
}

export function defaultForm(): SizingForm {
  const office = acceptancePreset('aisc-office')
  const walker = LOAD_PRESETS[0]
  return {
    title: '',
    targetMode: 1,
    absorberNode: '',
    excitationNode: '',
    responseNode: '',
    forceAmplitude: walker?.force ?? 280,
    loadPresetId: walker?.id,
    massRatio: 0.02,
    tuning: 'optimize',
    orientation: 'vertical',
    acceptance: {
      presetId: office?.id,
      label: office ? `${office.label}, ${office.statedAs}` : 'custom',
      quantity: 'acceleration',
      limit: office?.limit ?? 0.049,
    },
    detuningTolerance: 0.1,
    records: [],
  }
}

/** A one-mass start (an office floor near 5.8 Hz, 20 t modal mass), edited from there. */
export function defaultDefinition(): ModelDefinition {
  const m = singleModeModel(5.8, 20_000)
  return { nodes: m.nodes, springs: m.springs, hostDampingRatio: 0.02 }
}

export function newDraft(siteId: number, now: string): SizingDraft {
  return {
    key: `new-site-${siteId}`,
    siteId,
    sizingId: null,
    sizingRevision: null,
    modelId: null,
    modelRevision: null,
    modelName: 'Host structure',
    definition: defaultDefinition(),
    structureChanged: true,
    revisionReason: '',
    form: defaultForm(),
    changed: false,
    pendingSync: false,
    updatedAt: now,
  }
}

/** The API's sizing input; ids not yet given by the server are 1 for the local preview only. */
export function toSizingInput(d: SizingDraft): SizingInput {
  const { records, ...f } = d.form
  return {
    ...f,
    // no links: left out, as in sizings saved before records could be linked
    ...(records.length > 0 && { records }),
    title: f.title.trim() || 'Untitled sizing',
    siteId: d.siteId,
    modelId: d.modelId ?? 1,
    modelRevision: d.modelRevision ?? 1,
  }
}

/**
 * The form part of a stored sizing input: every choice the engineer made, exactly as saved, so
 * that a reopened sizing shows what was entered (only the server's ids are left out).
 */
export function formOf(input: SizingInput): SizingForm {
  const { siteId: _site, modelId: _model, modelRevision: _revision, ...form } = input
  return { ...form, records: input.records ?? [] }
}
