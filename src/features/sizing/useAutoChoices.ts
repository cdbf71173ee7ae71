import { watch, type Ref } from 'vue'
import type { SizingPreview } from './preview'
import { useSizingDraftStore } from './draft-store'

/**
 * Keeps the node and mode choices valid as the structure changes: a node that no longer exists
 * is cleared, and an empty attachment node is filled with the node of largest |φ| of the target
 * mode (where the absorber's mass works hardest), as are empty excitation and response nodes.
 */
export function useAutoChoices(preview: Ref<SizingPreview | null>) {
  const store = useSizingDraftStore()
  watch(
    () => preview.value?.nodeIds.join('|') + `#${preview.value?.modes.length}`,
    () => {
      const d = store.current
      const p = preview.value
      if (!d || !p || p.modes.length === 0) return
      const f = d.form
      const ids = new Set(p.nodeIds)
      const stale = [f.absorberNode, f.excitationNode, f.responseNode].some((n) => n && !ids.has(n))
      const mode = p.modes.find((m) => m.number === f.targetMode) ?? p.modes[0]
      const needsPick = !f.absorberNode || stale || f.targetMode > p.modes.length
      if (!needsPick || !mode) return
      let best = 0
      const shape = mode.shape ?? []
      shape.forEach((v, i) => {
        if (Math.abs(v) > Math.abs(shape[best] ?? 0)) best = i
      })
      store.keepNodeChoices(p.nodeIds[best] ?? '', ids, p.modes.length)
    },
  )
}
