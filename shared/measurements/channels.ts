/** Sensing axis of an accelerometer, signed: '+z' reads positive upward along z. */
export type ChannelDirection = '+x' | '-x' | '+y' | '-y' | '+z' | '-z'

export const CHANNEL_DIRECTIONS: readonly ChannelDirection[] = ['+x', '-x', '+y', '-y', '+z', '-z']

/** Where one acceleration channel was measured: a model node and the sensor's axis. */
export interface ChannelMapping {
  /** id of the model node the sensor sat on */
  nodeId?: string
  direction?: ChannelDirection
}

/** One acceleration channel of a record. */
export interface RecordChannel {
  /** header text, or "channel N" without a header */
  name: string
  /** 1-based column in the file */
  column: number
  /** m/s² */
  acceleration: Float64Array
  nodeId: string | null
  direction: ChannelDirection | null
}

const MAX_NODE_ID = 60

/**
 * Check channel mappings given as options.
 * @param mappings one per acceleration channel, in column order
 * @throws RangeError naming the entry ("channels[1].direction")
 */
export function checkChannelMappings(mappings: ChannelMapping[]): ChannelMapping[] {
  if (!Array.isArray(mappings)) throw new RangeError('channels must be a list')
  mappings.forEach((m, i) => {
    const id = m.nodeId
    if (id !== undefined && (typeof id !== 'string' || id === '' || id.length > MAX_NODE_ID)) {
      throw new RangeError(`channels[${i}].nodeId must be a text of 1 to ${MAX_NODE_ID} characters`)
    }
    if (m.direction !== undefined && !CHANNEL_DIRECTIONS.includes(m.direction)) {
      const allowed = CHANNEL_DIRECTIONS.join(', ')
      throw new RangeError(`channels[${i}].direction must be one of ${allowed}`)
    }
  })
  return mappings
}

/**
 * The channels of a record with their names and mappings.
 * @param columns values per acceleration column
 * @param firstColumn 1-based file column of the first of them
 * @param names header row, or null
 * @param mappings node and direction per channel
 * @throws RangeError when more mappings than channels are given
 */
export function buildChannels(
  columns: number[][],
  firstColumn: number,
  names: string[] | null,
  mappings: ChannelMapping[],
): RecordChannel[] {
  if (mappings.length > columns.length) {
    throw new RangeError(
      `channels: ${mappings.length} mappings given, the record has ${columns.length} ` +
        'acceleration channel(s)',
    )
  }
  return columns.map((values, i) => {
    const column = firstColumn + i
    const m = mappings[i] ?? {}
    return {
      name: names?.[column - 1] || `channel ${i + 1}`,
      column,
      acceleration: Float64Array.from(values),
      nodeId: m.nodeId ?? null,
      direction: m.direction ?? null,
    }
  })
}
