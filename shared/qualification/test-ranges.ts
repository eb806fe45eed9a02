import { evaluate } from '../rules'
import type { ProcessVariables } from '../rules/inputs'
import type { CodeId, Unit } from '../rules/types'

export interface WelderTestVariables {
  code: CodeId
  edition: string
  unit: Unit
  process: string
  transfer?: string | null
  form: 'plate' | 'pipe'
  weld: 'groove' | 'fillet'
  couponThickness?: number | null
  depositThickness?: number | null
  layers?: number | null
  outsideDiameter?: number | null
  pNumber?: string | null
  fNumber?: string | null
  backing?: boolean | null
  positions: string[]
  /** Combination coupon: each process with its own deposit (the single-process fields are then ignored). */
  processes?: ProcessVariables[] | null
  /** Stored as text: only "uphill" or "downhill" is passed to the rules. */
  progression?: string | null
  fillerAdded?: boolean | null
  consumableInsert?: boolean | null
  fillerForm?: 'solid' | 'metal-cored' | 'flux-cored' | 'powder' | null
  backingGas?: boolean | null
  current?: 'AC' | 'DCEP' | 'DCEN' | null
  /** AWS D1.3 joint type (square-groove, flare-groove, fillet, plug, arc-spot, arc-seam). */
  jointType?: string | null
  /** ISO 9606-1: filler type and weld details (ss nb, ss mb, bs; sl, ml) */
  iso?: { fillerType?: string | null, details?: string | null } | null
}

/** ISO 9606-1, 5.9: the weld details as the rules' sides, backing and layering. */
export function isoDetailVariables(iso: WelderTestVariables['iso']) {
  const d = iso?.details
  if (d === 'ss nb') return { sides: 'single', backing: false }
  if (d === 'ss mb') return { sides: 'single', backing: true }
  if (d === 'bs') return { sides: 'both', backing: true }
  if (d === 'sl') return { layering: 'single' }
  if (d === 'ml') return { layering: 'multi' }
  return {}
}

const defined = (o: Record<string, unknown>) => Object.fromEntries(Object.entries(o).filter(([, v]) => v !== null && v !== undefined))

/** The rules input for a stored welder test. */
export function welderRangesInput(test: WelderTestVariables) {
  const coupon = {
    form: test.form, weld: test.weld, testPositions: test.positions, couponThickness: test.couponThickness,
    outsideDiameter: test.outsideDiameter, backing: test.backing, pNumber: test.pNumber,
    joint: test.code === 'aws-d1.3' ? test.jointType : undefined,
    ...(test.code === 'iso-9606-1' ? isoDetailVariables(test.iso) : {}),
  }
  // ISO 9606-1, 5.6: the filler type (a combination coupon gives it per process; the one type recorded applies to each)
  const fillerType = test.code === 'iso-9606-1' ? test.iso?.fillerType ?? undefined : undefined
  if (test.processes && test.processes.length > 0) return defined({ ...coupon, processes: test.processes.map(p => defined({ ...p, fillerType })) })
  return defined({
    ...coupon, fillerType, process: test.process, transfer: test.transfer, depositThickness: test.depositThickness, layers: test.layers,
    // Stored as text ("4"); the rules take the F-Number as a number.
    fNumber: test.fNumber === null || test.fNumber === undefined || test.fNumber === '' ? undefined : Number(test.fNumber),
    progression: test.progression === 'uphill' || test.progression === 'downhill' ? test.progression : undefined, fillerAdded: test.fillerAdded, consumableInsert: test.consumableInsert, fillerForm: test.fillerForm,
    backingGas: test.backingGas, current: test.current,
  })
}

/** Whether the coupon's specimen set matches the code's table (QW-452.1(a), D1.1 Tables 6.11/10.13), or `{ error }`. */
export function specimenSetOf(test: WelderTestVariables, types: string[]) {
  return evaluate({ code: test.code, check: 'specimens', unit: test.unit, edition: test.edition, input: { test: welderRangesInput(test), specimens: types.map(type => ({ type })) } })
}

/** What a welder test qualifies, or `{ error }` when the rules cannot evaluate it. */
export function qualifiedRangesOf(test: WelderTestVariables) {
  return evaluate({ code: test.code, check: 'welder-ranges', unit: test.unit, edition: test.edition, input: welderRangesInput(test) })
}
