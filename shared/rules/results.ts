import type { Range, Reason } from './types'

/** Result shapes of the checks (before evaluate() adds code, edition, unit and caution). */

export interface Specimens {
  tension: number
  face: number
  root: number
  side: number
}

export interface ProcedureRangesResult {
  baseMetal: Range
  depositMax?: number | null
  specimens: Specimens
  reasons: Reason[]
}

export interface Positions {
  groove: string[]
  groovePipe?: string[]
  groovePipeMinDiameter?: number
  fillet: string[]
  filletPipeMinDiameter?: number
}

export interface FNumbersQualified {
  numbers: number[]
  withBacking: boolean
  withoutBacking: boolean
}

export interface BendSpecimenCount {
  face: number
  root: number
  side: number
  total: number
}

/** An answer a check could not compute from the request, and what it needs (instead of refusing the whole request). */
export interface Undetermined {
  /** The request field (dot path) the missing value belongs to, e.g. "couponThickness" or "production.progression". */
  field: string
  /** What is needed and why, with the clause. */
  needed: string
}

/** What one process of a combination coupon qualifies (QW-452.1(b) Note 1: per welder, process and F-No.). */
export interface ProcessDepositQualified {
  process: string
  transfer?: string
  /** Deposit qualified for this process (null: the maximum to be welded; undefined: not determined). */
  depositMax?: number | null
  clause: string
}

export interface WelderRangesResult {
  depositMax?: number | null
  thickness?: Range
  filletSizeMax?: number | null
  diameter?: Range
  positions: Positions
  fNumbers?: FNumbersQualified
  pNumbers?: string[]
  bendSpecimens?: BendSpecimenCount
  processes?: string[]
  fillerGroups?: string[]
  transfers?: string[]
  /** Combination coupon: the deposit each process qualifies. */
  deposits?: ProcessDepositQualified[]
  /** Combination coupon: the total deposit of the combination where the code sums it (ISO 9606-1), or null for unlimited. */
  combinedDepositMax?: number | null
  /** The welder essential variables the coupon fixes, each with what it qualifies (the code's variable table). */
  variables?: QualifiedVariable[]
  /** What could not be computed from the request and what it needs. */
  undetermined?: Undetermined[]
  reasons: Reason[]
}

/** One essential variable of a welder test and what the recorded value qualifies. */
export interface QualifiedVariable extends Reason {
  /** Variable id from the code's table (e.g. "transfer", "progression", "backing"). */
  variable: string
  /** The value as recorded on the test, or null when the test did not record it. */
  recorded: string | null
}

/**
 * The state of one variable compared: met; not met; not recorded (one side states it, the other did
 * not record it: "cannot tell: record X"); not checked (Rootface does not compare it: check by hand);
 * not stated (the production weld leaves out a field it has always been allowed to leave out —
 * process, thickness, P-No., F-No., backing, vertical progression —: not compared, and the text says what the test qualifies).
 */
export type VariableState = 'met' | 'not-met' | 'not-recorded' | 'not-checked' | 'not-stated'

export interface CoverReason extends Reason {
  /** True only when the variable is compared and met; false for not met, not recorded and not checked. */
  met: boolean
  /** Variable id from the code's table ("process", "transfer", "position", "progression", "backing" ...). */
  variable?: string
  state?: VariableState
  /** The request field to record when the state is not-recorded (e.g. "test.progression"). */
  record?: string
  /** Process layer the finding is about (combination coupons, multi-process joints and WPSs). */
  process?: string
}

/** covered: every variable compared is met; not-covered: one is not met; cannot-tell: none is unmet but one is not recorded. */
export type CoverAnswer = 'covered' | 'not-covered' | 'cannot-tell'

export interface CoversResult {
  /** True only when the answer is "covered". */
  covered: boolean
  answer: CoverAnswer
  /** Fields to record before the question can be answered (when the answer is cannot-tell). */
  record: string[]
  reasons: CoverReason[]
  undetermined: Undetermined[]
}

export interface BendSpecimenResult {
  accepted: boolean
  /** D1.1: a corner crack over 1/4 in with no sign of slag or lack of fusion: the specimen is replaced. */
  replace?: boolean
  reason: string
}

export interface BendResult {
  accepted: boolean
  specimens: BendSpecimenResult[]
  reasons: Reason[]
}

export interface RadiographyResult {
  accepted: boolean
  reason: string
  /** True when rounded indications must also be judged on the charts of Figure QW-191.1.2.2(b)(4). */
  chartCheckRequired: boolean
  reasons: Reason[]
}

/** Support of one WPS process layer: by which PQR(s), variable by variable. */
export interface LayerSupport {
  /** 0-based index in wps.layers (0 for a single-process WPS). */
  layer: number
  process: string
  state: 'met' | 'not-met' | 'not-recorded'
  /** The PQRs (id or "PQR n") whose layers of this process support it. */
  pqrs: string[]
  variables: CoverReason[]
}

/** supported: every variable compared is met; not-supported: one is not met; cannot-tell: one is not recorded. */
export type SupportAnswer = 'supported' | 'not-supported' | 'cannot-tell'

export interface WpsSupportResult {
  /** True only when the answer is "supported". The byHand list still has to be checked by the reviewer. */
  supported: boolean
  answer: SupportAnswer
  violations: Reason[]
  /** Every finding, flat (layers and whole-procedure variables). */
  reasons: CoverReason[]
  /** Per WPS process layer. */
  layers: LayerSupport[]
  /** Whole-procedure variables: base metals (QW-424.1), preheat, PWHT, toughness. */
  procedure: CoverReason[]
  /** Essential and supplementary essential variables Rootface does not compare: check by hand, with the clause. */
  byHand: CoverReason[]
  /** Fields to record before the question can be answered. */
  record: string[]
  undetermined: Undetermined[]
}

/** The `specimens` check: whether a coupon's specimen types and counts match the code's table. */
export interface SpecimenSetResult {
  /** complete: the set matches one the table allows; incomplete: it does not (a missing or wrong type); cannot-tell: the table row could not be chosen. */
  answer: 'complete' | 'incomplete' | 'cannot-tell'
  complete: boolean
  /** The sets the table allows for this coupon (any one of them). */
  allowed: SpecimenCountSet[]
  /** What was given, counted by type. */
  given: Record<string, number>
  /** What is missing for the nearest allowed set, e.g. ["1 root"]. */
  missing: string[]
  undetermined: Undetermined[]
  reasons: Reason[]
}

export interface SpecimenCountSet {
  face?: number
  root?: number
  side?: number
  macro?: number
  fracture?: number
}

/** The `toughness` check: Charpy results against the acceptance values the user entered. */
export interface ToughnessResult {
  answer: 'accepted' | 'rejected' | 'cannot-tell'
  accepted: boolean
  averageEnergy: number | null
  minimumEnergy: number | null
  minimumLateralExpansion: number | null
  undetermined: Undetermined[]
  reasons: CoverReason[]
}
