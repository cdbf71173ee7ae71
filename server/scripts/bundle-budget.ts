/**
 * The client's size budget, checked after `vite build --manifest` in `npm run build`: fails the
 * build when the initial load or the largest route is over its gzip budget.
 */
import { TARGETS } from './bench/targets'
import { bundleSizes } from './bundle-sizes'

const dir = process.argv[2] ?? 'dist/client'
const s = bundleSizes(dir)
const kb = (b: number) => `${(b / 1000).toFixed(1)} kB`
const over = [
  s.initialGzipBytes > TARGETS.initialGzipBytes &&
    `initial load ${kb(s.initialGzipBytes)} gzip is over its ${kb(TARGETS.initialGzipBytes)} budget`,
  s.largestRouteGzipBytes > TARGETS.largestRouteGzipBytes &&
    `route ${s.largestRoute} ${kb(s.largestRouteGzipBytes)} gzip is over its ` +
      `${kb(TARGETS.largestRouteGzipBytes)} budget (largest files: ` +
      `${s.largestRouteFiles.map((f) => `${f.file} ${kb(f.gzipBytes)}`).join(', ')})`,
].filter((x): x is string => Boolean(x))
if (over.length) {
  for (const line of over) console.error(`bundle budget: ${line}`)
  process.exit(1)
}
console.log(
  `bundle budget: initial ${kb(s.initialGzipBytes)} of ${kb(TARGETS.initialGzipBytes)}, ` +
    `largest route ${kb(s.largestRouteGzipBytes)} of ${kb(TARGETS.largestRouteGzipBytes)} ` +
    `(${s.largestRoute}), gzip`,
)
