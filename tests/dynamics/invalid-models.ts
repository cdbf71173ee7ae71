import type { ModelInput } from '../../shared/schemas/model'

/** A valid two-node model that each invalid case breaks in one place. */
export function validModel(): ModelInput {
  return {
    nodes: [
      { id: 'ground', fixed: true },
      { id: 'deck', mass: 1000 },
      { id: 'rail', mass: 200 },
    ],
    springs: [
      { from: 'ground', to: 'deck', stiffness: 1e6, damping: 0 },
      { from: 'deck', to: 'rail', stiffness: 5e5 },
    ],
    hostDampingRatio: 0.01,
    absorber: { node: 'deck', massRatio: 0.02, tuning: 'optimize' },
    excitation: { node: 'deck' },
    response: { node: 'deck' },
    targetMode: 1,
  }
}

/** One broken model: the field and message the engine must report. JSON text for the CLI, where a
 * non-finite number can only be written as an overflowing literal such as 1e400. */
export interface InvalidCase {
  name: string
  model: ModelInput
  field: string
  message: RegExp
  /** the CLI line when it differs (zod reports non-finite numbers before the engine sees them) */
  cli?: RegExp
  json?: string
  /** refused by the schema, before the engine (the engine itself ignores extra keys) */
  schemaOnly?: boolean
}

const edit = (f: (m: ModelInput) => void): ModelInput => {
  const m = validModel()
  f(m)
  return m
}
const at = <T>(list: T[], i: number): T => list[i] as T

