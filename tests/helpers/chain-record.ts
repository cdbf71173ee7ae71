import { ambientResponse, chainModes } from '../measurements/helpers/chain'

// Three equal masses between two supports joined by four equal springs (uniform fixed–fixed
// chain): ω_r² = (4k/m) sin²(rπ/8), φ_jr = sin(jrπ/4), the textbook closed form
// (docs/engineering/host-model.md#chain-check-values). The site's true springs are 10 % stiffer than the model
// the engineer drew, so updating the one stiffness group should find a factor of 1.1.
export const CHAIN_MASS = 2000
/** N/m of the model as drawn: a first mode at 4 Hz */
export const CHAIN_K = ((2 * Math.PI * 4) ** 2 * CHAIN_MASS) / (4 * Math.sin(Math.PI / 8) ** 2)
export const TRUE_SCALE = 1.1

/** The host model as the engineer drew it (masses m1…m3, supports left and right). */
export function chainDefinition() {
  const ids = ['left', 'm1', 'm2', 'm3', 'right']
  return {
    nodes: ids.map((id, i) =>
      i === 0 || i === 4 ? { id, fixed: true } : { id, mass: CHAIN_MASS },
    ),
    springs: ids.slice(1).map((to, i) => ({ from: ids[i]!, to, stiffness: CHAIN_K })),
    hostDampingRatio: 0.02,
  }
}

/** The true modes of the site's chain, 2 % damping. */
export const chainTruth = () => chainModes(3, CHAIN_MASS, TRUE_SCALE * CHAIN_K, 0.02)

/**
 * An ambient record of the true chain at its three masses: seeded white forces, 0.005 m/s²
 * sensor noise, 300 s at 40 Hz (1200 periods of the first mode). Time in ms when asked, with a
 * header that names the unit or not.
 */
export function chainRecordCsv(opts: { ms?: boolean; unitInHeader?: boolean; seed?: number } = {}) {
  const fs = 40
  const channels = ambientResponse(chainTruth(), fs, 300, 100, 0.005, opts.seed ?? 16)
  const unit = opts.ms ? 'ms' : 's'
  const time = opts.unitInHeader === false ? 'time' : `time_${unit}`
  const lines = [`${time},a_m1,a_m2,a_m3`]
  const scale = opts.ms ? 1000 : 1
  for (let j = 0; j < channels[0]!.length; j++) {
    const t = Number(((j / fs) * scale).toFixed(6))
    lines.push([t, ...channels.map((c) => Number(c[j]!.toPrecision(6)))].join(','))
  }
  return Buffer.from(lines.join('\n') + '\n')
}
