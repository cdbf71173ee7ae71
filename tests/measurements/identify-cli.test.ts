import { spawnSync } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { mac } from '../../shared/measurements/index'
import { ambientResponse, chainModes } from './helpers/chain'

const root = new URL('../../', import.meta.url).pathname

function identify(...args: string[]) {
  return spawnSync('npx', ['tsx', 'server/scripts/identify.ts', ...args], {
    cwd: root,
    encoding: 'utf8',
    timeout: 60_000,
  })
}

describe('identify command line', () => {
  let heelDrop: ReturnType<typeof identify> | undefined
  const heelDropRun = () => (heelDrop ??= identify('seed/records/heel-drop-office-floor.csv'))

  it('prints frequencies and damping ratios, largest prominence first, for a good file', () => {
    const run = heelDropRun()
    expect(run.stderr).toBe('')
    expect(run.status).toBe(0)
    const out = JSON.parse(run.stdout) as {
      sampleRateHz: number
      resolutionHz: number
      peaks: { frequencyHz: number; dampingRatio: number; method: string; prominence: number }[]
    }
    expect(out.sampleRateHz).toBeCloseTo(200, 6)
    expect(out.resolutionHz).toBeGreaterThan(0)
    // The demo floor was synthesized with modes at 6.3 Hz (2.5 %) and 14.8 Hz (3 %).
    expect(out.peaks[0]?.frequencyHz).toBeCloseTo(6.3, 1)
    expect(out.peaks[0]?.method).toBe('log-decrement')
    expect(Math.abs((out.peaks[0]?.dampingRatio ?? 0) / 0.025 - 1)).toBeLessThan(0.3)
    const prominences = out.peaks.map((p) => p.prominence)
    expect(prominences).toEqual([...prominences].sort((a, b) => b - a))
  }, 60_000)

  it('prints modes of a single channel with one-entry shapes beside the peaks', () => {
    const run = heelDropRun()
    const out = JSON.parse(run.stdout) as {
      timeUnit: string
      channels: { name: string; column: number }[]
      modes: { frequencyHz: number; dampingRatio: number; shape: number[] }[]
    }
    expect(out.timeUnit).toBe('s')
    expect(out.channels).toEqual([{ name: 'acceleration_m_s2', column: 2 }])
    // synthesized with 6.3 Hz at 2.5 % and 14.8 Hz at 3 % (write-sample-records.ts)
    expect(out.modes.map((m) => m.shape)).toEqual([[1], [1]])
    expect(Math.abs(out.modes[0]!.frequencyHz / 6.3 - 1)).toBeLessThan(0.005)
    expect(Math.abs(out.modes[1]!.frequencyHz / 14.8 - 1)).toBeLessThan(0.005)
    expect(Math.abs(out.modes[0]!.dampingRatio / 0.025 - 1)).toBeLessThan(0.25)
  }, 60_000)

  it('prints a shape entry per channel in column order for a three-channel ambient record', () => {
    // uniform three-mass chain, first mode 3 Hz (closed form, see oma-chain.test.ts); the file
    // lists the masses in the order 3, 1, 2 with the time in milliseconds
    const m = 1000
    const k = ((2 * Math.PI * 3) ** 2 * m) / (4 * Math.sin(Math.PI / 8) ** 2)
    const truth = chainModes(3, m, k, 0.02)
    const [a1, a2, a3] = ambientResponse(truth, 25, 1200, 100, 0.01, 5)
    const rows = ['time_ms,mass3,mass1,mass2']
    for (let j = 0; j < a1!.length; j++) {
      rows.push([j * 40, a3![j], a1![j], a2![j]].map((v) => Number(v!.toPrecision(6))).join(','))
    }
    const file = join(mkdtempSync(join(tmpdir(), 'identify-')), 'chain.csv')
    writeFileSync(file, rows.join('\n') + '\n')
    const run = identify(file)
    expect(run.stderr).toBe('')
    const out = JSON.parse(run.stdout) as {
      sampleRateHz: number
      timeUnit: string
      channels: { name: string }[]
      modes: { frequencyHz: number; shape: number[] }[]
    }
    expect(out.sampleRateHz).toBeCloseTo(25, 6)
    expect(out.timeUnit).toBe('ms')
    expect(out.channels.map((c) => c.name)).toEqual(['mass3', 'mass1', 'mass2'])
    expect(out.modes).toHaveLength(3)
    out.modes.forEach((mode, i) => {
      const t = truth[i]!
      expect(Math.abs(mode.frequencyHz / t.frequencyHz - 1)).toBeLessThan(0.005)
      expect(mac(mode.shape, [t.shape[2]!, t.shape[0]!, t.shape[1]!])).toBeGreaterThan(0.98)
    })
    // the same file by covariance-driven subspace identification (Peeters & De Roeck 1999)
    const bySsi = identify(file, '--method', 'ssi')
    const ssi = JSON.parse(bySsi.stdout) as { modes: { frequencyHz: number; method: string }[] }
    expect(ssi.modes.map((mode) => mode.method)).toEqual(['ssi-cov', 'ssi-cov', 'ssi-cov'])
    ssi.modes.forEach((mode, i) => {
      expect(Math.abs(mode.frequencyHz / truth[i]!.frequencyHz - 1)).toBeLessThan(0.005)
    })
  }, 90_000)

  it('asks for the time unit when the step fits both, and takes it as an option', () => {
    const rows = ['t,a']
    for (let j = 0; j < 200; j++) rows.push(`${(j * 0.2).toFixed(1)},${Math.sin(j)}`)
    const file = join(mkdtempSync(join(tmpdir(), 'identify-')), 'ambiguous.csv')
    writeFileSync(file, rows.join('\n') + '\n')
    const run = identify(file)
    expect(run.status).toBe(2)
    expect(run.stderr).toBe(
      `identify: ${file}: line 2: the time step 0.2 is 5 Hz sampling in seconds or 5000 Hz ` +
        'in milliseconds: give the time unit (s or ms)\n',
    )
    const asked = identify(file, '--time-unit', 'ms')
    expect(asked.status).toBe(0)
    expect((JSON.parse(asked.stdout) as { sampleRateHz: number }).sampleRateHz).toBeCloseTo(5000)
  }, 60_000)

  it('exits with code 2 and one line on stderr for a malformed file', () => {
    const dir = mkdtempSync(join(tmpdir(), 'identify-'))
    const file = join(dir, 'broken.csv')
    writeFileSync(file, 'time,acc\n0,0.1\n0.01,0.2\n0.02,oops\n')
    const run = identify(file)
    expect(run.status).toBe(2)
    expect(run.stdout).toBe('')
    expect(run.stderr).toBe(`identify: ${file}: line 4: column 2: 'oops' is not a number\n`)
  }, 60_000)
})
