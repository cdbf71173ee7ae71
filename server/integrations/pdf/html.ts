const ENTITIES: Record<string, string> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
}

/** Text for HTML content and attribute values. */
export const esc = (value: unknown) => String(value ?? '').replace(/[&<>"']/g, (c) => ENTITIES[c]!)

/** A number with a fixed count of significant digits, for engineering values. */
export const sig = (value: number, digits = 3) =>
  Number(value.toPrecision(digits)).toLocaleString('en-GB')
