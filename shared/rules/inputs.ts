import type { CodeId, Form, Range, Transfer, WeldType } from './types'

/**
 * Inputs of the checks, as described in the request format; every length is in the request's unit,
 * every temperature in °F when the unit is "in" and in °C when it is "mm", Charpy energy in ft·lbf
 * ("in") or J ("mm"). Every field added after the first release is optional: a request that leaves it
 * out is answered as before, except that a variable one side states and the other does not is
 * answered "cannot tell: record X" instead of a guess.
 */

/** Direction of travel in vertical welding (QW-405.3; AWS D1.1 and D1.3 welder variables). */
export type Progression = 'uphill' | 'downhill'

/** Current type and polarity (QW-409.4). */
export type CurrentType = 'AC' | 'DCEP' | 'DCEN'

/**
 * Filler metal product form (QW-404.23 for GTAW/PAW welders, from memory: the three families are
 * flux-cored; bare (solid) or metal-cored; powder).
 */
export type FillerForm = 'solid' | 'metal-cored' | 'flux-cored' | 'powder'

/** ISO 9606-1 weld details (5.9): which side(s) were welded and the backing of a single-side weld. */
export type WeldSides = 'single' | 'both'

/** ISO 9606-1 fillet weld details (5.9): single layer (sl) or multi-layer (ml). */
export type Layering = 'single' | 'multi'

/**
 * Welder variables of one process on a coupon or in a production weld. On a welder test each
 * process carries its own deposit thickness (QW-452.1(b) Note 1: t per welder, process and F-No.).
 */
export interface ProcessVariables {
  process: string
  transfer?: Transfer
  /** Weld metal deposited with this process (on a test: in the coupon; in production: in the joint). */
  depositThickness?: number
  /** Layers deposited with this process (QW-452.1(b): 1/2 in and 3 layers qualify the maximum). */
  layers?: number
  fNumber?: number
  progression?: Progression
  /** QW-404.14: filler metal added (false: autogenous). */
  fillerAdded?: boolean
  /** QW-404.22: a consumable insert used. */
  consumableInsert?: boolean
  /** QW-404.23: filler product form. */
  fillerForm?: FillerForm
  /** QW-408.8: inert gas backing used. */
  backingGas?: boolean
  /** QW-409.4: current type and polarity. */
  current?: CurrentType
  /** ISO 9606-1 5.6: filler material type (S, M, B, R, RB, RA, RC, RR, A, C, ...). */
  fillerType?: string
}

export interface ProcedureRangesInput {
  process: string
  transfer?: Transfer
  couponThickness: number
  depositThickness?: number
  toughness?: boolean
  /** Thickest single weld pass in the coupon, for QW-403.9. */
  maxPassThickness?: number
  /** AWS D1.1: the PQR's groove test positions, for the WPS positions qualified. */
  testPositions?: string[]
}

export type D13Joint = 'square-groove' | 'flare-groove' | 'fillet' | 'plug' | 'arc-spot' | 'arc-seam'

/**
 * A welder test coupon. The single-process fields (process, transfer, depositThickness, layers,
 * fNumber and the process variables) describe a one-process coupon; `processes` describes a
 * combination coupon (one coupon, several processes, each with its own deposit; QW-306,
 * QW-452.1(b) Note 1, ISO 9606-1 5.2). When `processes` is given, `process` may be left out.
 */
export interface WelderTestInput extends Partial<Omit<ProcessVariables, 'process'>> {
  process?: string
  processes?: ProcessVariables[]
  form: Form
  weld: WeldType
  testPositions: string[]
  couponThickness?: number
  outsideDiameter?: number
  /** Backing (QW-402.4; for ASME a double-welded joint counts as welded with backing). */
  backing?: boolean
  pNumber?: string
  /** AWS D1.3 joint type (square-groove, flare-groove, fillet, plug, arc-spot, arc-seam). */
  joint?: D13Joint
  /** AWS D1.3: the sheet's coating ("none" for uncoated; otherwise the coating, e.g. "galvanized"). */
  coating?: string
  /** ISO 9606-1 5.9. */
  sides?: WeldSides
  layering?: Layering
}

/**
 * A production weld (a joint). `position` (one letter) or `positions` (several: a fixed pipe joint
 * of the 5G type is welded F, V and O) must be given; every position listed must be qualified.
 * `code` is the code the joint is welded to: a test of another code never covers it. `processes`
 * lists the processes of a multi-process joint (each must be covered, within its own deposit).
 */
