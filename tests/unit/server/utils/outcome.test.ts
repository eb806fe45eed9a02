import { describe, expect, it } from 'vitest'
import { conflict, fieldFailure, frozen, gone, invalid, isFailure, missing, stale } from '../../../../shared/types/outcome'
import { httpError, isUniqueViolation, orThrow, settle } from '../../../../server/utils/outcome'
import { apiFailure } from '../../../../composables/apiFailure'

// The statuses are the project's rules (DEVELOPERS.md "How a function fails"): a record one may not see is a 404,
// a stale or signed edit a 409, bad input a 400 with field messages (common practice for HTTP APIs, RFC 9110 §15.5).
describe('Failure → HTTP error', () => {
  it('gives each kind its status', () => {
    expect(httpError(missing('Welder')).statusCode).toBe(404)
    expect(httpError(missing('Welder')).statusMessage).toBe('Welder not found')
    expect(httpError(stale('reload')).statusCode).toBe(409)
    expect(httpError(frozen('signed')).statusCode).toBe(409)
    expect(httpError(conflict('taken')).statusCode).toBe(409)
    expect(httpError(fieldFailure('stamp', 'taken')).statusCode).toBe(400)
    expect(httpError(fieldFailure('file', 'too big', 413)).statusCode).toBe(413)
    expect(httpError(gone('File lost')).statusCode).toBe(410)
  })

  it('names the field in data.fieldErrors, as validBody does', () => {
    const error = httpError(fieldFailure('stamp', 'Stamp W-1 is already on the roster'))
    expect(error.data).toEqual({ formErrors: [], fieldErrors: { stamp: ['Stamp W-1 is already on the roster'] } })
    expect(error.message).toBe('stamp: Stamp W-1 is already on the roster')
    expect((httpError(conflict('Taken', 'email')).data as { fieldErrors: object }).fieldErrors).toEqual({ email: ['Taken'] })
    expect(httpError(conflict('Taken')).data).toBeUndefined()
  })

  it('keeps the row messages of an import', () => {
    const error = httpError(invalid('body', ['2 row errors'], {}, [{ row: 3 }]))
    expect(error.data).toEqual({ formErrors: ['2 row errors'], fieldErrors: {}, rowErrors: [{ row: 3 }] })
  })

  it('orThrow passes values and throws failures', () => {
    expect(orThrow({ id: 1 })).toEqual({ id: 1 })
    expect(orThrow(null)).toBeNull()
    expect(() => orThrow(missing('PQR'))).toThrow('PQR not found')
    expect(isFailure({ fail: 'missing', what: 'x' })).toBe(true)
    expect(isFailure({ failed: true })).toBe(false)
  })

  it('settle returns a thrown Failure and rethrows anything else', async () => {
    expect(await settle(async () => {
      throw stale('changed')
    })).toEqual({ fail: 'stale', message: 'changed' })
    await expect(settle(async () => {
      throw new Error('boom')
    })).rejects.toThrow('boom')
    expect(await settle(async () => 5)).toBe(5)
  })

  it('knows a unique violation however the driver wraps it', () => {
    expect(isUniqueViolation({ code: '23505' })).toBe(true)
    expect(isUniqueViolation({ cause: { cause: { code: '23505' } } })).toBe(true)
    expect(isUniqueViolation({ code: '23503' })).toBe(false)
    expect(isUniqueViolation(null)).toBe(false)
  })
})

describe('HTTP error → the client', () => {
  // What ofetch puts on a FetchError: `data` is the JSON body h3 sends (statusCode, statusMessage, message, data).
  const asFetched = (error: ReturnType<typeof httpError>) => ({
    statusCode: error.statusCode,
    data: { statusCode: error.statusCode, statusMessage: error.statusMessage, message: error.message, data: error.data },
  })

  it('reads field messages and the sentence back', () => {
    const read = apiFailure(asFetched(httpError(fieldFailure('stamp', 'Taken'))))
    expect(read).toEqual({ status: 400, message: 'stamp: Taken', fields: { stamp: 'Taken' }, rows: [] })
  })

  it('falls back when the call never reached the server', () => {
    expect(apiFailure(new TypeError('fetch failed'), 'Try again')).toEqual({ status: undefined, message: 'Try again', fields: {}, rows: [] })
  })
})
