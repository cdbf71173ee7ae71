// Writes the demo records under seed/records once: `npx tsx tests/measurements/helpers/write-sample-records.ts`.
// Invented scenarios, synthesized from known modes so the demo shows what identification finds.
import { writeFileSync } from 'node:fs'
import { recordCsv } from './csv'
import { ambient, freeDecay } from './synthesize'

const out = new URL('../../../seed/records/', import.meta.url)

// Heel-drop on an office floor bay (invented): 6.3 Hz at 2.5 % and 14.8 Hz at 3 %.
const decay = freeDecay(
  [
    { mode: { frequencyHz: 6.3, dampingRatio: 0.025 }, velocity: 0.012 },
    { mode: { frequencyHz: 14.8, dampingRatio: 0.03 }, velocity: 0.004 },
  ],
  200,
  12,
  0.003,
  20240611,
  0.5,
)
writeFileSync(
  new URL('heel-drop-office-floor.csv', out),
  recordCsv(decay, { sampleRateHz: 200, header: 'time_s,acceleration_m_s2', digits: 5 }),
)

// Ambient record on a footbridge span (invented), one column at 20 Hz: 1.8 Hz at 1.5 %, 4.6 Hz at 2 %.
const walk = ambient(
  [
    { mode: { frequencyHz: 1.8, dampingRatio: 0.015 }, gain: 0.02 },
    { mode: { frequencyHz: 4.6, dampingRatio: 0.02 }, gain: 0.012 },
  ],
  20,
  900,
  0.002,
  770411,
)
writeFileSync(new URL('ambient-footbridge-20Hz.csv', out), recordCsv(walk, { digits: 4 }))
