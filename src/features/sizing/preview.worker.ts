import type { ModelDefinition, SizingInput } from '@shared/schemas/sizing'
import { previewSizing } from '@/features/sizing/preview'

// Off the main thread so typing stays smooth on a tablet while a larger model solves.
self.onmessage = (e: MessageEvent<{ id: number; model: ModelDefinition; input: SizingInput }>) => {
  const { id, model, input } = e.data
  self.postMessage({ id, preview: previewSizing(model, input) })
}
