import type { ModelDefinition } from '@shared/schemas/sizing'
import type { ModelUpdateRequest } from '@shared/schemas/record-analysis'

/** The stiffness groups an engineer can put springs in; the masses have one group. */
export const STIFFNESS_GROUPS = ['A', 'B', 'C'] as const
export type GroupChoice = '' | (typeof STIFFNESS_GROUPS)[number]

/**
 * The parameter groups of an update from the engineer's choices: springs by their group letter,
 * masses ticked into one mass group. Empty groups are left out.
 * @param definition the model revision being updated
 * @param springGroup group letter per spring index ('' keeps the spring as it is)
 * @param massNodes node ids whose masses scale together
 */
export function updateGroups(
  definition: ModelDefinition,
  springGroup: GroupChoice[],
  massNodes: string[],
): ModelUpdateRequest['groups'] {
  const stiffness = STIFFNESS_GROUPS.map((g) => ({
    kind: 'stiffness' as const,
    name: `stiffness group ${g}`,
    springs: definition.springs.map((_, i) => i).filter((i) => springGroup[i] === g),
  })).filter((g) => g.springs.length)
  const mass = massNodes.length
    ? [{ kind: 'mass' as const, name: 'mass group', nodes: massNodes }]
    : []
  return [...stiffness, ...mass]
}
