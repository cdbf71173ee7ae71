import recorded from './optimum-before.json'

/**
 * The optimiser's objective on the seed models before its search was changed (issue 14: thin search
 * grid, rough then fine simplex), recorded from the engine at commit cbfdc40: per model and
 * objective, one value per mass ratio of SWEEP_MASS_RATIOS (peak in the model's measure per unit
 * load for 'hinf', the band integral of its square for 'h2'). The search may move the optimum
 * but never to a worse one (optimum-no-worse.test.ts). The values are data, kept in
 * optimum-before.json beside this file.
 */
export const OPTIMUM_BEFORE: Record<string, { hinf: number[]; h2: number[] }> = recorded
