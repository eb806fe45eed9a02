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
  reasons: Reason[]
}

export interface CoverReason extends Reason {
  met: boolean
}

export interface CoversResult {
  covered: boolean
  reasons: CoverReason[]
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

export interface WpsSupportResult {
  supported: boolean
  violations: Reason[]
  reasons: CoverReason[]
}
