export function orderNumber(id: number, paidAt: Date) {
  return `ORD-${paidAt.getUTCFullYear()}-${String(id).padStart(4, '0')}`
}
