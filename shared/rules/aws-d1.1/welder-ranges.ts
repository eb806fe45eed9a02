import type { WelderTestInput } from '../inputs'
import type { BendSpecimenCount, Undetermined, WelderRangesResult } from '../results'
import type { Basis, Range, Reason, RuleContext } from '../types'
import { testProcess } from '../layers'
import { refuse } from '../refusal'
import { formatLength, formatRange, fromMicro, pick, toMicro } from '../units'
import { d11Tables } from './editions'
import { d11 } from './limits'
import { d11Letters, d11Positions } from './positions'

export const d11Processes = ['SMAW', 'SAW', 'GMAW', 'FCAW', 'GTAW', 'ESW', 'EGW'] as const

export function d11Process(process: string): string {
  const found = d11Processes.find(p => p === process.toUpperCase())
  if (!found) refuse(`process: "${process}" is not a process AWS D1.1 qualifies welders for (${d11Processes.join(', ')})`)
  return found
}

const out = (m: number | null) => (m === null ? null : fromMicro(m))
const range = (min: number | null, max: number | null): Range => ({ min: out(min), max: out(max) })

/** What an AWS D1.1 welder test qualifies: plate Tables 6.10/6.11 (4.10/4.11 in 2015), pipe Tables 10.12/10.13. */
export function welderRanges(input: WelderTestInput, context: RuleContext): WelderRangesResult {
  const u = context.unit
  const f = (m: number) => formatLength(m, u)
  const tables = d11Tables(context.edition)
  d11Process(testProcess(input))
  const si: Basis = u === 'mm' ? 'memory' : 'verified'
  const reasons: Reason[] = []
  const pos = d11Positions(input.form, input.weld, input.testPositions)
  const result: WelderRangesResult = { positions: { groove: pos.groove, fillet: pos.fillet }, reasons }
  const positionsClause = input.form === 'plate' ? tables.platePositions : tables.pipePositions
  if (input.weld === 'groove') {
    reasons.push({ clause: positionsClause, text: `Groove (CJP and PJP): ${d11Letters(pos.groove)}; fillet: ${d11Letters(pos.fillet)}. A CJP groove test also qualifies PJP and fillet welds.`, basis: pos.fromMemory ? 'memory' : 'verified' })
  }
  else {
    reasons.push({ clause: positionsClause, text: `Fillet: ${d11Letters(pos.fillet)}. A fillet test qualifies no groove welds.`, basis: pos.fromMemory ? 'memory' : 'verified' })
    if (input.form === 'plate') {
      // Fillet weld test plate (Table 4.11 in 2015, 6.11 from 2020), from memory: 1/8 in (3 mm) and over, unlimited.
      result.thickness = range(pick(d11.t1_8, u), null)
      reasons.push({ clause: tables.plateThickness, text: `A fillet weld test on plate qualifies fillet welds on base metal of ${formatRange(pick(d11.t1_8, u), null, u)}.`, basis: 'memory' })
    }
    else {
      reasons.push({ clause: tables.pipeRanges, text: 'The thickness range of a pipe fillet test is not carried by this module: read it in the table.', basis: 'convention' })
    }
  }

  const undetermined: Undetermined[] = []
  result.undetermined = undetermined
  if (input.weld === 'groove' && input.form === 'plate' && input.couponThickness === undefined) {
    undetermined.push({ field: 'couponThickness', needed: `${tables.plateThickness}: the plate thickness gives the thickness range and the bend specimens` })
    result.positions.groovePipe = pos.groove
    result.positions.groovePipeMinDiameter = fromMicro(pick(d11.od24, u))
  }
  if (input.weld === 'groove' && input.form === 'plate' && input.couponThickness !== undefined) {
    const T = toMicro(input.couponThickness)
    const t38 = pick(d11.t3_8, u)
    const min = pick(d11.t1_8, u)
    if (T < t38) refuse(`couponThickness: ${tables.plateThickness} has no plate test under ${f(t38)}; sheet of 3/16 in and less is qualified under AWS D1.3`)
    const one = pick(d11.t1, u)
    const band: { max: number | null, text: string, basis: Basis } = T === t38
      ? { max: pick(d11.t3_4, u), text: `A ${f(t38)} test plate`, basis: si }
      : T < one
        ? { max: 2 * T, text: `A plate over ${f(t38)} and under ${f(one)}`, basis: 'memory' }
        : { max: null, text: `A plate of ${f(one)} or more`, basis: si }
    const { max, text, basis } = band
    result.thickness = range(min, max)
    reasons.push({ clause: tables.plateThickness, text: `${text} qualifies ${formatRange(min, max, u)}.`, basis })
    const bends: BendSpecimenCount = T === t38 ? { face: 1, root: 1, side: 0, total: 2 } : { face: 0, root: 0, side: 2, total: 2 }
    result.bendSpecimens = bends
    reasons.push({ clause: tables.plateThickness, text: T === t38 ? 'Bends: 1 face and 1 root (2 side bends may replace them).' : 'Bends: 2 side.', basis: 'memory' })
    // Footnote b: a plate test qualifies pipe CJP butt joints only at 24 in (600 mm) and over, with backing, backgouging or both.
    result.positions.groovePipe = pos.groove
    result.positions.groovePipeMinDiameter = fromMicro(pick(d11.od24, u))
    reasons.push({ clause: `${tables.platePositions} note b`, text: `A plate test qualifies CJP groove welds on pipe only of ${f(pick(d11.od24, u))} diameter and over, with backing, backgouging or both.`, basis: 'verified' })
  }

  if (input.weld === 'groove' && input.form === 'pipe') {
    if (input.outsideDiameter === undefined) undetermined.push({ field: 'outsideDiameter', needed: `${tables.pipeRanges}: the test pipe size gives the sizes and walls qualified and the bend specimens` })
    if (input.couponThickness === undefined) undetermined.push({ field: 'couponThickness', needed: `${tables.pipeRanges}: the test pipe wall gives the walls qualified and the bend specimens` })
    result.positions.groovePipe = pos.groove
  }
  if (input.weld === 'groove' && input.form === 'pipe' && input.outsideDiameter !== undefined && input.couponThickness !== undefined) {
    const od = toMicro(input.outsideDiameter)
    const wall = toMicro(input.couponThickness)
    const small = od <= pick(d11.od4, u)
    const thinWall = wall <= pick(d11.t3_8, u)
    if (small) {
      result.diameter = range(pick(d11.od3_4, u), pick(d11.od4, u))
      reasons.push({ clause: tables.pipeRanges, text: `Test pipe of ${f(pick(d11.od4, u))} or less: sizes ${formatRange(pick(d11.od3_4, u), pick(d11.od4, u), u)}.`, basis: si })
    }
    else {
      // Over 4 in: unlimited size (read). The minimum of note f was not legible: Rootface starts at the test size itself,
      // the least any minimum can be, so a smaller production pipe is never called covered.
      result.diameter = range(od, null)
      reasons.push({ clause: `${tables.pipeRanges} note f`, text: `Test pipe over ${f(pick(d11.od4, u))}: sizes up to unlimited (read). The smallest size of note f is not carried: Rootface qualifies from the test size, ${f(od)}, up; check note f by hand for smaller pipe.`, basis: 'partial' })
    }
    const wallRange = small || thinWall ? range(pick(d11.t1_8, u), pick(d11.t3_4, u)) : range(pick(d11.t3_16, u), null)
    result.thickness = wallRange
    reasons.push({ clause: tables.pipeRanges, text: `Wall qualified: ${formatRange(toMicro(wallRange.min ?? 0), wallRange.max === null ? null : toMicro(wallRange.max), u)}.`, basis: si })
    const fixed = input.testPositions.some(p => ['5G', '6G', '6GR'].includes(p.toUpperCase()))
    const n = fixed ? 2 : 1
    result.bendSpecimens = small || thinWall ? { face: n, root: n, side: 0, total: 2 * n } : { face: 0, root: 0, side: 2 * n, total: 2 * n }
    reasons.push({ clause: tables.pipeRanges, text: `Bends (${fixed ? '5G/6G/6GR' : '1G/2G'}): ${small || thinWall ? `${n} face and ${n} root` : `${2 * n} side`}.`, basis: 'verified' })
    result.positions.groovePipe = pos.groove
  }

  if (input.weld === 'fillet' && input.form === 'pipe' && input.outsideDiameter === undefined) {
    undetermined.push({ field: 'outsideDiameter', needed: `${tables.pipeRanges}: the size of a pipe fillet test` })
  }
  if (undetermined.length === 0) delete result.undetermined
  return result
}
