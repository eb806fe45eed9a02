import type { Form, Range, Transfer, WeldType } from './types'

/** Inputs of the checks, as described in the request format; every length is in the request's unit. */

export interface ProcedureRangesInput {
  process: string
  transfer?: Transfer
  couponThickness: number
  depositThickness?: number
  toughness?: boolean
  /** Thickest single weld pass in the coupon, for QW-403.9. */
  maxPassThickness?: number
}

export type D13Joint = 'square-groove' | 'flare-groove' | 'fillet' | 'plug' | 'arc-spot' | 'arc-seam'

export interface WelderTestInput {
  process: string
  transfer?: Transfer
  form: Form
  weld: WeldType
  testPositions: string[]
  couponThickness?: number
  depositThickness?: number
  layers?: number
  outsideDiameter?: number
  backing?: boolean
  fNumber?: number
  pNumber?: string
  /** AWS D1.3 joint type (square-groove, flare-groove, fillet, plug, arc-spot, arc-seam). */
  joint?: D13Joint
}

export interface ProductionWeld {
  form: Form
  weld: WeldType
  position: string
  outsideDiameter?: number
  thickness?: number
  process?: string
  transfer?: Transfer
  fNumber?: number
  backing?: boolean
  pNumber?: string
  joint?: D13Joint
}

export interface CoversInput {
  test: WelderTestInput | WelderTestInput[]
  production: ProductionWeld
}

export interface BendIndication {
  size: number
  atCorner?: boolean
  fromInternalDefect?: boolean
}

export interface BendSpecimen {
  type: string
  indications: BendIndication[]
}

export interface BendInput {
  specimens: BendSpecimen[]
}

export type RadiographicKind = 'crack' | 'incomplete-fusion' | 'incomplete-penetration' | 'slag' | 'rounded'

export interface RadiographyInput {
  thickness: number
  indications: { kind: RadiographicKind, length: number }[]
  process?: string
  transfer?: Transfer
}

export interface WpsDraft {
  process: string
  transfer?: Transfer
  thickness: Range
  depositMax?: number | null
  toughness?: boolean
  heatInputMax?: number
  fNumber?: number
}

export interface PqrRecord extends ProcedureRangesInput {
  id?: string
  heatInput?: number
  fNumber?: number
}

export interface WpsSupportInput {
  wps: WpsDraft
  pqrs: PqrRecord[]
}
