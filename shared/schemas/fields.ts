import { z } from 'zod'
import { codeIds, procedureCodeIds } from '../vocabulary/records'

/** Small field builders shared by the record schemas: form inputs give '' for an empty box, the API gives null. */

const LARGEST = 1_000_000

const blankToNull = (v: unknown) => (v === '' || v === undefined || (typeof v === 'number' && Number.isNaN(v)) ? null : v)
const textToNumber = (v: unknown) => {
  const blank = blankToNull(v)
  if (typeof blank === 'string' && blank.trim() !== '' && Number.isFinite(Number(blank))) return Number(blank)
  return blank
}

/** A number that may be left empty (null). */
export function optionalNumber(what: string, options: { min?: number, positive?: boolean, max?: number } = {}) {
  let n = z.number({ invalid_type_error: `${what} must be a number` }).finite(`${what} must be a finite number`)
  if (options.positive) n = n.positive(`${what} must be more than 0`)
  else n = n.min(options.min ?? 0, `${what} cannot be below ${options.min ?? 0}`)
  n = n.max(options.max ?? LARGEST, `${what} is too large`)
  return z.preprocess(textToNumber, n.nullable())
}

/** A number that must be given. */
export function requiredNumber(what: string, options: { min?: number, positive?: boolean, max?: number } = {}) {
  let n = z.number({ required_error: `Enter ${what}`, invalid_type_error: `Enter ${what}` }).finite(`${what} must be a finite number`)
  if (options.positive) n = n.positive(`${what} must be more than 0`)
  else n = n.min(options.min ?? 0, `${what} cannot be below ${options.min ?? 0}`)
  n = n.max(options.max ?? LARGEST, `${what} is too large`)
  return z.preprocess(textToNumber, n)
}

/** A UTF-16 surrogate without its partner: no character at all, and PostgreSQL cannot store it. */
const loneSurrogate = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/

/** Whether text holds a broken character (a lone surrogate, e.g. "A\ud800B" from JSON). */
export function hasLoneSurrogate(text: string) {
  return loneSurrogate.test(text)
}

/** Text made only of whole characters (every surrogate paired), for `.regex(...)` so a string schema stays a string schema. */
export const wellFormedText = /^(?:[^\uD800-\uDFFF]|[\uD800-\uDBFF][\uDC00-\uDFFF])*$/

export function brokenCharacterMessage(what: string) {
  return `${what} contains a broken character; type it again`
}

export function optionalText(what: string, max = 200) {
  return z.preprocess(v => (typeof v === 'string' && v.trim() === '' ? null : blankToNull(v)),
    z.string({ invalid_type_error: `${what} must be text` }).trim().max(max, `${what}: at most ${max} characters`)
      .regex(wellFormedText, brokenCharacterMessage(what)).nullable())
}

export function requiredText(what: string, max = 200) {
  return z.string({ required_error: `Enter ${what}`, invalid_type_error: `Enter ${what}` }).trim()
    .min(1, `Enter ${what}`).max(max, `${what}: at most ${max} characters`)
    .regex(wellFormedText, brokenCharacterMessage(what))
}

/**
 * Whether YYYY-MM-DD names a day of the proleptic Gregorian calendar (ISO 8601:2019, 4.3.2; leap years by the
 * Gregorian rule): 2026-13-45 and 2026-02-30 do not.
 */
export function isCalendarDay(text: string) {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text)
  if (!match) return false
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])]
  if (month < 1 || month > 12 || day < 1) return false
  const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0
  const days = [31, leap ? 29 : 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31][month - 1]!
  return day <= days
}

/** A calendar date as YYYY-MM-DD that exists; `what` names the field in the messages. */
export function calendarDate(what = 'Date', messages: { required?: string, format?: string, real?: string } = {}) {
  return z.string({ required_error: messages.required ?? `Enter ${what.toLowerCase()}`, invalid_type_error: messages.format ?? `${what} must be a date as YYYY-MM-DD` })
    .regex(/^\d{4}-\d{2}-\d{2}$/, messages.format ?? `${what} must be a date as YYYY-MM-DD`)
    .refine(isCalendarDay, messages.real ?? `${what} is not a calendar date`)
}

/** A min–max range; either end may be open (null). */
export function rangeOf(what: string, options: { min?: number, positive?: boolean } = {}) {
  return z.object({
    min: optionalNumber(`${what} minimum`, options),
    max: optionalNumber(`${what} maximum`, options),
  }).refine(r => r.min === null || r.max === null || r.min <= r.max, { message: `${what}: the minimum is above the maximum`, path: ['max'] })
}

/**
 * A production window, entered either as min–max or as a set point with a trim (18.0 V ± 1.0 V);
 * the set point is kept so the sheet can print it the way it was written.
 */
export function windowOf(what: string) {
  return z.object({
    min: optionalNumber(`${what} minimum`),
    max: optionalNumber(`${what} maximum`),
    setPoint: optionalNumber(`${what} set point`).optional().default(null),
  }).refine(r => r.min === null || r.max === null || r.min <= r.max, { message: `${what}: the minimum is above the maximum`, path: ['max'] })
    .refine(r => r.setPoint === null || ((r.min === null || r.min <= r.setPoint) && (r.max === null || r.setPoint <= r.max)),
      { message: `${what}: the set point lies outside its window`, path: ['setPoint'] })
}

export const idSchema = z.number({ invalid_type_error: 'must be a record id' }).int('must be a record id').positive('must be a record id').max(2_147_483_647)
export const versionSchema = z.number({ required_error: 'Send the version you edited', invalid_type_error: 'version must be a whole number' })
  .int('version must be a whole number').positive('version must be a whole number').max(2_147_483_647, 'version is too large')
export const codeIdSchema = z.enum(codeIds, { errorMap: (_issue, ctx) => ({ message: ctx.data === 'iso-15614-1'
  ? 'ISO 15614-1 qualifies procedures, not welders: a welder test names ISO 9606-1'
  : 'Pick a code' }) })
/** The code of a WPS or PQR/WPQR: ISO 9606-1 (the welder standard) is refused with a message naming ISO 15614-1. */
export const procedureCodeIdSchema = z.enum(procedureCodeIds, { errorMap: (_issue, ctx) => ({ message: ctx.data === 'iso-9606-1'
  ? 'ISO 9606-1 qualifies welders, not procedures: a WPS or WPQR names ISO 15614-1'
  : 'Pick a code' }) })
export const unitIdSchema = z.enum(['in', 'mm'], { errorMap: () => ({ message: 'Pick in or mm' }) })
export const transferIdSchema = z.enum(['short-circuit', 'globular', 'spray', 'pulse'], { errorMap: () => ({ message: 'Pick a transfer mode' }) })
export const editionSchema = z.string({ required_error: 'Enter the edition' }).trim().regex(/^\d{4}$/, 'Enter the edition year, e.g. 2023')
export const daySchema = calendarDate('Date', { required: 'Enter a date', format: 'Enter a date as YYYY-MM-DD', real: 'Enter a real date' })

/** A body that carries only the version being acted on (approve, certify, revise). */
export const versionBodySchema = z.object({ version: versionSchema }).strict()

/** A record id picked in a form (a select gives text); empty means not picked. */
export function pickedId(what: string) {
  return z.preprocess(v => (v === '' || v === null ? undefined : typeof v === 'string' && /^\d+$/.test(v) ? Number(v) : v),
    z.number({ required_error: `Pick ${what}`, invalid_type_error: `Pick ${what}` }).int().positive().max(2_147_483_647))
}
