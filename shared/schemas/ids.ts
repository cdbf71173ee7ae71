import { z } from 'zod'

/** The largest id a MariaDB INT column holds. */
export const MAX_ID = 2_147_483_647

const canonical = (pattern: RegExp, message: string) =>
  z
    .string()
    .regex(pattern, message)
    .transform(Number)
    .refine((n) => n <= MAX_ID, `at most ${MAX_ID}`)

/**
 * An id as a path or query gives it: decimal digits without sign, leading zero, space, hex or
 * exponent. " 1", "0x10", "1e1" and "01" are refused, never read as 1, 16, 10 and 1.
 */
export const IdSchema = canonical(/^[1-9][0-9]{0,9}$/, 'a positive whole number, digits only')

/** A 0-based position in a list, written the same canonical way ("0", "7"; not "07"). */
export const IndexSchema = canonical(/^(0|[1-9][0-9]{0,9})$/, 'a whole number ≥ 0, digits only')

/** Rows per page of a list: "1" … "200". */
export const PageSizeSchema = IdSchema.refine((n) => n <= 200, 'at most 200')

/**
 * limit and offset of a paged list, to spread into its query schema; the total matching the
 * filters goes in the X-Total-Count header. Without a limit such a list answers every row.
 */
export const PAGE_QUERY = {
  /** rows per page, 1–200 */
  limit: PageSizeSchema.optional(),
  /** rows skipped, in the list's order */
  offset: IndexSchema.optional(),
}

/** `:id` in a path: every route with one uses this. */
export const IdParamSchema = z.object({ id: IdSchema })

/** An id inside a JSON body: a whole number that fits the database column. */
export const BodyIdSchema = z.number().int().positive().max(MAX_ID)

/** The id of a row as an answer carries it. */
export const RowIdSchema = z.number().int()

/** A moment as an answer carries it: the JSON of a Date, ISO 8601 text in UTC. */
export const TimestampSchema = z.string()
