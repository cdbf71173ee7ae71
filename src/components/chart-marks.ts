import type { ApexOptions } from 'apexcharts'

type Annotations = NonNullable<ApexOptions['annotations']>

/** The text of a mark in the charts' size; `on` sets it white on a label of that colour. */
export function markLabel(text: string, on?: string) {
  return { text, style: { fontSize: '14px', ...(on && { color: '#fff', background: on }) } }
}

/** A labelled vertical line across a chart at x: a value chosen. */
export function xLine(x: number, text: string, color: string): Annotations {
  return { xaxis: [{ x, borderColor: color, borderWidth: 3, label: markLabel(text) }] }
}

/** A labelled shaded band across a chart from x to x2: a tolerance. */
export function xBand(x: number, x2: number, text: string, color: string): Annotations {
  return { xaxis: [{ x, x2, fillColor: color, opacity: 0.25, label: markLabel(text) }] }
}

/** A labelled dashed horizontal line at y, the label filled in the line's colour: a limit. */
export function yLimit(y: number, text: string, color: string): Annotations {
  const label = markLabel(text, color)
  return { yaxis: [{ y, borderColor: color, strokeDashArray: 6, borderWidth: 3, label }] }
}
