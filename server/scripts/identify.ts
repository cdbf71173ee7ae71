// Identify natural frequencies and damping ratios from a site acceleration record (CSV).
// Usage: npm run --silent identify -- FILE.csv [--sample-rate HZ] [--kind decay|ambient]
// Prints JSON on stdout; a file that cannot be read exits with code 2 and one line on stderr.
import { readFileSync } from 'node:fs'
import { identifyRecord, isRecordError, parseRecordBytes } from '../../shared/measurements/index'
import type { RecordKind } from '../../shared/measurements/index'

const USAGE = 'usage: identify FILE.csv [--sample-rate HZ] [--kind decay|ambient]'

interface Args {
  file: string
  sampleRateHz?: number
  kind?: RecordKind
}

class UsageError extends Error {}

function parseArgs(argv: string[]): Args {
  const rest = [...argv]
  const args: Partial<Args> = {}
  while (rest.length > 0) {
    const arg = rest.shift() ?? ''
    if (arg === '--sample-rate') {
      const value = Number(rest.shift())
      if (!(value > 0 && Number.isFinite(value))) throw new UsageError('--sample-rate needs Hz > 0')
      args.sampleRateHz = value
    } else if (arg === '--kind') {
      const value = rest.shift()
      if (value !== 'decay' && value !== 'ambient')
        throw new UsageError('--kind is decay or ambient')
      args.kind = value
    } else if (arg.startsWith('--') || args.file !== undefined) {
      throw new UsageError(`unexpected argument '${arg}'`)
    } else {
      args.file = arg
    }
  }
  if (args.file === undefined) throw new UsageError('no file given')
  return { ...args, file: args.file }
}

// Six significant digits keep the output readable without hiding anything measurable.
const round = (_key: string, value: unknown) =>
  typeof value === 'number' && Number.isFinite(value) ? Number(value.toPrecision(6)) : value

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
    const record = parseRecordBytes(bytes, { sampleRateHz: args.sampleRateHz })
    const result = identifyRecord(record, { kind: args.kind })
    const { spectrum: _spectrum, ...summary } = result
    const out = { ...summary, fileWarnings: record.warnings }
    process.stdout.write(JSON.stringify(out, round, 2) + '\n')
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
