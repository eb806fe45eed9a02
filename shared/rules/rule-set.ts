import type { ContinuityInput, ContinuityResult } from './continuity-lapse'
import type { GaugeInput, GaugeResult } from './gauge'
import type { HeatInputInput, HeatInputResult } from './heat-input'
import type { BendInput, CoversInput, ProcedureRangesInput, RadiographyInput, SpecimenSetInput, ToughnessInput, WelderTestInput, WpsSupportInput } from './inputs'
import type { ReadingsInput, ReadingsResult } from './readings'
import type { BendResult, CoversResult, ProcedureRangesResult, RadiographyResult, SpecimenSetResult, ToughnessResult, WelderRangesResult, WpsSupportResult } from './results'
import type { TensileInput, TensileResult } from './tensile'
import type { CodeId, RuleContext, Unit } from './types'

export type Rule<I, R> = (input: I, context: RuleContext) => R

/**
 * The one interface every code module implements. A check a code does not carry is left out,
 * and evaluate() answers it with an error rather than a guess.
 */
export interface RuleSet {
  code: CodeId
  title: string
  editions: readonly string[]
  defaultEdition: string
  /** Unit systems the code prints its ranges in. */
  units: readonly Unit[]
  procedureRanges?: Rule<ProcedureRangesInput, ProcedureRangesResult>
  wpsSupport?: Rule<WpsSupportInput, WpsSupportResult>
  welderRanges: Rule<WelderTestInput, WelderRangesResult>
  covers: Rule<CoversInput, CoversResult>
  bend?: Rule<BendInput, BendResult>
  radiography?: Rule<RadiographyInput, RadiographyResult>
  continuity: Rule<ContinuityInput, ContinuityResult>
  heatInput: Rule<HeatInputInput, HeatInputResult>
  gauge: Rule<GaugeInput, GaugeResult>
  tensile: Rule<TensileInput, TensileResult>
  readings: Rule<ReadingsInput, ReadingsResult>
  /** Specimen types and counts of a welder test coupon against the code's table. */
  specimens?: Rule<SpecimenSetInput, SpecimenSetResult>
  /** Charpy results against the acceptance values entered (procedure qualification). */
  toughness?: Rule<ToughnessInput, ToughnessResult>
}
