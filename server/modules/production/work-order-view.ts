import type { Shipment } from '../../../shared/schemas/shipment'
import type { WorkOrderEntity } from './work-order.entity'

/** The shipment columns of a work order as one object, or null before it ships. */
export function shipmentOf(w: WorkOrderEntity): Shipment | null {
  if (!w.carrier || !w.trackingNumber || !w.shippedAt) return null
  return {
    carrier: w.carrier,
    trackingNumber: w.trackingNumber,
    serialNumbers: w.serialNumbers ?? [],
    shippedAt: w.shippedAt.toISOString(),
  }
}

/** A work order row as the API answers it: the shipment columns folded into `shipment`. */
export function workOrderRow(w: WorkOrderEntity) {
  const { carrier, trackingNumber, serialNumbers, shippedAt, ...rest } = w
  void [carrier, trackingNumber, serialNumbers, shippedAt]
  return { ...rest, shipment: shipmentOf(w) }
}
export type WorkOrderRowView = ReturnType<typeof workOrderRow>
