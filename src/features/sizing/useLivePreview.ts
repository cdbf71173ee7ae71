import { onBeforeUnmount, ref, toRaw, type Ref } from 'vue'
import { watchDebounced } from '@vueuse/core'
import type { ModelDefinition, SizingInput } from '@shared/schemas/sizing'
import type { SizingPreview } from './preview'

const DEBOUNCE_MS = 150

/**
 * What the preview says where no worker can start: no numbers, only the model's free nodes, so
 * the choices can still be made and saved for the server to compute. The engine runs only in
 * the worker: a copy on the main thread would double the sizing page's download for browsers
 * that tablets no longer run (every current one has module workers).
 */
export function noPreview(model: ModelDefinition): SizingPreview {
  return {
    nodeIds: model.nodes.filter((n) => !n.fixed).map((n) => n.id),
    modes: [],
    evaluation: null,
    error: {
      field: '',
      message:
        'This browser cannot run the live preview. Save the sizing: the server computes it in full.',
    },
  }
}

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
 * Recomputes the sizing in the browser 150 ms after the last change, in a Web Worker (where
 * none can start, the preview says so); only the answer to the latest request is kept, and a
 * newer request stops the worker still computing an older one.
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
      // the worker could not start (old browser, blocked script): say so, never guess
      w.terminate()
      worker = null
      if (source.value) preview.value = noPreview(source.value.model)
      busy.value = false
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
      preview.value = noPreview(payload.model)
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
