/**
 * Gzip sizes of the client build, read from Vite's build manifest (`vite build --manifest`):
 * - initial: the entry chunk of index.html with its CSS and everything it imports statically;
 * - route: a lazily loaded route chunk with everything it can go on to load (its static imports
 *   and the components it loads lazily in turn, with their CSS), less what the initial load
 *   brought already. The largest route is the one whose figure is highest.
 */
import { readFileSync } from 'node:fs'
import path from 'node:path'
import { gzipSync } from 'node:zlib'

interface ManifestChunk {
  file: string
  isEntry?: boolean
  imports?: string[]
  dynamicImports?: string[]
  css?: string[]
}
type Manifest = Record<string, ManifestChunk>

export interface BundleSizes {
  initialGzipBytes: number
  largestRouteGzipBytes: number
  /** manifest key of the largest route chunk */
  largestRoute: string
  /** the five largest files of that route, for the report */
  largestRouteFiles: { file: string; gzipBytes: number }[]
}

/**
 * @param dir the build's output directory (holding .vite/manifest.json)
 */
export function bundleSizes(dir: string): BundleSizes {
  const manifest = JSON.parse(
    readFileSync(path.join(dir, '.vite/manifest.json'), 'utf8'),
  ) as Manifest
  const gzip = new Map<string, number>()
  const sizeOf = (file: string) => {
    if (!gzip.has(file)) gzip.set(file, gzipSync(readFileSync(path.join(dir, file))).length)
    return gzip.get(file)!
  }
  const total = (files: Set<string>) => [...files].reduce((s, f) => s + sizeOf(f), 0)
  const entryKey = Object.keys(manifest).find((k) => manifest[k]!.isEntry)
  if (!entryKey) throw new Error(`no entry chunk in the manifest of ${dir}`)
  const initial = reach(manifest, entryKey, null)
  // Routes: the chunks the initial code loads lazily (the router's views).
  const routes = new Set(
    Object.values(manifest)
      .filter((c) => initial.has(c.file))
      .flatMap((c) => c.dynamicImports ?? []),
  )
  let largestRoute = ''
  let largest = new Set<string>()
  for (const key of routes) {
    const files = reach(manifest, key, initial)
    if (total(files) > total(largest)) [largestRoute, largest] = [key, files]
  }
  return {
    initialGzipBytes: total(initial),
    largestRouteGzipBytes: total(largest),
    largestRoute,
    largestRouteFiles: [...largest]
      .map((file) => ({ file, gzipBytes: sizeOf(file) }))
      .sort((a, b) => b.gzipBytes - a.gzipBytes)
      .slice(0, 5),
  }
}

/**
 * Output files (JS and CSS) a chunk loads. For the initial load (`loaded` null) its static
 * imports; for a route, its lazy imports too, stopping at files the initial load brought.
 */
function reach(manifest: Manifest, key: string, loaded: Set<string> | null): Set<string> {
  const files = new Set<string>()
  const seen = new Set<string>()
  const visit = (k: string) => {
    const c = manifest[k]
    if (seen.has(k) || !c || loaded?.has(c.file)) return
    seen.add(k)
    files.add(c.file)
    for (const css of c.css ?? []) if (!loaded?.has(css)) files.add(css)
    for (const i of c.imports ?? []) visit(i)
    if (loaded) for (const i of c.dynamicImports ?? []) visit(i)
  }
  visit(key)
  return files
}
