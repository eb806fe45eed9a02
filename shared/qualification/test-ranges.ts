import { evaluate } from '../rules'
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
}

const defined = (o: Record<string, unknown>) => Object.fromEntries(Object.entries(o).filter(([, v]) => v !== null && v !== undefined))

/** The rules input for a stored welder test. */
export function welderRangesInput(test: WelderTestVariables) {
  return defined({
    process: test.process, transfer: test.transfer, form: test.form, weld: test.weld, testPositions: test.positions,
    couponThickness: test.couponThickness, depositThickness: test.depositThickness, layers: test.layers,
    outsideDiameter: test.outsideDiameter, backing: test.backing, pNumber: test.pNumber,
    // Stored as text ("4"); the rules take the F-Number as a number.
    fNumber: test.fNumber === null || test.fNumber === undefined || test.fNumber === '' ? undefined : Number(test.fNumber),
  })
}

/** What a welder test qualifies, or `{ error }` when the rules cannot evaluate it. */
export function qualifiedRangesOf(test: WelderTestVariables) {
  return evaluate({ code: test.code, check: 'welder-ranges', unit: test.unit, edition: test.edition, input: welderRangesInput(test) })
}
