import type { RecordChannel } from '../measurements/channels'
import { ModelError } from '../dynamics/index'
import type { Sensor } from './types'

/**
 * Sensors from a record's channel mappings: each channel's node, and −1 for a channel whose
 * direction is negative ('-z': it reads positive downward).
 * @param channels the record's channels, in column order
 * @throws ModelError for a channel without a node
 */
export function sensorsFromChannels(
  channels: readonly Pick<RecordChannel, 'name' | 'nodeId' | 'direction'>[],
): Sensor[] {
  return channels.map((c, i) => {
    if (!c.nodeId) {
      throw new ModelError(
        `channels[${i}].nodeId`,
        `channel '${c.name}' is not tied to a model node`,
      )
    }
    return { nodeId: c.nodeId, sign: c.direction?.startsWith('-') ? -1 : 1 }
  })
}
