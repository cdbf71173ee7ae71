/**
 * A model that cannot be solved: the message names the offending field so the server can answer
 * 400 with it and the command line can print one line.
 */
export class ModelError extends RangeError {
  /** path of the offending field, e.g. "springs[2].stiffness" */
  readonly field: string

  /**
   * @param field path of the offending field in the model input
   * @param message what is wrong and, where it helps, what to do instead
   */
  constructor(field: string, message: string) {
    super(`${field}: ${message}`)
    this.name = 'ModelError'
    this.field = field
  }
}
