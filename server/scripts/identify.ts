// Identify natural frequencies, damping ratios and mode shapes from a site acceleration record
// (CSV: a time column and one or more acceleration columns).
// Usage: npm run --silent identify -- FILE.csv [--sample-rate HZ] [--kind decay|ambient]
//        [--time-unit s|ms] [--method efdd|ssi]
// Prints JSON on stdout; a file that cannot be read exits with code 2 and one line on stderr.
import { readFileSync } from 'node:fs'
import {
  identifyModes,
  identifyModesSsi,
  identifyRecord,
  isRecordError,
  parseRecordBytes,
} from '../../shared/measurements/index'
import type { ParsedRecord, RecordKind, TimeUnit } from '../../shared/measurements/index'

const USAGE =
  'usage: identify FILE.csv [--sample-rate HZ] [--kind decay|ambient] [--time-unit s|ms] ' +
  '[--method efdd|ssi]'

interface Args {
  file: string
  sampleRateHz?: number
  kind?: RecordKind
  timeUnit?: TimeUnit
  method?: 'efdd' | 'ssi'
}

class UsageError extends Error {}

function option(arg: string, value: string | undefined, args: Partial<Args>) {
  if (arg === '--sample-rate') {
    const rate = Number(value)
    if (!(rate > 0 && Number.isFinite(rate))) throw new UsageError('--sample-rate needs Hz > 0')
    args.sampleRateHz = rate
  } else if (arg === '--kind') {
    if (value !== 'decay' && value !== 'ambient') throw new UsageError('--kind is decay or ambient')
    args.kind = value
  } else if (arg === '--time-unit') {
    if (value !== 's' && value !== 'ms') throw new UsageError('--time-unit is s or ms')
    args.timeUnit = value
  } else if (arg === '--method') {
    if (value !== 'efdd' && value !== 'ssi') throw new UsageError('--method is efdd or ssi')
    args.method = value
  } else {
    throw new UsageError(`unexpected argument '${arg}'`)
  }
}

function parseArgs(argv: string[]): Args {
  const rest = [...argv]
  const args: Partial<Args> = {}
  while (rest.length > 0) {
    const arg = rest.shift() ?? ''
    if (arg.startsWith('--')) option(arg, rest.shift(), args)
    else if (args.file !== undefined) throw new UsageError(`unexpected argument '${arg}'`)
    else args.file = arg
  }
  if (args.file === undefined) throw new UsageError('no file given')
  return { ...args, file: args.file }
}

// Six significant digits keep the output readable without hiding anything measurable.
const round = (_key: string, value: unknown) =>
  typeof value === 'number' && Number.isFinite(value) ? Number(value.toPrecision(6)) : value

/** The single-channel result of today (first acceleration column) and the modes of all channels. */
function identifyFile(bytes: Uint8Array, args: Args) {
  const record = parseRecordBytes(bytes, {
    sampleRateHz: args.sampleRateHz,
    timeUnit: args.timeUnit,
  })
  const { spectrum: _spectrum, ...summary } = identifyRecord(record, { kind: args.kind })
  const modal = args.method === 'ssi' ? ssi(record, args.kind) : efdd(record, args.kind)
  return {
    ...summary,
    fileWarnings: record.warnings,
    timeUnit: record.timeUnit,
    channels: record.channels.map(({ name, column }) => ({ name, column })),
    ...modal,
  }
}

function efdd(record: ParsedRecord, kind?: RecordKind) {
  const modal = identifyModes(record, { kind })
  return {
    modes: modal.modes.map(({ frequencyHz, dampingRatio, shape, method, flags, warnings }) => ({
      frequencyHz,
      dampingRatio,
      shape,
      method,
      flags,
      warnings,
    })),
    modalAnalysis: {
      method: modal.method,
      resolutionHz: modal.resolutionHz,
      segmentLength: modal.segmentLength,
      averages: modal.averages,
      flags: modal.flags,
      warnings: modal.warnings,
    },
  }
}

function ssi(record: ParsedRecord, kind?: RecordKind) {
  const modal = identifyModesSsi(record, { kind })
  return {
    modes: modal.modes.map(({ frequencyHz, dampingRatio, shape, flags, warnings }) => ({
      frequencyHz,
      dampingRatio,
      shape,
      method: modal.method,
      flags,
      warnings,
    })),
    modalAnalysis: {
      method: modal.method,
      blockRows: modal.blockRows,
      orders: modal.orders,
      stablePoles: modal.diagram.filter((p) => p.stable).length,
      flags: modal.flags,
      warnings: modal.warnings,
    },
  }
}

function main(argv: string[]): number {
  let args: Args
  try {
    args = parseArgs(argv)
  } catch (error) {
    process.stderr.write(`identify: ${(error as Error).message}\n${USAGE}\n`)
    return 2
  }
  let bytes: Uint8Array
  try {
    bytes = readFileSync(args.file)
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code ?? 'unreadable'
    process.stderr.write(`identify: ${args.file}: cannot read the file (${code})\n`)
    return 2
  }
  try {
    process.stdout.write(JSON.stringify(identifyFile(bytes, args), round, 2) + '\n')
    return 0
  } catch (error) {
    if (isRecordError(error) || error instanceof RangeError) {
      process.stderr.write(`identify: ${args.file}: ${error.message}\n`)
      return 2
    }
    throw error
  }
}

process.exitCode = main(process.argv.slice(2))
