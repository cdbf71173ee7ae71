/**
 * A day as people read it, "3 Dec 2026", from an ISO date or time (its UTC day), the same in
 * every browser's time zone.
 */
export function dayText(iso: string): string {
  return new Date(`${iso.slice(0, 10)}T12:00:00Z`).toLocaleDateString('en-GB', {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    timeZone: 'UTC',
  })
}
