import type { CoversInput, ProductionWeld, WelderTestInput } from '../inputs'
import type { CoverReason, CoversResult } from '../results'
import type { RuleContext } from '../types'
import { coversAny, finding, inRange, rangeText } from '../coverage'
import { productionPositions, testProcess } from '../layers'
import { refuse } from '../refusal'
import { formatLength, pick, toMicro } from '../units'
import { d11Tables } from './editions'
import { d11 } from './limits'
import { d11Letters } from './positions'
import { d11Process, welderRanges } from './welder-ranges'

function one(test: WelderTestInput, production: ProductionWeld, context: RuleContext): CoverReason[] {
  const u = context.unit
  const tables = d11Tables(context.edition)
  const ranges = welderRanges(test, context)
  const reasons: CoverReason[] = []
  const position = productionPositions(production)[0]!.toUpperCase().replace('OH', 'O')
  if (!['F', 'H', 'V', 'O'].includes(position)) refuse(`production.position: "${production.position}" is not F, H, V or OH`)
  if (production.form === 'pipe' && production.outsideDiameter === undefined) refuse('production.outsideDiameter: a pipe weld needs its outside diameter')
  const positionsClause = test.form === 'plate' ? tables.platePositions : tables.pipePositions

  if (production.process !== undefined) {
    const same = d11Process(production.process) === d11Process(testProcess(test))
    reasons.push(finding(same, 'welder essential variables (process)', same ? `Process ${test.process} was tested.` : `The test was ${test.process}; ${production.process} needs its own test.`, 'partial'))
  }
  if (production.weld === 'groove') {
    const isGroove = test.weld === 'groove'
    reasons.push(finding(isGroove, positionsClause, isGroove ? 'A groove test qualifies groove welds.' : 'A fillet test qualifies fillet welds only.', 'verified'))
    if (!isGroove) return reasons
    const ok = ranges.positions.groove.includes(position)
    reasons.push(finding(ok, positionsClause, `Groove ${position === 'O' ? 'OH' : position}: the test qualifies ${d11Letters(ranges.positions.groove)}.`, 'verified'))
    if (production.form === 'pipe' && production.outsideDiameter !== undefined) {
      if (test.form === 'plate') {
        const big = toMicro(production.outsideDiameter) >= pick(d11.od24, u)
        reasons.push(finding(big && production.backing === true, `${tables.platePositions} note b`,
          `A plate test covers pipe CJP welds only of ${formatLength(pick(d11.od24, u), u)} and over with backing or backgouging (pipe ${production.outsideDiameter} ${u}, ${production.backing ? 'with' : 'no'} backing or backgouging given).`, 'verified'))
      }
      else if (ranges.diameter) {
        reasons.push(finding(inRange(production.outsideDiameter, ranges.diameter), tables.pipeRanges, `Size ${production.outsideDiameter} ${u}: qualified ${rangeText(ranges.diameter, u)}.`, 'verified'))
      }
      else {
        refuse(`${tables.pipeRanges} note f: the minimum pipe size for this test is not carried, so coverage of a pipe diameter cannot be decided`)
      }
    }
  }
  else {
    const ok = ranges.positions.fillet.includes(position)
    reasons.push(finding(ok, positionsClause, `Fillet ${position === 'O' ? 'OH' : position}: the test qualifies ${d11Letters(ranges.positions.fillet)}.`, 'verified'))
  }
  if (production.thickness !== undefined && ranges.thickness && (production.weld === 'groove')) {
    reasons.push(finding(inRange(production.thickness, ranges.thickness), test.form === 'plate' ? tables.plateThickness : tables.pipeRanges,
      `Thickness ${production.thickness} ${u}: qualified ${rangeText(ranges.thickness, u)}.`, u === 'mm' ? 'memory' : 'verified'))
  }
  return reasons
}

/** Does an AWS D1.1 welder test (or set of tests) cover a production weld? */
export function covers(input: CoversInput, context: RuleContext): CoversResult {
  return coversAny(input, (test, production) => one(test, production, context))
}
