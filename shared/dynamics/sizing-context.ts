import type { ModelInput } from '../schemas/model'
import { ModelError } from './errors'
import { frequencyGrid, targetBand, type Band } from './grid'
import { prepareHost, scaleHost, type PreparedHost } from './host'
import {
  hostReceptance,
  nodeVectors,
  type HostReceptance,
  type NodeTriple,
  type ReceptanceVectors,
} from './host-receptance'
import { effectiveMass } from './modes'
import { hostUndampedResonance, type UndampedResonance } from './undamped-modes'
import { validateHost } from './validate-host'
import { validateRequest, type ValidRequest } from './validate-request'

/** Where a sizing's band comes from. */
export type BandSource = 'default' | 'close-modes' | 'user'

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
  /** true when the band was set by the user (it then stays put under detuning) */
  userBand: boolean
  /** where the band comes from: the target mode's default, widened to close modes, or the user */
  bandSource: BandSource
  nodes: NodeTriple
  /** response r, load p and absorber attachment u as vectors over the free nodes */
  vectors: ReceptanceVectors
  /** host receptances over the band grid */
  rec: HostReceptance
  /** a host mode in the band that resonates without limit when there is no absorber, or null */
  hostResonance: UndampedResonance | null
  /** one that does so whatever damped absorber acts on u (the absorber does not move it) */
  residualResonance: UndampedResonance | null
  /** kg, of the target mode at the absorber node (null without an absorber) */
  effectiveMass: number | null
}

function absorberEffectiveMass(
  prep: PreparedHost,
  model: ModelInput,
  j: number,
  r: number,
): number {
  const m = effectiveMass(prep.modes, j, r)
  const total = prep.mass.reduce((s, x) => s + x, 0)
  if (!(m < total * 1e9)) {
    throw new ModelError(
      'absorber.node',
      `node '${model.absorber?.node}' does not move in mode ${r + 1} (it lies on a node line of ` +
        'the mode shape), so an absorber there cannot act on that mode; choose another node',
    )
  }
  return m
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
  const req = validateRequest(model, index, host.ids.length)
  const prep = scaleHost(prepared ?? prepareHost(host, req.dampingRatios), stiffnessFactor)
  const r = req.targetMode - 1
  const omegaTarget = prep.modes.omega[r] ?? 0
  const byDefault = targetBand(prep.modes.omega, r)
  const band = req.band ?? byDefault
  const widened = byDefault.first < r || byDefault.last > r
  const bandSource: BandSource = req.band ? 'user' : widened ? 'close-modes' : 'default'
  const j = req.absorber?.node ?? req.excitation
  const nodes: NodeTriple = { j, r: req.response, f: req.excitation }
  const vectors = nodeVectors(prep.n, nodes)
  const grid = frequencyGrid(band, omegaTarget, { include: prep.modes.omega })
  const rec = hostReceptance(prep, vectors, grid)
  const resonance = (acts: boolean): UndampedResonance | null =>
    hostUndampedResonance(prep, vectors, rec.participation, band, acts)
  const effective = req.absorber ? absorberEffectiveMass(prep, model, j, r) : null
  return {
    model,
    prep,
    req,
    r,
    omegaTarget,
    band,
    userBand: req.band !== null,
    bandSource,
    nodes,
    vectors,
    rec,
    hostResonance: resonance(false),
    residualResonance: req.absorber ? resonance(true) : null,
    effectiveMass: effective,
  }
}
