import { RecordError } from '../../../shared/measurements/index'

/** The RecordError a call throws; fails the test when it throws nothing or something else. */
export function refusal(run: () => unknown): RecordError {
  try {
    run()
  } catch (error) {
    if (error instanceof RecordError) return error
    throw error
  }
  throw new Error('expected a RecordError')
}
