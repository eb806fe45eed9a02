/**
 * How a Rootface domain function fails: it returns (or, inside a transaction, throws) one of these instead of a value.
 * The server turns it into the HTTP error with `orThrow` / `httpError` (server/utils/outcome.ts); the client reads
 * that error back with `apiFailure` (composables/apiFailure.ts). No other error shape exists.
 *
 * - forbidden: the user's role may not take this step on a record they may read (403)
 * - missing: the record does not exist or the user may not see it (404, so its existence does not leak)
 * - stale: someone saved the record since it was opened (409)
 * - frozen: the record is signed or certified and cannot change (409)
 * - conflict: the request clashes with what is stored, e.g. a taken name (409; `path` names the field when there is one)
 * - field: one input is wrong in a way only the server can tell (400; 413 or 415 for an upload)
 * - invalid: several inputs are wrong (400; what `validBody` and friends report)
 * - gone: the record exists but its stored bytes do not (410)
 * - refused: the record is complete as sent but the rules refuse the step (422: results incomplete, WPS not supported);
 *   `detail` carries what the screen lists (blockers, violations)
 */
export type Failure
  = | { fail: 'missing', what: string, message?: string }
    | { fail: 'forbidden', message: string }
    | { fail: 'stale', message: string }
    | { fail: 'frozen', message: string }
    | { fail: 'conflict', message: string, path?: string }
    | { fail: 'field', path: string, message: string, status?: 413 | 415 }
    | { fail: 'invalid', where: string, message: string, formErrors: string[], fieldErrors: Record<string, string[]>, rowErrors?: unknown[] }
    | { fail: 'gone', message: string, title?: string }
    | { fail: 'refused', title: string, message: string, detail?: Record<string, unknown> }

/** A value, or the reason there is none. Values never carry a `fail` key. */
export type Outcome<T> = T | Failure

export const missing = (what: string, message?: string): Failure => ({ fail: 'missing', what, ...(message ? { message } : {}) })
export const forbidden = (message: string): Failure => ({ fail: 'forbidden', message })
export const stale = (message: string): Failure => ({ fail: 'stale', message })
export const frozen = (message: string): Failure => ({ fail: 'frozen', message })
export const conflict = (message: string, path?: string): Failure => ({ fail: 'conflict', message, ...(path ? { path } : {}) })
export const fieldFailure = (path: string, message: string, status?: 413 | 415): Failure => ({ fail: 'field', path, message, ...(status ? { status } : {}) })
export const gone = (message: string, title?: string): Failure => ({ fail: 'gone', message, ...(title ? { title } : {}) })
export const refused = (title: string, message: string, detail?: Record<string, unknown>): Failure => ({ fail: 'refused', title, message, ...(detail ? { detail } : {}) })

/** Many field messages at once (a failed schema, a rejected import). */
export function invalid(where: string, formErrors: string[], fieldErrors: Record<string, string[]>, rowErrors?: unknown[]): Failure {
  const message = formErrors[0] ?? Object.entries(fieldErrors).map(([k, v]) => `${k}: ${v[0]}`).join('; ')
  return { fail: 'invalid', where, message, formErrors, fieldErrors, ...(rowErrors ? { rowErrors } : {}) }
}

export function isFailure(value: unknown): value is Failure {
  return typeof value === 'object' && value !== null && 'fail' in value
    && typeof (value as { fail: unknown }).fail === 'string'
}
