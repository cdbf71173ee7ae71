import { esc } from '../../../integrations/pdf/html'

export interface ChartSeries {
  frequencyHz: readonly number[]
  without: readonly number[]
  with: readonly number[]
}

const W = 520
const H = 200
const PAD = { left: 44, right: 12, top: 12, bottom: 30 }

function points(
  xs: readonly number[],
  ys: readonly number[],
  sx: (x: number) => number,
  sy: (y: number) => number,
) {
  return xs
    .map((x, i) => [x, ys[i]] as const)
    .filter(([x, y]) => Number.isFinite(x) && y !== undefined && Number.isFinite(y))
    .map(([x, y]) => `${sx(x).toFixed(1)},${sy(y as number).toFixed(1)}`)
    .join(' ')
}

/**
 * The response before and after the absorber as an inline SVG (two polylines on linear axes,
 * both scaled to the larger peak), so the PDF needs no chart library and no network.
 */
export function responseChartSvg(c: ChartSeries): string {
  const xs = c.frequencyHz
  const x0 = Math.min(...xs)
  const x1 = Math.max(...xs)
  const yMax = Math.max(...c.without.filter(Number.isFinite), ...c.with.filter(Number.isFinite))
  if (!xs.length || !(x1 > x0) || !(yMax > 0)) return '<p class="muted">No response curve.</p>'
  const sx = (x: number) => PAD.left + ((x - x0) / (x1 - x0)) * (W - PAD.left - PAD.right)
  const sy = (y: number) => H - PAD.bottom - (y / yMax) * (H - PAD.top - PAD.bottom)
  const ticks = [0, 0.25, 0.5, 0.75, 1].map((f) => x0 + f * (x1 - x0))
  const xLabels = ticks
    .map(
      (t) =>
        `<text x="${sx(t).toFixed(1)}" y="${H - 12}" text-anchor="middle">${esc(t.toFixed(1))}</text>`,
    )
    .join('')
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${W} ${H}" width="100%" role="img" aria-label="Response before and after">
<g font-size="9" fill="#444">${xLabels}<text x="${W / 2}" y="${H - 1}" text-anchor="middle">frequency (Hz)</text>
<text x="10" y="${H / 2}" transform="rotate(-90 10 ${H / 2})" text-anchor="middle">response (relative)</text></g>
<rect x="${PAD.left}" y="${PAD.top}" width="${W - PAD.left - PAD.right}" height="${H - PAD.top - PAD.bottom}" fill="none" stroke="#bbb"/>
<polyline fill="none" stroke="#b86e00" stroke-width="1.6" points="${points(xs, c.without, sx, sy)}"/>
<polyline fill="none" stroke="#0f4c5c" stroke-width="1.8" points="${points(xs, c.with, sx, sy)}"/>
<g font-size="9"><rect x="${W - 150}" y="${PAD.top + 6}" width="10" height="3" fill="#b86e00"/><text x="${W - 136}" y="${PAD.top + 10}">without absorber</text>
<rect x="${W - 150}" y="${PAD.top + 18}" width="10" height="3" fill="#0f4c5c"/><text x="${W - 136}" y="${PAD.top + 22}">with absorber</text></g>
</svg>`
}
