import type { ProcessVariables, ProductionWeld, WelderTestInput } from './inputs'
import type { CoverAnswer, CoverReason, Undetermined, VariableState } from './results'
import type { Basis } from './types'
import { fieldWords } from '../vocabulary/field-words'

/**
 * One welder essential variable as a code names it: its id, its clause, how Rootface compares it
 * and the request field it needs. Each code module lists its variables in one table of these.
 */
export interface VariableRow {
  id: string
  clause: string
  /** The request field(s) it reads, on the test and on the production weld. */
  field: string
  /** How it is compared, in words (for the README and the screens). */
  compared: string
  basis: Basis
  /** Processes the code lists it for (undefined: every process). */
  processes?: readonly string[]
  /** 'compared' by the rules, or 'by-hand' when Rootface has no input for it. */
  mode: 'compared' | 'by-hand'
}

export function reason(state: VariableState, variable: string, clause: string, text: string, basis: Basis, extra: Partial<CoverReason> = {}): CoverReason {
  return { met: state === 'met', state, variable, clause, text, basis, ...extra }
}

/**
 * A categorical variable compared both ways: both sides state it → met or not met; production
 * states it and the test did not record it → not recorded (record the test's value); the test
 * states a value that does not qualify every production value and production does not state it →
 * not recorded (record the production's value); neither states it → not compared (null).
 */
export function categorical<T>(o: {
  variable: string
  clause: string
  basis: Basis
  field: string
  test: T | undefined
  production: T | undefined
  qualifies: (test: T, production: T) => boolean
  /** True when the test's value qualifies every production value (then production need not state it). */
  qualifiesAll?: (test: T) => boolean
  /** True when every test value qualifies this production value (then the test need not have recorded it). */
  qualifiedByAll?: (production: T) => boolean
  show: (value: T) => string
  process?: string
}): CoverReason | null {
  const extra = o.process === undefined ? {} : { process: o.process }
  const { test, production } = o
  const words = fieldWords(o.field) // in trade words: "P-No.", never "pNumber"
  if (test === undefined && production === undefined) return null
  if (test === undefined) {
    if (o.qualifiedByAll?.(production as T)) return reason('met', o.variable, o.clause, `Production ${o.show(production as T)}: qualified by any test.`, o.basis, extra)
    return reason('not-recorded', o.variable, o.clause, `Production is ${o.show(production as T)}; the test did not record its ${words}: cannot tell, record it.`, o.basis, { ...extra, record: `test.${o.field}` })
  }
  if (production === undefined) {
    if (o.qualifiesAll?.(test)) return reason('met', o.variable, o.clause, `The test (${o.show(test)}) qualifies every ${words}.`, o.basis, extra)
    return reason('not-recorded', o.variable, o.clause, `The test was ${o.show(test)}, which does not qualify every ${words}; production does not state its ${words}: cannot tell, record it.`, o.basis, { ...extra, record: `production.${o.field}` })
  }
  const ok = o.qualifies(test, production)
  return reason(ok ? 'met' : 'not-met', o.variable, o.clause, ok
    ? `Production ${o.show(production)}: qualified by the test (${o.show(test)}).`
    : `Production ${o.show(production)}: the test (${o.show(test)}) does not qualify it.`, o.basis, extra)
}

export function answerOf(reasons: CoverReason[]): CoverAnswer {
  const counted = reasons
  if (counted.some(r => r.state === 'not-met' || (r.state === undefined && !r.met))) return 'not-covered'
  if (counted.some(r => r.state === 'not-recorded' || r.state === 'not-checked')) return 'cannot-tell'
  return 'covered'
}

export function recordOf(reasons: CoverReason[]): string[] {
  return [...new Set(reasons.filter(r => r.state === 'not-recorded' && r.record).map(r => r.record as string))]
}

/** Undetermined entries of a set of findings (what to record, and why). */
export function undeterminedOf(reasons: CoverReason[]): Undetermined[] {
  const seen = new Set<string>()
  const out: Undetermined[] = []
  for (const r of reasons) {
    if (r.state !== 'not-recorded' || !r.record || seen.has(r.record)) continue
    seen.add(r.record)
    out.push({ field: r.record, needed: `${r.clause}: ${r.text}` })
  }
  return out
}

/** Whether vertical progression matters: a production weld made in the vertical position. */
export function weldsVertical(positions: string[]): boolean {
  return positions.some(p => p.toUpperCase() === 'V')
}

/** A test layer's and a production layer's variables side by side. */
export interface LayerPair {
  test: ProcessVariables
  production: ProcessVariables
  coupon: WelderTestInput
  joint: ProductionWeld
  /** Index of the layer in the test's processes. */
  testIndex: number
  /** Index of the layer in the production's processes. */
  productionIndex: number
}

export const show = {
  bool: (yes: string, no: string) => (v: boolean) => (v ? yes : no),
  text: (v: unknown) => String(v),
}

/**
 * Backing of a layer (QW-402.4 from memory; common practice): the first process of a combination
 * coupon or joint is welded with the coupon's backing; each later process is deposited on the
 * weld metal of the earlier ones, so it is welded with backing.
 */
export function layerBacking(backing: boolean | undefined, index: number): boolean | undefined {
  return index > 0 ? true : backing
}
