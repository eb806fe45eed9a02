/** Shared types of the code rules. Every length is a number in the request's unit. */

export type Unit = 'in' | 'mm'

/** A range of a qualified value; null means no limit ("unlimited", "maximum to be welded"). */
export interface Range {
  min: number | null
  max: number | null
}

/**
 * How a rule's value was read: 'verified' on a public copy of the code or a worked example,
 * 'partial' when only part was confirmed, 'memory' when not checked against the code text,
 * 'convention' for a choice this module makes where the code gives no arithmetic.
 */
export type Basis = 'verified' | 'partial' | 'memory' | 'convention'

/** One limit or finding, with the clause behind it and plain words for screens and sheets. */
export interface Reason {
  clause: string
  text: string
  basis: Basis
}

export type CodeId = 'asme-ix' | 'aws-d1.1' | 'aws-d1.3' | 'iso-9606-1'

export type CheckName
  = | 'procedure-ranges'
    | 'welder-ranges'
    | 'covers'
    | 'bend'
    | 'radiography'
    | 'continuity'
    | 'heat-input'
    | 'gauge'
    | 'tensile'
    | 'readings'
    | 'wps-support'
    | 'specimens'
    | 'toughness'

/** What every result carries besides its own fields. */
export interface ResultMeta {
  code: CodeId
  edition: string
  unit: Unit
  reasons: Reason[]
  caution: string
}

/** What a rule function receives besides its input. */
export interface RuleContext {
  code: CodeId
  edition: string
  unit: Unit
}

export type Process
  = | 'SMAW' | 'GTAW' | 'GMAW' | 'FCAW' | 'SAW' | 'PAW' | 'OFW' | 'ESW' | 'EGW' | 'LLBW'

export type Transfer = 'short-circuit' | 'globular' | 'spray' | 'pulse'

export type Form = 'plate' | 'pipe'

export type WeldType = 'groove' | 'fillet'

export interface ErrorResult {
  error: string
}
