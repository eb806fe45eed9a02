import type { Unit } from './types'

/**
 * Lengths are compared as integers in micro-units of the request's unit (1e-6 in or 1e-6 mm).
 * Every table boundary (1/64 in steps, 0.1 mm steps) is an exact integer there, so 3/8 in,
 * 2-7/8 in or 3.175 mm never suffer float error. Each code prints its own inch and millimetre
 * values, which are not exact conversions of each other (1/8 in = 3.175 mm but the code pairs it
 * with 3 mm): a limit is therefore written once per unit, never converted.
 */
export const MICRO = 1_000_000

export function toMicro(value: number): number {
  return Math.round(value * MICRO)
}

export function fromMicro(micro: number): number {
  return Math.round(micro) / MICRO
}

/** Exact micro-units of an inch fraction such as '3/8', '2-7/8', '1-1/2' or '6'. */
export function inchFraction(text: string): number {
  const match = /^(?:(\d+)(?:-(\d+)\/(\d+))?|(\d+)\/(\d+))$/.exec(text)
  if (!match) throw new Error(`not an inch fraction: ${text}`)
  if (match[4] !== undefined) return (Number(match[4]) * MICRO) / Number(match[5])
  const whole = Number(match[1]) * MICRO
  if (match[2] === undefined) return whole
  return whole + (Number(match[2]) * MICRO) / Number(match[3])
}

/** A limit as the code prints it in each unit system. */
export interface PrintedLength {
  in: number
  mm: number
}

/** A printed limit: the inch value as a fraction, the SI value in mm, both as micro-units. */
export function printed(inch: string, mm: number): PrintedLength {
  return { in: inchFraction(inch), mm: toMicro(mm) }
}

export function pick(length: PrintedLength, unit: Unit): number {
  return length[unit]
}

/** value × num / den in micro-units, rounded to the nearest micro-unit. */
export function scale(micro: number, num: number, den: number): number {
  return Math.round((micro * num) / den)
}

const sixtyFourths = MICRO / 64

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b)
}

/** Print a length as the code does: inch fractions (2-7/8 in) or decimal millimetres. */
export function formatLength(micro: number, unit: Unit): string {
  const rounded = Math.round(micro)
  if (unit === 'in' && rounded % sixtyFourths === 0) {
    const total = rounded / sixtyFourths
    const whole = Math.floor(total / 64)
    const rest = total % 64
    if (rest === 0) return `${whole} in`
    const divisor = gcd(rest, 64)
    const fraction = `${rest / divisor}/${64 / divisor}`
    return whole === 0 ? `${fraction} in` : `${whole}-${fraction} in`
  }
  return `${fromMicro(rounded)} ${unit}`
}

export function formatRange(min: number | null, max: number | null, unit: Unit): string {
  const low = min === null ? 'no minimum' : formatLength(min, unit)
  const high = max === null ? 'unlimited' : formatLength(max, unit)
  return `${low} to ${high}`
}

/** Convert a length between inch and mm (25.4 mm per inch exactly), to 1e-9 of the target unit. */
export function convertLength(value: number, from: Unit, to: Unit): number {
  if (from === to) return value
  const raw = from === 'in' ? value * 25.4 : value / 25.4
  return Math.round(raw * 1e9) / 1e9
}

export function unitLabel(unit: Unit): string {
  return unit === 'in' ? 'in' : 'mm'
}
