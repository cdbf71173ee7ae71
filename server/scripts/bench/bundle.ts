/** Builds the client into a scratch directory (dist/client is left alone) and reads its sizes. */
import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { build } from 'vite'
import { bundleSizes } from '../bundle-sizes'

export async function benchBundle() {
  const outDir = mkdtempSync(path.join(tmpdir(), 'quellnode-build-'))
  try {
    await build({
      configFile: 'vite.config.ts',
      logLevel: 'silent',
      build: { outDir, emptyOutDir: true, manifest: true },
    })
    const s = bundleSizes(outDir)
    return {
      figures: {
        initialGzipBytes: s.initialGzipBytes,
        largestRouteGzipBytes: s.largestRouteGzipBytes,
      },
      largestRoute: s.largestRoute,
    }
  } finally {
    rmSync(outDir, { recursive: true, force: true })
  }
}
