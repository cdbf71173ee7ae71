import { ref, watch, type Ref } from 'vue'
import { formatSi, parseQuantity, type QuantityKind } from '@shared/units'

/**
 * Text typed with units ("35 kN/mm") bound to an SI number: the number follows the text while it
 * parses, and the text follows the number when it changes from elsewhere.
 * @param value the SI number (model)
 * @param kind what the field holds
 * @param onValue called with each new valid SI value
 */
export function useQuantityInput(
  value: Ref<number | undefined>,
  kind: QuantityKind,
  onValue: (v: number) => void,
) {
  const show = (v: number | undefined) => (v === undefined ? '' : formatSi(v, kind))
  const text = ref(show(value.value))
  const error = ref('')
  let last = value.value

  watch(value, (v) => {
    if (v !== last) {
      text.value = show(v)
      error.value = ''
      last = v
    }
  })

  function input(t: string) {
    text.value = t
    const p = parseQuantity(t, kind)
    if (!p.ok) {
      error.value = p.message
      return
    }
    error.value = ''
    last = p.value
    onValue(p.value)
  }

  return { text, error, input, si: () => show(value.value) }
}
