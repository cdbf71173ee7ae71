import type { ShipmentInput } from '../../../shared/schemas/shipment'
import type { BuildSpecification } from '../../../shared/schemas/work-order'
import { unitsToShip } from '../../../shared/production/work-order-figures'
import { AppError } from '../../http/app-error'
import type { MovePatch } from './production.repository'

/**
 * The shipment columns written with the move to `shipped`: one serial number per unit of the
 * work order, so a unit never leaves without its number on record.
 */
export function shippingPatch(
  spec: BuildSpecification,
  shipment: ShipmentInput | undefined,
  at: Date,
): MovePatch {
  // The schema requires it with `shipped`; a caller inside the server may not have.
  if (!shipment)
    throw new AppError('shipment-required', 'Record the carrier, tracking and serials.', 400, [
      { path: 'body.shipment.carrier', message: 'required: the carrier' },
    ])
  const units = unitsToShip(spec)
  if (shipment.serialNumbers.length !== units)
    throw new AppError(
      'serial-numbers-count',
      `Serial numbers: ${units} unit${units === 1 ? '' : 's'} ship, so give ${units} serial number${units === 1 ? '' : 's'} (${shipment.serialNumbers.length} given).`,
      400,
      [
        {
          path: 'body.shipment.serialNumbers',
          message: `give one serial number per unit: ${units} expected, ${shipment.serialNumbers.length} given`,
        },
      ],
    )
  return {
    carrier: shipment.carrier,
    trackingNumber: shipment.trackingNumber,
    serialNumbers: shipment.serialNumbers,
    shippedAt: at,
  }
}