export const invalidCases: InvalidCase[] = [
  {
    name: 'an unknown node id',
    model: edit((m) => (at(m.springs, 1).to = 'rial')),
    field: 'springs[1].to',
    message: /^springs\[1\]\.to: unknown node id 'rial'$/,
  },
  {
    name: 'a duplicate node id',
    model: edit((m) => m.nodes.push({ id: 'deck', mass: 5 })),
    field: 'nodes[3].id',
    message: /^nodes\[3\]\.id: duplicate node id 'deck' \(first at nodes\[1\]\)$/,
  },
  {
    name: 'a non-finite mass',
    model: edit((m) => (at(m.nodes, 2).mass = Infinity)),
    field: 'nodes[2].mass',
    message: /^nodes\[2\]\.mass: must be a finite number of kg/,
    json: JSON.stringify(validModel()).replace('"mass":200', '"mass":1e400'),
    cli: /nodes\[2\]\.mass: expected a finite number/,
  },
  {
    name: 'a negative mass',
    model: edit((m) => (at(m.nodes, 2).mass = -200)),
    field: 'nodes[2].mass',
    message: /^nodes\[2\]\.mass: must not be negative \(kg\), got -200$/,
  },
  {
    name: 'a non-finite stiffness',
    model: edit((m) => (at(m.springs, 0).stiffness = NaN)),
    field: 'springs[0].stiffness',
    message: /^springs\[0\]\.stiffness: must be a finite number of N\/m, got NaN$/,
    json: JSON.stringify(validModel()).replace('"stiffness":1000000', '"stiffness":1e400'),
    cli: /springs\[0\]\.stiffness: expected a finite number/,
  },
  {
    name: 'a spring with neither stiffness nor damping',
    model: edit((m) => (at(m.springs, 1).stiffness = 0)),
    field: 'springs[1].stiffness',
    message: /^springs\[1\]\.stiffness: a spring with stiffness 0 and no damping does nothing/,
  },
  {
    name: 'a negative stiffness',
    model: edit((m) => (at(m.springs, 1).stiffness = -5)),
    field: 'springs[1].stiffness',
    message: /^springs\[1\]\.stiffness: must not be negative \(N\/m\), got -5$/,
  },
  {
    name: 'a node held only by a dashpot',
    model: edit((m) => {
      m.nodes.push({ id: 'cart', mass: 10 })
      m.springs.push({ from: 'ground', to: 'cart', stiffness: 0, damping: 50 })
    }),
    field: 'nodes[3]',
    message: /^nodes\[3\]: node 'cart' has no path through springs to a fixed node/,
  },
  {
    name: 'a negative damping',
    model: edit((m) => (at(m.springs, 0).damping = -3)),
    field: 'springs[0].damping',
    message: /^springs\[0\]\.damping: must not be negative \(N·s\/m\), got -3$/,
  },
  {
    name: 'a spring from a node to itself',
    model: edit((m) => m.springs.push({ from: 'rail', to: 'rail', stiffness: 1 })),
    field: 'springs[2].to',
    message: /^springs\[2\]\.to: spring from node 'rail' to itself$/,
  },
  {
    name: 'a free group with no path to a support',
    model: edit((m) => {
      m.nodes.push({ id: 'cart', mass: 10 }, { id: 'load', mass: 10 })
      m.springs.push({ from: 'cart', to: 'load', stiffness: 1e3 })
    }),
    field: 'nodes[3]',
    message: /^nodes\[3\]: node 'cart' \(and 1 other free node\(s\)\) has no path .* rigid body/,
  },
  {
    name: 'an absorber on a grounded node',
    model: edit((m) => m.absorber && (m.absorber.node = 'ground')),
    field: 'absorber.node',
    message:
      /^absorber\.node: node 'ground' is fixed \(grounded\); an absorber must be a free node$/,
  },
  {
    name: 'a dashpot on a massless node',
    model: edit((m) => {
      delete at(m.nodes, 2).mass
      at(m.springs, 1).damping = 40
    }),
    field: 'springs[1].damping',
    message:
      /^springs\[1\]\.damping: a dashpot on massless node 'rail' cannot be condensed exactly/,
  },
  {
    name: 'a model without mass',
    model: edit((m) => m.nodes.forEach((x) => delete x.mass)),
    field: 'nodes',
    message: /^nodes: every free node is massless/,
  },
  {
    name: 'a target mode that does not exist',
    model: edit((m) => (m.targetMode = 3)),
    field: 'targetMode',
    message: /^targetMode: mode 3 does not exist: the host has 2 mode\(s\)/,
  },
  {
    name: 'a negative host damping ratio',
    model: edit((m) => (m.hostDampingRatio = [0.01, -0.02])),
    field: 'hostDampingRatio[1]',
    message: /^hostDampingRatio\[1\]: must be a damping ratio in \[0, 1\), got -0.02$/,
  },
  {
    name: 'a mass ratio of zero',
    model: edit((m) => m.absorber && (m.absorber.massRatio = 0)),
    field: 'absorber.massRatio',
    message: /^absorber\.massRatio: must be a positive finite number, got 0$/,
  },
  {
    name: 'a force vector without forces',
    model: edit((m) => (m.excitation = { kind: 'forces' })),
    field: 'excitation.forces',
    message: /^excitation\.forces: is required for kind 'forces'$/,
  },
  {
    name: 'a node given with base motion',
    model: edit((m) => (m.excitation = { kind: 'base', node: 'deck' })),
    field: 'excitation.node',
    message: /^excitation\.node: applies to kind 'force', not 'base'$/,
  },
  {
    name: 'an unbalance under base motion',
    model: edit((m) => (m.excitation = { kind: 'base', unbalance: true })),
    field: 'excitation.unbalance',
    message: /^excitation\.unbalance: applies to kind 'force' or 'forces', not 'base'$/,
  },
  {
    name: 'a mode-shaped load on a mode that does not exist',
    model: edit((m) => (m.excitation = { kind: 'mode-shaped', mode: 3 })),
    field: 'excitation.mode',
    message: /^excitation\.mode: mode 3 does not exist: the host has 2 mode\(s\)$/,
  },
  {
    name: 'a zero load amplitude',
    model: edit((m) => (m.excitation = { node: 'deck', amplitude: 0 })),
    field: 'excitation.amplitude',
    message: /^excitation\.amplitude: must be a positive finite number, got 0$/,
  },
  {
    name: 'both a band and a running speed',
    model: edit((m) => Object.assign(m, { band: { minHz: 1, maxHz: 9 }, speed: { hz: 4 } })),
    field: 'speed',
    message: /^speed: give either a band or a running speed, not both$/,
  },
  {
    name: 'a speed range upside down',
    model: edit((m) => (m.speed = { minHz: 5, maxHz: 4 })),
    field: 'speed.maxHz',
    message: /^speed\.maxHz: must be above speed\.minHz$/,
  },
  {
    name: 'a misspelt key',
    model: edit((m) => Object.assign(m, { hostDampingRatios: 0.02 })),
    field: '(top level)',
    message: /^$/,
    cli: /^solve: invalid model: \(top level\): unknown key 'hostDampingRatios' — did you mean 'hostDampingRatio'\?$/,
    schemaOnly: true,
  },
]