export interface ProductionWeld extends Partial<Omit<ProcessVariables, 'process' | 'depositThickness' | 'layers'>> {
  code?: CodeId
  form: Form
  weld: WeldType
  position?: string
  positions?: string[]
  outsideDiameter?: number
  /** Groove: deposit thickness of the joint (ASME) or thickness; fillet: base metal thickness. */
  thickness?: number
  process?: string
  processes?: ProcessVariables[]
  backing?: boolean
  pNumber?: string
  joint?: D13Joint
  coating?: string
  sides?: WeldSides
  layering?: Layering
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

/**
 * Specimen set of a welder test coupon, for the `specimens` check: whether the types and counts
 * match the code's table for that coupon (QW-452.1(a); AWS D1.1 Tables 6.11/10.13; ISO 9606-1).
 */
export interface SpecimenSetInput {
  /** The coupon, as for welder-ranges (its processes, form, positions, thickness). */
  test: WelderTestInput
  /** Specimen types tested: "face", "root", "side", "macro", "fracture". */
  specimens: { type: string }[]
}

/** A base metal of a WPS or PQR: P-No. (as printed: "1", "5A", "15E", "unassigned") and Group No. */
export interface BaseMetal {
  pNumber: string
  group?: number
}

/**
 * PWHT condition (QW-407.1): none; below the lower transformation temperature; above the upper;
 * above the upper followed by below the lower; between the transformation temperatures.
 */
export type PwhtCondition = 'none' | 'below-lower' | 'above-upper' | 'above-upper-then-below-lower' | 'between'

export interface Pwht {
  condition: PwhtCondition
  /** Temperature range and time at temperature (hours), for QW-407.2 with toughness. */
  temperatureMin?: number
  temperatureMax?: number
  hours?: number
}

/** One process layer of a WPS (root, hot pass, fill, cap ...), with the limits the WPS states. */
export interface WpsLayer {
  process: string
  transfer?: Transfer
  /** Deposit limit of this process (null: unlimited). */
  depositMax?: number | null
  fNumber?: number
  aNumber?: number
  current?: CurrentType
  progression?: Progression
  fillerAdded?: boolean
  consumableInsert?: boolean
  fillerForm?: FillerForm
  backingGas?: boolean
  /** Heat input limit (J/in or J/mm), QW-409.1 with toughness. */
  heatInputMax?: number
}

/**
 * A WPS draft. The single-process fields (process, transfer, depositMax, fNumber, heatInputMax)
 * describe a one-process WPS; `layers` a multi-process one. When `layers` is given, `process`
 * may be left out.
 */
export interface WpsDraft {
  process?: string
  transfer?: Transfer
  thickness: Range
  depositMax?: number | null
  toughness?: boolean
  heatInputMax?: number
  fNumber?: number
  layers?: WpsLayer[]
  /** Base metal A (and B for a dissimilar joint; B left out: A to A). QW-424.1. */
  baseMetals?: { a: BaseMetal, b?: BaseMetal }
  /** Minimum preheat (QW-406.1). */
  preheatMin?: number
  /** Maximum interpass temperature (QW-406.3, supplementary with toughness). */
  interpassMax?: number
  pwht?: Pwht
  /** Welding positions of the WPS (F, H, V, O); compared by AWS D1.1 with the PQR test positions. */
  positions?: ('F' | 'H' | 'V' | 'O')[]
}

/** One process layer of a PQR, with the values actually used. */
export interface PqrLayer {
  process: string
  transfer?: Transfer
  /** Weld metal deposited with this process in the coupon (QW-451.1 column t). */
  depositThickness?: number
  maxPassThickness?: number
  fNumber?: number
  aNumber?: number
  current?: CurrentType
  progression?: Progression
  fillerAdded?: boolean
  consumableInsert?: boolean
  fillerForm?: FillerForm
  backingGas?: boolean
  heatInput?: number
}

/** Charpy V-notch results of a PQR and the acceptance values the user entered from the construction code. */
export interface ToughnessResults {
  /** Test temperature. */
  temperature?: number
  /** Each specimen: absorbed energy and, where measured, lateral expansion (mils in "in", mm in "mm"). */
  specimens: { energy: number, lateralExpansion?: number, location?: string }[]
  acceptance: {
    /** Minimum average energy of the set. */
    averageEnergy?: number
    /** Minimum energy of any single specimen. */
    singleEnergy?: number
    /** Minimum lateral expansion of any single specimen. */
    lateralExpansion?: number
    /** The highest test temperature the construction code allows (the test must be at or below it). */
    temperatureMax?: number
  }
}

/**
 * A PQR. The single-process fields (process, transfer, depositThickness, maxPassThickness,
 * heatInput, fNumber) describe a one-process PQR; `layers` a multi-process one.
 */
export interface PqrRecord extends Omit<ProcedureRangesInput, 'process'> {
  id?: string
  process?: string
  heatInput?: number
  fNumber?: number
  layers?: PqrLayer[]
  /** Base metal A (and B when different). */
  baseMetals?: { a: BaseMetal, b?: BaseMetal }
  preheat?: number
  interpassMax?: number
  pwht?: Pwht
  toughnessResults?: ToughnessResults
  /** Test positions of the coupon (1G, 3G...), as recorded. */
  testPositions?: string[]
}

export interface WpsSupportInput {
  wps: WpsDraft
  pqrs: PqrRecord[]
}

/** The `toughness` check: judge a PQR's Charpy results against the acceptance values entered. */
export type ToughnessInput = ToughnessResults
