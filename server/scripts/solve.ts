/**
 * Command line: `npm run --silent solve -- FILE.json` prints the sizing of a model as JSON.
 * A thin I/O wrapper over solveSizing (solveSet for a model with `absorbers`); exit code 2 with
 * one line on stderr for any invalid input.
 */
import { readFileSync } from 'node:fs'
import { ModelError, solveSizing } from '../../shared/dynamics'
import { solveSet } from '../../shared/dynamics/multi'
import { setModelSchema } from '../../shared/schemas/absorber-set'
import { issuePath } from '../../shared/schemas/model'

function fail(message: string, code = 2): never {
  process.stderr.write(`solve: ${message.replace(/\s+/g, ' ').trim()}\n`)
  process.exit(code)
}

function main(argv: string[]): void {
  const file = argv[0]
  if (file === undefined || argv.length > 1) fail('usage: npm run --silent solve -- FILE.json')
  let text: string
  try {
    text = readFileSync(file, 'utf8')
  } catch (e) {
    fail(`cannot read ${file}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`)
  }
  let json: unknown
  try {
    json = JSON.parse(text)
  } catch (e) {
    fail(`${file} is not valid JSON: ${(e as Error).message}`)
  }
  const parsed = setModelSchema.safeParse(json)
  if (!parsed.success) {
    const issue = parsed.error.issues[0]
    const path = issue ? issuePath(issue.path) : ''
    fail(`invalid model: ${path === '' ? '(top level)' : path}: ${issue?.message ?? 'invalid'}`)
  }
  try {
    // A model with `absorbers` is sized as a set; otherwise as before.
    const { absorbers, ...single } = parsed.data
    const result = absorbers ? solveSet(parsed.data) : solveSizing(single)
    process.stdout.write(`${JSON.stringify(result, null, 2)}\n`)
  } catch (e) {
    if (e instanceof ModelError) fail(`invalid model: ${e.message}`)
    fail(`internal error: ${(e as Error).message}`, 1)
  }
}

main(process.argv.slice(2))
