const choice = (inputId: string, label: string) => ({ inputId, label })

/**
 * The drop-downs of the sizing steps, bound with `v-bind` on a SizingChoice: the id the browser
 * tests find each by, and its label.
 */
export const SIZING_CHOICES = {
  loadKind: choice('load-kind', 'Kind of load'),
  loadPreset: choice('load-preset', 'Force'),
  loadMode: choice('load-mode', 'Shaped like'),
  limitQuantity: choice('limit-quantity', 'Quantity'),
  relativeToNode: choice('relative-to-node', 'The absorber acts on'),
  tuning: choice('tuning', 'Tuning'),
  absorberNode: choice('absorber-node', 'Attachment node'),
  excitationNode: choice('excitation-node', 'Where it acts (excitation node)'),
  responseNode: choice('response-node', 'Response node'),
}

/** The structure's nodes as the options of a drop-down, each shown by its id. */
export const nodeOptions = (ids: readonly string[]) => ids.map((id) => ({ label: id, value: id }))
