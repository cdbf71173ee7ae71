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
  {
    name: 'an absorber acting between two nodes',
    model: { ...base, absorber: { node: 'rail', relativeTo: 'deck', massRatio: 0.02 } },
    check(out) {
      expect(out.absorber?.relativeTo).toBe('deck')
      expect(out.peak.with).toBeLessThan(out.peak.without ?? 0)
    },
  },
  {
    name: 'a stroke limit at the design load',
    model: {
      ...base,
      excitation: { node: 'deck', amplitude: 500 },
      absorber: { node: 'deck', massRatio: 0.02, strokeLimit: 0.02 },
    },
    check(out) {
      expect(out.absorber?.strokeLimit).toBe(0.02)
      expect(out.design?.maxStroke).toBeLessThanOrEqual(0.02)
      expect(out.design?.strokeWithinLimit).toBe(true)
    },
  },
  {
    name: 'a pure dashpot and a massless node',
    model: {
      ...base,
      nodes: [...base.nodes, { id: 'hanger' }],
      springs: [
        ...base.springs,
        { from: 'rail', to: 'hanger', stiffness: 2e6 },
        { from: 'hanger', to: 'ground', stiffness: 2e6 },
        { from: 'deck', to: 'ground', stiffness: 0, damping: 800 },
      ],
      response: { node: 'hanger' },
    },
    check(out) {
      expect(out.nodeIds).toEqual(['deck', 'rail', 'hanger'])
      expect(out.modes).toHaveLength(2)
      expect(out.notes.join(' ')).toMatch(/'hanger' condensed statically/)
      expect(out.peak.with).toBeLessThan(out.peak.without ?? 0)
    },
  },
]
