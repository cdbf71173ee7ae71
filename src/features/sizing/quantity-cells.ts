import type { FieldKind } from '@shared/field-text'
import type { QuantityField } from './quantity-fields'

/** A number cell of a table row: its label is for screen readers and the tests, not shown. */
export type QuantityCell = Omit<QuantityField, 'inputId'> & { compact: true }

const cell = (label: string, kind: FieldKind, path: string, optional?: true): QuantityCell => ({
  compact: true,
  label,
  kind,
  path,
  optional,
})
const springPath = (i: number, key: string) => `definition.springs.${i}.${key}`

/** Force i of a force vector (the browser tests find it by its id). */
export const forceCell = (i: number) => ({
  ...cell(`Force ${i + 1}`, 'force', `input.forces.${i}.amplitude`),
  inputId: `force-amplitude-${i + 1}`,
})

/** The number cells of the structure tables: node i's mass, spring i's stiffness and dashpot. */
export const STRUCTURE_CELLS = {
  mass: (i: number, id: string) => cell(`Mass of ${id}`, 'mass', `definition.nodes.${i}.mass`),
  stiffness: (i: number) =>
    cell(`Stiffness of spring ${i + 1}`, 'stiffness', springPath(i, 'stiffness')),
  /** an empty dashpot means none */
  damping: (i: number) =>
    cell(`Dashpot of spring ${i + 1}`, 'damping', springPath(i, 'damping'), true),
}
