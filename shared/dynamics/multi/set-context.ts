import type { SetModelInput } from '../../schemas/absorber-set'
import { ModelError } from '../errors'
import { frequencyGrid, targetBand, type Band } from '../grid'
import { prepareHost, scaleHost, type PreparedHost } from '../host'
import { attachmentVector, requestVectors } from '../load-vectors'
import type { Measure } from '../measure'
import { participation } from '../participation'
import type { BandSource } from '../sizing-context'
import type { UndampedResonance } from '../undamped-modes'
import { validateHost } from '../validate-host'
import { validateRequest, type ValidRequest } from '../validate-request'
import { setReceptance, type SetReceptance, type SetVectors } from './set-receptance'
import { residualSetResonance } from './host-set-peak'
import { unionOf } from './set-bands'
import { validateSet, type ValidUnit } from './validate-set'

/** Everything a set of absorbers computes once per host before trying tunings. */
export interface SetContext {
  model: SetModelInput
  prep: PreparedHost
  /** the request as validated (excitation, response, band; its absorber is the first unit) */
  req: ValidRequest
  units: ValidUnit[]
  /** 0-based target modes, distinct, ascending */
  targets: number[]
  /** rad/s, per target mode */
  omegaTargets: number[]
  /** the union of the target bands, as disjoint intervals (rad/s, ascending) */
  intervals: Band[]
  bandSource: BandSource
  vectors: SetVectors
  measure: Measure
  /** under base motion each unit's mass is loaded too (−m per unit support acceleration) */
  base: boolean
  rec: SetReceptance
  /** kg per unit: effective mass of its target mode on its coordinate, 1/(uᵀφ_r)² */
  effectiveMass: number[]
  /** kg per unit */
  mass: number[]
  /** per unit, uᵀφ_i for every host mode (1/√kg) */
  psi: Float64Array[]
  /** a host mode in the band no unit moves and no damping reaches (the response is unbounded
   * whatever the tuning), or null */
  residual: UndampedResonance | null
}

function bands(prep: PreparedHost, req: ValidRequest, targets: number[]): [Band[], BandSource] {
  if (req.speed) return [[req.speed], 'speed']
  if (req.band) return [[req.band], 'user']
  const list = targets.map((r) => targetBand(prep.modes.omega, r))
  const close = list.some((b, i) => b.first < (targets[i] ?? 0) || b.last > (targets[i] ?? 0))
  return [unionOf(list), close ? 'close-modes' : 'default']
}

function effectiveMasses(prep: PreparedHost, units: ValidUnit[], psi: Float64Array[]): number[] {
  const total = prep.mass.reduce((s, x) => s + x, 0)
  return units.map((u, i) => {
    const c = psi[i]?.[u.mode] ?? 0
    const m = 1 / (c * c)
    if (!(m < total * 1e9))
      throw new ModelError(
        `absorbers[${i}].node`,
        `node '${prep.host.ids[u.node]}' does not move in mode ${u.mode + 1}` +
          `${u.relativeTo === null ? '' : ` relative to '${prep.host.ids[u.relativeTo]}'`}, so an ` +
          'absorber there cannot act on that mode; choose another node',
      )
    return m
  })
}

/**
 * Validates a model with several absorbers and precomputes the host: modes, the union of the
 * target bands, a grid over it and the host receptances at every attachment.
 * @param model the model with `absorbers` (SI units, band in Hz)
 * @param prepared an already prepared host of this model, to reuse
 * @param stiffnessFactor scales every spring rate (detuning studies)
 * @throws ModelError naming the field when the model is invalid
 */
export function setContext(
  model: SetModelInput,
  prepared?: PreparedHost,
  stiffnessFactor = 1,
): SetContext {
  const { host, index } = validateHost(model)
  const nDyn = host.ids.length - host.massless.length
  const units = validateSet(model, index, nDyn)
  const first = model.absorbers?.[0]
  // The first unit stands in for `absorber` where the request's defaults refer to it.
  const single = { ...model, absorbers: undefined, absorber: { node: first?.node ?? '', mass: 1 } }
  const req = validateRequest(single, index, nDyn)
  const prep = scaleHost(prepared ?? prepareHost(host, req.dampingRatios), stiffnessFactor)
  const targets = [...new Set(units.map((u) => u.mode))].sort((a, b) => a - b)
  const omegaTargets = targets.map((r) => prep.modes.omega[r] ?? 0)
  const [intervals, bandSource] = bands(prep, req, targets)
  const h2 = units.findIndex((x) => x.tuning === 'optimize-h2')
  if (h2 >= 0 && req.speed && req.speed.min === req.speed.max)
    throw new ModelError(
      `absorbers[${h2}].tuning`,
      "optimize-h2 needs a band to integrate over, and a single running speed has none: use 'optimize' or give a speed range",
    )
  const u = units.map((x) => attachmentVector(prep.fullN, x.node, x.relativeTo))
  const { vectors, measure } = requestVectors(prep, req.excitation, req.response, u[0]!, false)
  const set: SetVectors = { r: vectors.r, p: vectors.p, u }
  const psi = u.map((x) => participation(prep.modes, prep.condense(x)))
  const effectiveMass = effectiveMasses(prep, units, psi)
  const grid = unionGrid(intervals, omegaTargets, prep.modes.omega)
  const ctx: SetContext = {
    model,
    prep,
    req,
    units,
    targets,
    omegaTargets,
    intervals,
    bandSource,
    vectors: set,
    measure,
    base: req.excitation.kind === 'base',
    rec: setReceptance(prep, set, grid),
    effectiveMass,
    mass: units.map((x, i) => x.mass ?? (x.massRatio ?? 0) * (effectiveMass[i] ?? 0)),
    psi,
    residual: null,
  }
  ctx.residual = residualSetResonance(ctx)
  return ctx
}

/** The sizing grid of each target over each interval, merged: dense near every target mode. */
function unionGrid(intervals: Band[], targets: number[], include: Float64Array): Float64Array {
  const pts: number[] = []
  for (const band of intervals) {
    const inside = targets.filter((w) => w >= band.min && w <= band.max)
    const centre = inside.length > 0 ? inside : [Math.sqrt(band.min * band.max)]
    for (const w of centre) pts.push(...frequencyGrid(band, w, { include }))
  }
  pts.sort((a, b) => a - b)
  return Float64Array.from(pts.filter((w, i) => i === 0 || w > (pts[i - 1] ?? 0) * (1 + 1e-12)))
}
