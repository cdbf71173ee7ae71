import type { ApexOptions } from 'apexcharts'

/** Colours of the charts: petrol with the absorber, amber without (readable in sunlight). */
export const WITH = '#0f4c5c'
export const WITHOUT = '#b86e00'
export const INK = '#1b1f1a'

/** Options every chart shares: thick lines, dark text, no animation (a tablet in the sun). */
export function baseChart(id: string, extra: ApexOptions = {}): ApexOptions {
  return {
    chart: {
      id,
      toolbar: { show: false },
      zoom: { enabled: false },
      animations: { enabled: false },
      foreColor: INK,
      fontFamily: 'Lato, "Liberation Sans", sans-serif',
    },
    stroke: { width: 3, curve: 'straight' },
    grid: { borderColor: '#9aa5a2', strokeDashArray: 0 },
    legend: { fontSize: '15px', position: 'top' },
    dataLabels: { enabled: false },
    tooltip: { theme: 'light' },
    ...extra,
  }
}

/** Axis title in the charts' style. */
export function axisTitle(text: string) {
  return { text, style: { fontSize: '15px', fontWeight: 700, color: INK } }
}

/** Tick labels in the charts' style. */
export function ticks(formatter?: (v: number) => string) {
  return { style: { fontSize: '14px', colors: INK }, ...(formatter && { formatter }) }
}

/**
 * One axis in the charts' style: its title and tick labels, with anything else the chart sets
 * (type, tickAmount, min, max…).
 */
export function axis<T extends object>(title: string, format: (v: number) => string, more?: T) {
  return { ...more, labels: ticks(format), title: axisTitle(title) }
}

/** A numeric x axis of a chart: the title, the tick labels and how many ticks at most. */
export function numericAxis(title: string, format: (v: number) => string, tickAmount?: number) {
  return axis(title, format, { type: 'numeric' as const, ...(tickAmount && { tickAmount }) })
}
