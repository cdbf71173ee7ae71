import { computed, onBeforeUnmount, ref, watch } from 'vue'
import {
  fieldText,
  kindHint,
  rangeWarning,
  readField,
  understood,
  type FieldSpec,
} from '@shared/field-text'
import { useUnreadableRegistry } from '@/forms/form-errors'

export interface QuantityState {
  /** SI value, or minor units for money; undefined when the field is empty */
  modelValue: number | null | undefined
  label: string
  spec: FieldSpec
  /** an empty field stands for "none" instead of being an error */
  optional?: boolean
  /** what ArrowUp / ArrowDown add or take away, in the stored unit */
  step?: number
}

const same = (a: number | null | undefined, b: number | null | undefined) =>
  (a ?? undefined) === (b ?? undefined)

/**
 * A typed number bound to a stored value. The text is the person's: it is read only when they
 * commit it (leaving the field, Enter, a step) and never rewritten while they type; the stored
 * value is shown back as understood, and an unusual value is warned about, never clamped.
 * @param state the field's props
 * @param emit called with each value the person commits
 * @param id the field's id, for the form's list of fields that cannot be read
 */
export function useQuantityInput(
  state: QuantityState,
  emit: (v: number | undefined) => void,
  id: string,
) {
  const show = (v: number | null | undefined) =>
    v === undefined || v === null ? '' : fieldText(v, state.spec)
  const text = ref(show(state.modelValue))
  const focused = ref(false)
  const problem = ref('')
  const registry = useUnreadableRegistry()
  let committed = text.value
  let emitted = state.modelValue

  function setProblem(message: string) {
    problem.value = message
    if (message) registry?.set(id, { label: state.label, message })
    else registry?.delete(id)
  }

  watch(
    () => state.modelValue,
    (v) => {
      if (same(v, emitted)) return
      emitted = v
      // a value from elsewhere (a template, a slider, a reload): show it unless they are typing
      if (focused.value && text.value !== committed) return
      text.value = committed = show(v)
      setProblem('')
    },
  )

  function commit() {
    if (text.value === committed) return setProblem('')
    if (text.value.trim() === '' && state.optional) {
      setProblem('')
      committed = text.value
      emitted = undefined
      return emit(undefined)
    }
    const r = readField(text.value, state.spec)
    if (!r.ok) return setProblem(r.message)
    setProblem('')
    committed = text.value
    emitted = r.value
    emit(r.value)
  }

  function stepBy(sign: 1 | -1) {
    if (!state.step) return
    const r = readField(text.value, state.spec)
    const base = r.ok ? r.value : (state.modelValue ?? 0)
    text.value = show(Number((base + sign * state.step).toPrecision(12)))
    commit()
  }

  const note = computed(() => {
    const v = state.modelValue
    if (v === undefined || v === null)
      return { understood: state.optional ? 'none' : '', warning: '' }
    return { understood: understood(v, state.spec), warning: rangeWarning(v, state.spec) }
  })
  const typing = computed(() => focused.value && text.value !== committed)
  const hint = computed(() => kindHint(state.spec))

  onBeforeUnmount(() => registry?.delete(id))

  return { text, focused, problem, note, typing, hint, commit, stepBy }
}
