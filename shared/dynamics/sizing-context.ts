import type { ModelInput } from '../schemas/model'
import { ModelError } from './errors'
import { frequencyGrid, targetBand, type Band } from './grid'
import { prepareHost, scaleHost, type PreparedHost } from './host'
import { hostReceptance, type HostReceptance, type ReceptanceVectors } from './host-receptance'
import { attachmentVector, requestVectors } from './load-vectors'
import type { Measure } from './measure'
import { hostUndampedResonance, type UndampedResonance } from './undamped-modes'
import { validateHost } from './validate-host'
import { validateRequest, type ValidRequest } from './validate-request'

/** Where a sizing's band comes from. */
export type BandSource = 'default' | 'close-modes' | 'user' | 'speed'

/** Everything a sizing computes once per model before trying absorbers. */
export interface SizingContext {
  model: ModelInput
  prep: PreparedHost
  req: ValidRequest
  /** 0-based target mode */
  r: number
  /** rad/s */
  omegaTarget: number
  band: Band
  /** true when the band was set by the user or by a running speed (it then stays put under
   * detuning) */
  userBand: boolean
  /** where the band comes from: the target mode's default, widened to close modes, the user, or a
   * machine's running speed */
  bandSource: BandSource
  /** free-node index of the absorber (of the response node when there is none) */
  absorberNode: number
  /** response r, load p and absorber attachment u as vectors over the free nodes */
  vectors: ReceptanceVectors
  /** what is read and minimised */
  measure: Measure
  /** host receptances over the band grid */
  rec: HostReceptance
  /** a host mode in the band that resonates without limit when there is no absorber, or null */
  hostResonance: UndampedResonance | null
  /** one that does so whatever damped absorber acts on u (the absorber does not move it) */
  residualResonance: UndampedResonance | null
  /** kg, of the target mode on the absorber's coordinate, 1/(uᵀφ_r)² (null without an absorber) */
  effectiveMass: number | null
}

function absorberEffectiveMass(
  prep: PreparedHost,
  model: ModelInput,
  cu: number,
  r: number,
): number {
  const m = 1 / (cu * cu)
  const total = prep.mass.reduce((s, x) => s + x, 0)
  if (!(m < total * 1e9)) {
    const between = model.absorber?.relativeTo
      ? ` relative to '${model.absorber.relativeTo}' (both move alike)`
      : ' (it lies on a node line of the mode shape)'
    throw new ModelError(
      'absorber.node',
      `node '${model.absorber?.node}' does not move in mode ${r + 1}${between}, so an absorber ` +
        'there cannot act on that mode; choose another node',
    )
  }
  return m
}

function bandOf(prep: PreparedHost, req: ValidRequest, r: number): [Band, BandSource] {
  if (req.speed) return [req.speed, 'speed']
  if (req.band) return [req.band, 'user']
  const b = targetBand(prep.modes.omega, r)
  return [b, b.first < r || b.last > r ? 'close-modes' : 'default']
}

/**
 * Validates a model and precomputes the host: matrices, modes, band, grid and host receptances.
 * @param model the model (SI units, band in Hz)
 * @param prepared an already prepared host of this model, to reuse
 * @param stiffnessFactor scales every spring rate (detuning studies)
 * @throws ModelError naming the field when the model is invalid
 */
export function sizingContext(
  model: ModelInput,
  prepared?: PreparedHost,
  stiffnessFactor = 1,
): SizingContext {
  const { host, index } = validateHost(model)
  const req = validateRequest(model, index, host.ids.length - host.massless.length)
  const prep = scaleHost(prepared ?? prepareHost(host, req.dampingRatios), stiffnessFactor)
  const r = req.targetMode - 1
  const omegaTarget = prep.modes.omega[r] ?? 0
  const [band, bandSource] = bandOf(prep, req, r)
  const ab = req.absorber
  const absorberNode = ab?.node ?? req.response.node
  const u = attachmentVector(prep.fullN, absorberNode, ab?.relativeTo ?? null)
  const { vectors, measure } = requestVectors(
    prep,
    req.excitation,
    req.response,
    u,
    !!ab?.relativeTo,
  )
  const grid = frequencyGrid(band, omegaTarget, { include: prep.modes.omega })
  const rec = hostReceptance(prep, vectors, grid)
  const resonance = (acts: boolean): UndampedResonance | null =>
    hostUndampedResonance(prep, vectors, rec.participation, band, acts)
  const cu = rec.participation[3 * r + 2] ?? 0
  return {
    model,
    prep,
    req,
    r,
    omegaTarget,
    band,
    userBand: bandSource === 'user' || bandSource === 'speed',
    bandSource,
    absorberNode,
    vectors,
    measure,
    rec,
    hostResonance: resonance(false),
    residualResonance: ab ? resonance(true) : null,
    effectiveMass: ab ? absorberEffectiveMass(prep, model, cu, r) : null,
  }
}
