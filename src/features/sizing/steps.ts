/** The workspace's steps in order; the slug is the last part of the step's address. */
export const SIZING_STEPS = [
  { slug: 'structure', label: 'Structure' },
  { slug: 'records', label: 'Site records' },
  { slug: 'target', label: 'Target' },
  { slug: 'absorber', label: 'Absorber' },
  { slug: 'results', label: 'Results' },
  { slug: 'handover', label: 'Hand over' },
] as const
export type SizingStep = (typeof SIZING_STEPS)[number]['slug']

/** The route pattern of the optional step part of a workspace address. */
export const STEP_PATTERN = `:step(${SIZING_STEPS.map((s) => s.slug).join('|')})?`
