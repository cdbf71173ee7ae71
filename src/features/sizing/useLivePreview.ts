import { onBeforeUnmount, ref, toRaw, type Ref } from 'vue'
import { watchDebounced } from '@vueuse/core'
import type { ModelDefinition, SizingInput } from '@shared/schemas/sizing'
import { previewSizing, type SizingPreview } from './preview'

const DEBOUNCE_MS = 150

function startWorker(): Worker | null {
  try {
    return new Worker(new URL('./preview.worker.ts', import.meta.url), {
      type: 'module',
    })
  } catch {
    return null
  }
}

/**
 * Recomputes the sizing in the browser 150 ms after the last change, in a Web Worker when the
 * browser has one; only the answer to the latest request is kept, and a newer request stops the
 * worker still computing an older one.
 * @param source the model and the choices, or null while nothing is loaded
 */
export function useLivePreview(source: Ref<{ model: ModelDefinition; input: SizingInput } | null>) {
  const preview = ref<SizingPreview | null>(null)
  const busy = ref(false)
  let worker: Worker | null = null
  let seq = 0

  function attach(w: Worker | null): Worker | null {
    if (!w) return null
    w.onerror = () => {
      // the worker could not start (old browser, blocked script): compute here instead
      w.terminate()
      worker = null
      run()
    }
    w.onmessage = (e: MessageEvent<{ id: number; preview: SizingPreview }>) => {
      if (e.data.id !== seq) return
      preview.value = e.data.preview
      busy.value = false
    }
    return w
  }
  worker = attach(startWorker())

  function run() {
    const s = source.value
    if (!s) return
    // A newer preview supersedes one still computing: stop that worker rather than wait for it.
    if (busy.value && worker) {
      worker.terminate()
      worker = attach(startWorker())
    }
    const id = ++seq
    busy.value = true
    // A deep plain copy: reactive proxies cannot be posted to a worker.
    const payload = JSON.parse(JSON.stringify(toRaw(s))) as typeof s
    if (worker) worker.postMessage({ id, ...payload })
    else {
      preview.value = previewSizing(payload.model, payload.input)
      busy.value = false
    }
  }

  const stop = watchDebounced(source, run, { debounce: DEBOUNCE_MS, deep: true, immediate: true })

  onBeforeUnmount(() => {
    stop()
    worker?.terminate()
    worker = null
  })

  return { preview, busy }
}
