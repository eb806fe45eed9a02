import { createError, type H3Error } from 'h3'
import { isFailure, type Failure, type Outcome } from '../../shared/types/outcome'

/** The one place a Failure becomes an HTTP error; 400s and 409s with a path carry `data.fieldErrors` like validBody's. */
export function httpError(failure: Failure): H3Error {
  switch (failure.fail) {
    case 'missing':
      return createError({ statusCode: 404, statusMessage: `${failure.what} not found`, ...(failure.message ? { message: failure.message } : {}) })
    case 'forbidden':
      return createError({ statusCode: 403, statusMessage: failure.message })
    case 'field': {
      const statusCode = failure.status ?? 400
      const statusMessage = statusCode === 413 ? 'File too large' : statusCode === 415 ? 'File type not accepted' : 'Invalid body'
      return createError({
        statusCode, statusMessage, message: statusCode === 400 ? `${failure.path}: ${failure.message}` : failure.message,
        data: { formErrors: [], fieldErrors: { [failure.path]: [failure.message] } },
      })
    }
    case 'invalid':
      return createError({
        statusCode: 400, statusMessage: `Invalid ${failure.where}`, message: failure.message,
        data: { formErrors: failure.formErrors, fieldErrors: failure.fieldErrors, ...(failure.rowErrors ? { rowErrors: failure.rowErrors } : {}) },
      })
    case 'conflict':
      return createError({
        statusCode: 409, statusMessage: 'Conflict', message: failure.message,
        ...(failure.path ? { data: { formErrors: [], fieldErrors: { [failure.path]: [failure.message] } } } : {}),
      })
    case 'gone':
      return createError({ statusCode: 410, statusMessage: failure.title ?? 'File missing', message: failure.message })
    case 'refused':
      return createError({ statusCode: 422, statusMessage: failure.title, message: failure.message, ...(failure.detail ? { data: failure.detail } : {}) })
    default:
      return createError({ statusCode: 409, statusMessage: 'Conflict', message: failure.message })
  }
}

/** The value of an Outcome, or the HTTP error of its Failure thrown: `return orThrow(await getThing(db, user, id))`. */
export function orThrow<T>(outcome: Outcome<T>): T {
  if (isFailure(outcome)) throw httpError(outcome)
  return outcome
}

/**
 * Runs a write that throws a Failure to roll its transaction back, and returns that Failure instead of throwing it.
 * Any other error goes on up.
 */
export async function settle<T>(work: () => Promise<T>): Promise<Outcome<T>> {
  try {
    return await work()
  }
  catch (error) {
    if (isFailure(error)) return error
    throw error
  }
}

/** A unique-key violation (PostgreSQL 23505), however the driver wraps it. */
export const isUniqueViolation = (error: unknown) => pgCode(error) === '23505'

/** A foreign-key violation (PostgreSQL 23503), however the driver wraps it. */
export const isForeignKeyViolation = (error: unknown) => pgCode(error) === '23503'

function pgCode(error: unknown): string | undefined {
  for (let e: unknown = error, depth = 0; e && depth < 4; e = (e as { cause?: unknown }).cause, depth++) {
    const code = (e as { code?: unknown }).code
    if (typeof code === 'string' && /^\d{2}[0-9A-Z]{3}$/.test(code)) return code
  }
  return undefined
}
