import { expect } from 'vitest'
import type { SizingResult } from '../../shared/dynamics'
import type { ModelInput } from '../../shared/schemas/model'
import { validModel } from './invalid-models'

/** One command-line input and what its output must show. */
export interface CliCase {
  name: string
  model: ModelInput
  check(out: SizingResult): void
}

const base = validModel()

/** Every input combination of the README/DEVELOPERS.md tables, each run through the CLI. */
export const cliCases: CliCase[] = [
  {
    name: 'a force vector, velocity response',
    model: {
      ...base,
      excitation: {
        kind: 'forces',
        forces: [
          { node: 'deck', amplitude: 300 },
          { node: 'rail', amplitude: 100 },
        ],
      },
      response: { node: 'rail', quantity: 'velocity' },
    },
    check(out) {
      expect(out.excitation).toMatchObject({ kind: 'forces', nodes: ['deck', 'rail'], unit: 'N' })
      expect(out.excitationNode).toBeNull()
      expect(out.response).toMatchObject({ node: 'rail', quantity: 'velocity', unit: 'm/s' })
      expect(out.peak.unit).toBe('m/s per N')
      expect(out.peak.with).toBeLessThan(out.peak.without ?? 0)
    },
  },
  {
    name: 'a mode-shaped load, acceleration response',
    model: {
      ...base,
      excitation: { kind: 'mode-shaped', amplitude: 280 },
      response: { node: 'deck', quantity: 'acceleration' },
    },
    check(out) {
      expect(out.excitation).toMatchObject({ kind: 'mode-shaped', mode: 1, amplitude: 280 })
      expect(out.peak.unit).toBe('m/s² per N')
    },
  },
  {
    name: 'base acceleration, absolute acceleration response',
    model: {
      ...base,
      excitation: { kind: 'base', amplitude: 0.5 },
      response: { node: 'deck', quantity: 'acceleration' },
    },
    check(out) {
      expect(out.excitation).toMatchObject({ kind: 'base', nodes: [], unit: 'm/s²' })
      expect(out.response.frame).toBe('absolute')
      expect(out.peak.unit).toBe('m/s² per m/s²')
      expect(out.peak.with).toBeLessThan(out.peak.without ?? 0)
    },
  },
  {
    name: 'base acceleration, relative displacement response',
    model: { ...base, excitation: { kind: 'base' } },
    check(out) {
      expect(out.response.frame).toBe('relative')
      expect(out.peak.unit).toBe('m per m/s²')
    },
  },
  {
    name: 'a single running speed with an unbalance',
    model: {
      ...base,
      excitation: { node: 'deck', unbalance: true, amplitude: 0.02 },
      speed: { hz: 4 },
    },
    check(out) {
      expect(out.speed).toEqual({ minHz: 4, maxHz: 4 })
      expect(out.band).toMatchObject({ minHz: 4, maxHz: 4, source: 'speed' })
      expect(out.absorber?.frequencyHz).toBeCloseTo(4, 9)
      expect(out.peak.unit).toBe('m per kg·m')
    },
  },
  {
    name: 'a speed range',
    model: { ...base, speed: { minHz: 3.5, maxHz: 4.5 } },
    check(out) {
      expect(out.band).toMatchObject({ minHz: 3.5, maxHz: 4.5, source: 'speed' })
    },
  },
]
