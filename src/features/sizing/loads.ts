import type { SizingForm } from './draft'

/** What loads the structure, as the engineer picks it in the target step. */
export type LoadChoice = 'force' | 'machine' | 'mode-shaped' | 'base' | 'forces'

export const LOAD_CHOICES: { value: LoadChoice; label: string; help: string }[] = [
  {
    value: 'force',
    label: 'One harmonic force',
    help: 'A force of one amplitude at one node, e.g. a walker’s first harmonic.',
  },
  {
    value: 'machine',
    label: 'Rotating machine: unbalance and running speed',
    help: 'The force grows with the square of the speed: F = m·e·ω². The peaks are sought over the running speed or speed range, not the mode.',
  },
  {
    value: 'mode-shaped',
    label: 'Load shaped like a mode',
    help: 'A total force spread over the nodes like the mode (m·φ), as walking or a crowd on a span.',
  },
  {
    value: 'base',
    label: 'Support (base) acceleration',
    help: 'Every support moves with one acceleration: ground or floor vibration reaching the structure. Acceleration is read absolute, displacement and velocity relative to the supports.',
  },
  {
    value: 'forces',
    label: 'Several forces in phase',
    help: 'A force vector: one amplitude per node, all in phase.',
  },
]

/**
 * Where a new choice starts, until the engineer types: a small fan's unbalance at a four-pole
 * motor's speed, and a light floor vibration (starting values only, not recommendations).
 */
const START = { unbalance: 0.01, speedHz: 1480 / 60, baseAcceleration: 0.1 }

/** The fields that belong to one load choice only. */
const OWN = ['unbalance', 'speed', 'loadMode', 'baseAcceleration', 'forces'] as const
export type KeptLoad = Partial<Pick<SizingForm, (typeof OWN)[number] | 'band'>>

/** The choice a saved form stands for; a form saved before load kinds existed is one force. */
export function loadChoiceOf(f: SizingForm): LoadChoice {
  const kind = f.loadKind ?? 'force'
  if (kind !== 'force') return kind
  return f.unbalance !== undefined ? 'machine' : 'force'
}

/**
 * Switches the form to another load: the other choices' fields leave the form (the API refuses
 * them) and are kept aside, so switching back shows what was typed before.
 * @param f the form, inside an edit
 * @param kept values put aside, owned by the picker
 */
export function chooseLoad(f: SizingForm, choice: LoadChoice, kept: KeptLoad) {
  const was = loadChoiceOf(f)
  if (was === choice) return
  // a running speed is the band of the check (the API takes one or the other)
  if (choice === 'machine' && f.band) kept.band = f.band
  if (choice === 'machine') delete f.band
  if (was === 'machine' && kept.band) f.band = kept.band
  for (const key of OWN) {
    if (f[key] !== undefined) Object.assign(kept, { [key]: f[key] })
    delete f[key]
  }
  if (choice === 'force' || choice === 'machine') delete f.loadKind
  else f.loadKind = choice
  if (choice === 'machine') {
    f.unbalance = kept.unbalance ?? START.unbalance
    f.speed = kept.speed ?? { hz: START.speedHz }
    delete f.loadPresetId
  } else if (choice === 'base') {
    f.baseAcceleration = kept.baseAcceleration ?? START.baseAcceleration
  } else if (choice === 'mode-shaped') {
    if (kept.loadMode) f.loadMode = kept.loadMode
  } else if (choice === 'forces') {
    f.forces = kept.forces ?? [{ node: f.excitationNode, amplitude: f.forceAmplitude }]
  }
}

/** The keys a change of load may set or remove. */
const TOUCHED = [...OWN, 'band', 'loadKind', 'loadPresetId'] as const

/**
 * The change of choices that switches to another load, for the store's `setChoices` (a key given
 * as undefined is removed); see `chooseLoad`.
 */
export function loadPatch(f: SizingForm, choice: LoadChoice, kept: KeptLoad): Partial<SizingForm> {
  const next: SizingForm = { ...f }
  chooseLoad(next, choice, kept)
  return Object.fromEntries(TOUCHED.map((k) => [k, next[k]])) as Partial<SizingForm>
}

/** Hz: the running speed, or the lowest of a range. */
export const lowSpeedHz = (f: SizingForm) => f.speed?.hz ?? f.speed?.minHz

/** Hz: the highest running speed of a range; undefined for one speed. */
export const highSpeedHz = (f: SizingForm) =>
  f.speed?.hz === undefined ? f.speed?.maxHz : undefined

/**
 * Sets the running speed: one speed, or a range when the highest is given.
 * @param low Hz
 * @param high Hz, or undefined for one speed
 */
export function setSpeed(f: SizingForm, low: number | undefined, high: number | undefined) {
  f.speed = speedOf(low ?? lowSpeedHz(f), high)
}

/**
 * One running speed, or a range when the highest is given.
 * @param low Hz; absent: the starting speed
 * @param high Hz, or undefined for one speed
 */
export function speedOf(low: number | undefined, high: number | undefined): SizingForm['speed'] {
  const from = low ?? START.speedHz
  return high === undefined ? { hz: from } : { minHz: from, maxHz: high }
}
