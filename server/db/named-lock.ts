import type { DataSource } from 'typeorm'
import { AppError } from '../http/app-error'

/**
 * Runs `work` holding a MariaDB named lock (GET_LOCK), so the same work for the same thing never
 * runs twice at once on any app instance sharing the database. Waits up to `waitSeconds`, then
 * answers 409. For repositories only: the one place besides them that touches the data source.
 * @param ds the app's data source
 * @param name what is locked, e.g. "checkout:12"; prefixed with the database name
 * @param work runs while the lock is held
 */
export async function withNamedLock<T>(
  ds: DataSource,
  name: string,
  work: () => Promise<T>,
  waitSeconds = 10,
): Promise<T> {
  const lock = `${String(ds.options.database)}:${name}`.slice(0, 64)
  const runner = ds.createQueryRunner()
  try {
    const [row] = (await runner.query('SELECT GET_LOCK(?, ?) AS got', [lock, waitSeconds])) as {
      got: number | string | null
    }[]
    if (Number(row?.got) !== 1)
      throw new AppError('busy', 'The same change is under way; try again in a moment.', 409)
    try {
      return await work()
    } finally {
      await runner.query('SELECT RELEASE_LOCK(?)', [lock])
    }
  } finally {
    await runner.release()
  }
}
