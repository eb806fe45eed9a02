import type { SpecimenSetInput } from '../inputs'
import type { SpecimenCountSet, SpecimenSetResult } from '../results'
import type { Reason, RuleContext } from '../types'
import { testLayers } from '../layers'
import { countSpecimens, matchSpecimens, specimensUndetermined } from '../specimens'
import { formatLength, pick, toMicro } from '../units'
import { asme } from './limits'
import { qw4619 } from './positions'
import { welderBends } from './welder-deposit'

/**
 * Welder test specimens. Groove coupons: QW-452.1(a) by total weld metal thickness (read):
 * under 3/8 in face + root; 3/8 to under 3/4 in side bends, or face and root in equal numbers;
 * 3/4 in and over side bends; 2 in all, 4 for pipe in 5G or 6G, 6 for 2G + 5G on one coupon.
 * Fillet coupons: QW-452.5, 1 macro and 1 fracture from 3/16 in, 1 macro under it (counts read).
 */
export function specimens(input: SpecimenSetInput, context: RuleContext): SpecimenSetResult {
  const u = context.unit
  const f = (m: number) => formatLength(m, u)
  const test = input.test
  qw4619(test.form, test.weld, test.testPositions)
  const reasons: Reason[] = []
  if (test.weld === 'fillet') {
    if (test.couponThickness === undefined) {
      return specimensUndetermined([{ field: 'test.couponThickness', needed: 'QW-452.5: the fillet coupon thickness chooses the tests (macro and fracture, or macro)' }], reasons, countSpecimens(input.specimens))
    }
    const thick = toMicro(test.couponThickness) >= pick(asme.t3_16, u)
    reasons.push({ clause: 'QW-452.5', text: `Fillet test coupon of ${f(toMicro(test.couponThickness))}: ${thick ? '1 macro (QW-184) and 1 fracture (QW-182)' : '1 macro (QW-184)'}.`, basis: 'partial' })
    return matchSpecimens([thick ? { macro: 1, fracture: 1 } : { macro: 1 }], input.specimens, reasons)
  }
  const layers = testLayers(test)
  const sum = layers.every(l => l.depositThickness !== undefined) ? layers.reduce((a, l) => a + (l.depositThickness ?? 0), 0) : undefined
  const t = test.processes ? (sum ?? test.couponThickness) : test.depositThickness ?? test.couponThickness
  if (t === undefined) {
    return specimensUndetermined([{ field: 'test.depositThickness', needed: 'QW-452.1(a): the total weld metal thickness chooses face and root or side bends' }], reasons, countSpecimens(input.specimens))
  }
  const bends = welderBends(toMicro(t), test.testPositions, test.form, u)
  reasons.push(...bends.reasons)
  const n = bends.count.total
  const micro = toMicro(t)
  const allowed: SpecimenCountSet[] = micro < pick(asme.t3_8, u)
    ? [{ face: n / 2, root: n / 2 }]
    : micro < pick(asme.t3_4, u)
      ? [{ side: n }, { face: n / 2, root: n / 2 }]
      : [{ side: n }]
  return matchSpecimens(allowed, input.specimens, reasons)
}
