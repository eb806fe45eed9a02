import type { CodeId, Unit } from '../rules/types'
import { mustEvaluate } from './evaluate'

export interface BendRecord { type: string, largestIndication: number, atCorner?: boolean }

/** Guided-bend acceptance of a set of specimens (ASME IX QW-163; AWS D1.1 sum and corner rules). */
export function bendAcceptance(code: CodeId, unit: Unit, specimens: BendRecord[]) {
  return mustEvaluate<{ accepted: boolean, specimens: { accepted: boolean, reason: string }[] }>(code, 'bend', unit, undefined, {
    specimens: specimens.map(s => ({ type: s.type, indications: s.largestIndication > 0 ? [{ size: s.largestIndication, atCorner: s.atCorner ?? false }] : [] })),
  })
}
