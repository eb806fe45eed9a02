import type { CoverReason } from './results'
import type { Basis, Range, Unit } from './types'
import { formatRange, toMicro } from './units'

/** A covered/not-covered finding with its clause. */
export function finding(met: boolean, clause: string, text: string, basis: Basis): CoverReason {
  return { met, clause, text, basis }
}

/** Whether a value lies in a range (null = unlimited), compared exactly in micro-units. */
export function inRange(value: number, range: Range): boolean {
  const v = toMicro(value)
  return (range.min === null || v >= toMicro(range.min)) && (range.max === null || v <= toMicro(range.max))
}

export function rangeText(range: Range, unit: Unit): string {
  return formatRange(range.min === null ? null : toMicro(range.min), range.max === null ? null : toMicro(range.max), unit)
}
