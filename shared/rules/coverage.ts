import type { CoversInput, ProductionWeld, WelderTestInput } from './inputs'
import type { CoverReason, CoversResult } from './results'
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

/**
 * A set of tests covers a production weld when one of them covers it all. Position sets of
 * separate tests combine the same way as the combined-test rows of the position tables.
 */
export function coversAny(
  input: CoversInput,
  one: (test: WelderTestInput, production: ProductionWeld) => CoverReason[],
): CoversResult {
  const tests = Array.isArray(input.test) ? input.test : [input.test]
  const results = tests.map(test => one(test, input.production))
  const index = results.findIndex(reasons => reasons.every(r => r.met))
  if (index >= 0) return { covered: true, answer: 'covered', record: [], reasons: results[index] ?? [], undetermined: [] }
  if (results.length === 1) return { covered: false, answer: 'not-covered', record: [], reasons: results[0] ?? [], undetermined: [] }
  return {
    covered: false,
    answer: 'not-covered',
    record: [],
    reasons: results.flatMap((reasons, i) => reasons.map(r => ({ ...r, text: `Test ${i + 1}: ${r.text}` }))),
    undetermined: [],
  }
}
