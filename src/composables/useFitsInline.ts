import { nextTick, onBeforeUnmount, onMounted, ref, watch, type Ref } from 'vue'

/**
 * Whether a row of items fits on a bar beside its fixed parts. `ghost` is a hidden copy of the
 * row at its natural width; `fixedSelector` names the bar's other children that keep their width.
 * Re-measured when the bar is resized or the items change.
 */
export function useFitsInline(
  bar: Ref<HTMLElement | null>,
  ghost: Ref<HTMLElement | null>,
  fixedSelector: string,
  items: () => unknown,
) {
  const fits = ref(true)
  function measure() {
    const b = bar.value
    const g = ghost.value
    if (!b || !g) return
    const style = getComputedStyle(b)
    const gap = parseFloat(style.columnGap) || 0
    const fixed = [...b.querySelectorAll<HTMLElement>(fixedSelector)]
    const taken = fixed.reduce((sum, el) => sum + el.offsetWidth + gap, 0)
    const room = b.clientWidth - parseFloat(style.paddingLeft) - parseFloat(style.paddingRight)
    fits.value = g.offsetWidth + taken <= room
  }
  let observer: ResizeObserver | null = null
  onMounted(() => {
    observer = new ResizeObserver(measure)
    if (bar.value) observer.observe(bar.value)
    measure()
    // the row's width changes once the web font has loaded
    void document.fonts?.ready.then(measure)
  })
  onBeforeUnmount(() => observer?.disconnect())
  watch(items, () => nextTick(measure), { deep: true })
  return fits
}
