import { formatLength, toMicro } from '#shared/rules/units'
import type { Range, Unit } from '#shared/rules/types'

/** Characters that could make printed text lie about itself (direction overrides, controls) become visible marks. */
export function printable(text: string | null | undefined): string {
  if (text === null || text === undefined) return ''
  return String(text)
    // eslint-disable-next-line no-control-regex
    .replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/g, '\uFFFD')
    .replace(/[\u202A-\u202E\u2066-\u2069\u200E\u200F\u061C]/g, '')
}

export const dash = '—'

export function orDash(value: unknown): string {
  if (value === null || value === undefined || value === '') return dash
  return printable(String(value))
}

/** A length as the code prints it, in the unit the record was made in. */
export function length(value: number | null | undefined, unit: Unit): string {
  if (value === null || value === undefined) return dash
  const printed = formatLength(toMicro(value), unit)
  // Fractions only where they are exact; otherwise the decimal as recorded.
  return printed
}

export function rangeText(range: Range | { min: number | null, max: number | null } | null | undefined, unit: Unit): string {
  if (!range) return dash
  if (range.min === null && range.max === null) return 'all'
  if (range.max === null) return `${length(range.min, unit)} and over`
  const low = range.min === null ? 'no minimum' : length(range.min, unit)
  const high = range.max === null ? 'unlimited' : length(range.max, unit)
  return `${low} to ${high}`
}

export function windowText(span: unknown, unit = ''): string {
  if (!span || typeof span !== 'object') return span === null || span === undefined ? dash : printable(String(span))
  const { min, max } = span as { min?: number | null, max?: number | null }
  const u = unit ? ` ${unit}` : ''
  if (min !== null && min !== undefined && max !== null && max !== undefined) return `${min} to ${max}${u}`
  if (min !== null && min !== undefined) return `${min}${u} minimum`
  if (max !== null && max !== undefined) return `${max}${u} maximum`
  return dash
}

export function day(value: string | Date | null | undefined): string {
  if (!value) return dash
  if (typeof value === 'string') return value.slice(0, 10)
  return value.toISOString().slice(0, 10)
}

/** Signing times print in UTC with the zone named, so a sheet reads the same everywhere. */
export function moment(value: string | Date | null | undefined): string {
  if (!value) return dash
  const d = typeof value === 'string' ? new Date(value) : value
  return `${d.toISOString().slice(0, 16).replace('T', ' ')} UTC`
}

export function yesNo(value: boolean | null | undefined, yes = 'yes', no = 'no'): string {
  if (value === null || value === undefined) return dash
  return value ? yes : no
}

export function list(values: readonly string[] | null | undefined): string {
  return values && values.length ? values.map(printable).join(', ') : dash
}

/** Degrees in the unit system of the record: °F with inches, °C with millimetres. */
export function temperature(value: number | null | undefined, unit: Unit): string {
  if (value === null || value === undefined) return dash
  return `${value} °${unit === 'in' ? 'F' : 'C'}`
}

/** "ABCDE-23456": the short code grouped for reading aloud. */
export function groupedCode(code: string): string {
  return code.length === 10 ? `${code.slice(0, 5)}-${code.slice(5)}` : code
}

export const meaningWords: Record<string, string> = {
  prepared: 'Prepared',
  witnessed: 'Witnessed',
  approved: 'Approved',
  certified: 'Certified',
  issued: 'Issued',
}
