import { execFile } from 'node:child_process'
import { promisify } from 'node:util'

const run = promisify(execFile)

/** Runs `solve` on a file as the command line does: exit code, stdout and stderr. */
export async function solve(
  file: string,
): Promise<{ code: number; stdout: string; stderr: string }> {
  try {
    const r = await run('npx', ['tsx', 'server/scripts/solve.ts', file], { cwd: process.cwd() })
    return { code: 0, stdout: r.stdout, stderr: r.stderr }
  } catch (e) {
    const x = e as { code: number; stdout: string; stderr: string }
    return { code: x.code, stdout: x.stdout, stderr: x.stderr }
  }
}
