import type { CoversInput, ProductionWeld, WelderTestInput } from '../inputs'
import type { CoverReason, CoversResult } from '../results'
import type { RuleContext } from '../types'
import { coversAny, finding, inRange, rangeText } from '../coverage'
import { productionPositions } from '../layers'
import { refuse } from '../refusal'
import { isoProcess, welderRanges } from './welder-ranges'

function one(test: WelderTestInput, production: ProductionWeld, context: RuleContext): CoverReason[] {
  const ranges = welderRanges(test, context)
  const reasons: CoverReason[] = []
  const position = productionPositions(production)[0]!.toUpperCase()
  if (production.form === 'pipe' && production.outsideDiameter === undefined) refuse('production.outsideDiameter: a pipe weld needs its outside diameter')
  if (production.process !== undefined) {
    const p = isoProcess(production.process)
    const ok = (ranges.processes ?? []).includes(p)
    reasons.push(finding(ok, 'ISO 9606-1 process (summary sheet)', ok ? `Process ${p} is covered by the ${test.process} test.` : `Process ${p} is not covered by the ${test.process} test.`, 'partial'))
  }
  const butt = production.weld === 'groove'
  const sameType = butt === (test.weld === 'groove')
  reasons.push(finding(sameType, 'ISO 9606-1 butt and fillet welds (summary sheet)', sameType
    ? `A ${butt ? 'butt' : 'fillet'} test covers ${butt ? 'butt' : 'fillet'} welds.`
    : butt ? 'A fillet test does not cover butt welds.' : 'A butt test covers fillet welds only with a supplementary fillet test.', 'partial'))
  if (!sameType) return reasons
  const positions = butt ? ranges.positions.groove : ranges.positions.fillet
  reasons.push(finding(positions.includes(position), butt ? 'ISO 9606-1 Table 9' : 'ISO 9606-1 Table 10', `Position ${position}: the test covers ${positions.join(', ')}.`, 'partial'))
  if (production.thickness !== undefined && ranges.thickness) {
    reasons.push(finding(inRange(production.thickness, ranges.thickness), butt ? 'ISO 9606-1 Table 6' : 'ISO 9606-1 Table 7', `Thickness ${production.thickness} mm: covered ${rangeText(ranges.thickness, 'mm')}.`, 'partial'))
  }
  if (production.form === 'pipe' && production.outsideDiameter !== undefined) {
    if (test.form === 'pipe' && ranges.diameter) {
      reasons.push(finding(inRange(production.outsideDiameter, ranges.diameter), 'ISO 9606-1 Table 8', `Pipe D ${production.outsideDiameter} mm: covered ${rangeText(ranges.diameter, 'mm')}.`, 'verified'))
    }
    else {
      const ok = production.outsideDiameter > 500
      reasons.push(finding(ok, 'ISO 9606-1 5.3', ok ? `A plate test covers pipe over 500 mm (D ${production.outsideDiameter} mm).` : `A plate test covers pipe of D ${production.outsideDiameter} mm only when it is rotated (over 75 mm, in PA, PB, PC or PD); that is not decided here.`, 'partial'))
    }
  }
  if (production.form === 'plate' && test.form === 'pipe') {
    const ok = (test.outsideDiameter ?? 0) > 25
    reasons.push(finding(ok, 'ISO 9606-1 5.3', ok ? 'A pipe test over 25 mm covers plate.' : 'A pipe test of 25 mm or less does not cover plate.', 'partial'))
  }
  return reasons
}

/** Does an ISO 9606-1 welder test cover a production weld? */
export function covers(input: CoversInput, context: RuleContext): CoversResult {
  return coversAny(input, (test, production) => one(test, production, context))
}
