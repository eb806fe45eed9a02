import { getRuleSet } from '../rules'
import type { WelderTestInput } from '../rules/inputs'
import type { Range, CodeId, Unit } from '../rules/types'
import type { WelderRangesResult } from '../rules/results'
import { toMicro } from '../rules/units'

/**
 * The version of the rules that the stored qualified ranges were derived with. Raise it whenever a change to shared/rules
 * may change what a welder test qualifies (a table row, a clause, a new variable): at start-up every row stamped with
 * another version is derived again, and until then such a row keeps its test a candidate for every joint.
 */
export const QUALIFIED_RANGES_RULES_VERSION = 2

/**
 * One certified test as "Who can weld it?" judges it for one process: the rules input, and the context. The same input
 * is judged by the covers rule; the stored ranges are derived from it, so both always speak of the same coupon.
 */
export interface RangesSource {
  code: CodeId
  edition: string
  unit: Unit
  process: string
  weld: 'groove' | 'fillet'
  input: WelderTestInput
}

/** The columns of qualified_ranges for one test and process (lengths in micro-units of the test's unit). */
export interface QualifiedRangesColumns {
  derived: boolean
  weld: string
  positionsGroove: string[] | null
  positionsGroovePipe: string[] | null
  positionsFillet: string[] | null
  depositMaxMicro: number | null
  thicknessMinMicro: number | null
  thicknessMaxMicro: number | null
  diameterMinMicro: number | null
  fNumbers: number[] | null
  fWithoutBacking: boolean | null
  backing: boolean | null
  transfer: string | null
  progression: string | null
}

const micro = (v: number | null | undefined) => (v === null || v === undefined ? null : toMicro(v))
const lower = (r: Range | undefined) => micro(r?.min)
const upper = (r: Range | undefined) => micro(r?.max)
const text = (v: unknown) => (typeof v === 'string' ? v : null)

/**
 * What the test qualifies, read from the ranges object the code's own welderRanges rule returns (positions per joint kind,
 * deposit and thickness bounds, minimum diameter, F-Nos. with the backing condition) beside the values the coupon records
 * for the categorical variables (backing, transfer, progression). Nothing here is code-specific: a new code's rule fills
 * the same ranges shape. A null column means "not determined" and never filters. When the rules cannot evaluate the test
 * it is stored as not derived, and stays a candidate for every joint.
 */
export function deriveQualifiedRanges(source: RangesSource): QualifiedRangesColumns {
  const recorded = {
    weld: source.weld,
    backing: typeof source.input.backing === 'boolean' ? source.input.backing : null,
    transfer: text(source.input.transfer),
    progression: text(source.input.progression),
  }
  let ranges: WelderRangesResult
  try {
    ranges = getRuleSet(source.code).welderRanges(source.input, { code: source.code, edition: source.edition, unit: source.unit })
  }
  catch {
    return notDerived(recorded)
  }
  return {
    derived: true,
    ...recorded,
    positionsGroove: ranges.positions.groove,
    positionsGroovePipe: ranges.positions.groovePipe ?? null,
    positionsFillet: ranges.positions.fillet,
    depositMaxMicro: micro(ranges.depositMax),
    thicknessMinMicro: lower(ranges.thickness),
    thicknessMaxMicro: upper(ranges.thickness),
    diameterMinMicro: lower(ranges.diameter),
    fNumbers: ranges.fNumbers?.numbers ?? null,
    fWithoutBacking: ranges.fNumbers?.withoutBacking ?? null,
  }
}

function notDerived(recorded: Pick<QualifiedRangesColumns, 'weld' | 'backing' | 'transfer' | 'progression'>): QualifiedRangesColumns {
  return {
    derived: false, ...recorded, positionsGroove: null, positionsGroovePipe: null, positionsFillet: null, depositMaxMicro: null,
    thicknessMinMicro: null, thicknessMaxMicro: null, diameterMinMicro: null, fNumbers: null, fWithoutBacking: null,
  }
}
