/** The human-readable `npm run bench` report: each figure with its target and ratio beside it. */
import type { ServerFigures } from '../bench-server'
import type { EigenFigure, StudyFigure } from './engine'
import { TARGETS } from './targets'

export interface BenchResult extends ServerFigures {
  study: StudyFigure[]
  eigen: EigenFigure[]
  bundle: { initialGzipBytes: number; largestRouteGzipBytes: number }
}

const ms = (v: number | null) => (v === null ? '—' : v < 10 ? v.toFixed(2) : v.toFixed(0))
const verdict = (ok: boolean) => (ok ? 'met' : 'not met')
const pad = (s: string | number, w: number) => String(s).padStart(w)

export function printReport(r: BenchResult, largestRoute: string): void {
  const out: string[] = ['Quellnode benchmark (this machine; medians of repeated runs)', '']
  out.push('Sizing study: evaluateSizing in the worker pool, span networks')
  out.push(
    `${pad('n', 6)}${pad('ms', 10)}${pad('CPU ms', 10)}${pad('target ms', 12)}` +
      `${pad('ms ÷ target', 14)}`,
  )
  for (const s of r.study) {
    const target = TARGETS.studyMs[s.n]!
    const ok = s.ms !== null && s.ms <= target
    const ratio = s.ms === null ? '—' : `${(s.ms / target).toFixed(1)}×`
    out.push(
      `${pad(s.n, 6)}${pad(ms(s.ms), 10)}${pad(ms(s.cpuMs), 10)}${pad(`≤ ${target}`, 12)}` +
        `${pad(ratio, 14)}  ${s.note ?? verdict(ok)}`,
    )
  }
  out.push('(ms: wall time seen by the caller; CPU ms: the evaluation alone, not inflated by load)')
  out.push('', "Eigen solve: solveModes against ml-matrix's EigenvalueDecomposition (same matrix)")
  out.push(
    `${pad('n', 6)}${pad('new ms', 10)}${pad('ml-matrix ms', 15)}${pad('ml-matrix ÷ new', 18)}`,
  )
  for (const e of r.eigen) {
    const ratio = e.ms !== null && e.mlMatrixMs !== null ? e.mlMatrixMs / e.ms : null
    const target =
      e.n === 500
        ? `  target ≥ ${TARGETS.eigenRatioAt500}×: ${verdict(ratio !== null && ratio >= TARGETS.eigenRatioAt500)}`
        : ''
    const ratioText = ratio === null ? '—' : `${ratio.toFixed(1)}×`
    out.push(
      `${pad(e.n, 6)}${pad(ms(e.ms), 10)}${pad(ms(e.mlMatrixMs), 15)}${pad(ratioText, 18)}${target}` +
        (e.note ? `  (${e.note})` : ''),
    )
  }
  const h = r.health
  const healthLimit = TARGETS.health.factor * h.idleP95Ms + TARGETS.health.slackMs
  out.push(
    '',
    `GET /api/health p95: idle ${ms(h.idleP95Ms)} ms, busy ${ms(h.busyP95Ms)} ms ` +
      `(a 500-node sizing and an 8 MB record upload running); busy ÷ idle ` +
      `${(h.busyP95Ms / h.idleP95Ms).toFixed(1)}×; target ≤ 2 × idle + 5 = ${ms(healthLimit)} ms: ` +
      verdict(h.busyP95Ms <= healthLimit),
    `GET /api/quotes p95: ${ms(r.list.p95Ms)} ms with ${r.list.rows} quotes at ` +
      `${r.list.connections} connections; target ≤ ${TARGETS.listP95Ms} ms: ` +
      verdict(r.list.p95Ms <= TARGETS.listP95Ms) +
      (r.list.note ? ` (${r.list.note})` : ''),
  )
  const kb = (b: number) => `${(b / 1000).toFixed(1)} kB`
  const b = r.bundle
  out.push(
    `Client bundle, gzip: initial ${kb(b.initialGzipBytes)} (target ≤ ${kb(TARGETS.initialGzipBytes)}: ` +
      `${verdict(b.initialGzipBytes <= TARGETS.initialGzipBytes)}); largest route ` +
      `${kb(b.largestRouteGzipBytes)}, ${largestRoute} (target ≤ ${kb(TARGETS.largestRouteGzipBytes)}: ` +
      `${verdict(b.largestRouteGzipBytes <= TARGETS.largestRouteGzipBytes)})`,
  )
  console.log(out.join('\n'))
}
