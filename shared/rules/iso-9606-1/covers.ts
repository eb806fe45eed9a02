import { codeName } from '../caution'
import type { CoversInput, ProductionWeld, WeldSides, WelderTestInput } from '../inputs'
import type { CoverReason, CoversResult } from '../results'
import type { RuleContext } from '../types'
import { inRange, rangeText } from '../coverage'
import { coversEach } from '../covers-each'
import { productionLayers, productionPositions, testLayers } from '../layers'
import { categorical, reason } from '../variables'
import { fillerGroupsQualified, isoButtMax, isoProcess, processesCovered, welderRanges } from './welder-ranges'

const electrodeFamily = ['A', 'RA', 'RB', 'RC', 'RR', 'R']
const coredFamily = ['R', 'P', 'V', 'W', 'Y', 'Z']

/** 5.6 filler material type (from memory). */
function fillerTypeCovers(test: string, production: string): boolean {
  const t = test.toUpperCase()
  const p = production.toUpperCase()
  if (t === p) return true
  if (['S', 'M'].includes(t) && ['S', 'M'].includes(p)) return true
  if (t === 'B') return electrodeFamily.includes(p) || coredFamily.includes(p)
  if (electrodeFamily.includes(t)) return electrodeFamily.includes(p)
  if (coredFamily.includes(t)) return coredFamily.includes(p)
  return false
}

type Detail = { sides: WeldSides, backing: boolean }
const detailText = (d: Detail) => (d.sides === 'both' ? 'both sides (bs)' : d.backing ? 'single side with backing (ss mb)' : 'single side without backing (ss nb)')

function one(test: WelderTestInput, production: ProductionWeld, context: RuleContext): CoverReason[] {
  const ranges = welderRanges(test, context)
  const reasons: CoverReason[] = []
  const push = (r: CoverReason | null) => {
    if (r) reasons.push(r)
  }
  const positions = productionPositions(production).map(p => p.toUpperCase())
  if (production.code !== undefined) {
    const same = production.code === 'iso-9606-1'
    reasons.push(reason(same ? 'met' : 'not-met', 'code', 'ISO 9606-1, 1', same ? 'The joint is welded to ISO 9606-1.' : `The joint is welded to ${codeName(production.code)}; an ISO 9606-1 test does not qualify it.`, 'convention'))
  }
  const tLayers = testLayers(test)
  const named = productionLayers(production)
  if (named.length === 0) reasons.push(reason('not-recorded', 'process', 'ISO 9606-1, 5.2', `Production does not name its process: cannot tell, state it; the test was ${tLayers.map(l => l.process).join(' + ')}.`, 'partial', { record: 'production.process' }))
  const pLayers = named.length > 0 ? named : tLayers.length === 1 ? [{ ...production, process: tLayers[0]!.process, depositThickness: production.thickness }] : []
  const butt = production.weld === 'groove'
  pLayers.forEach((p, pi) => {
    const process = isoProcess(p.process)
    const ti = tLayers.findIndex(t => processesCovered(isoProcess(t.process)).includes(process))
    const t = tLayers[ti]
    if (!t) {
      reasons.push(reason('not-met', 'process', 'ISO 9606-1, 5.2', `Process ${process} is not covered by the ${tLayers.map(l => l.process).join(' + ')} test.`, 'partial', { process }))
      return
    }
    if (named.length > 0) reasons.push(reason('met', 'process', 'ISO 9606-1, 5.2', `Process ${process} is covered by the ${t.process} test.`, 'partial', { process }))
    const tf = test.processes ? `processes[${ti}].` : ''
    const pf = production.processes ? `processes[${pi}].` : ''
    const fix = (r: CoverReason | null) => (r && r.record ? { ...r, record: r.record.replace(/^test\./, `test.${tf}`).replace(/^production\./, `production.${pf}`) } : r)
    if (['131', '135', '138'].includes(isoProcess(t.process))) {
      push(fix(categorical({
        variable: 'transfer', clause: 'ISO 9606-1, 5.2', basis: 'partial', field: 'transfer', process, test: t.transfer, production: p.transfer,
        qualifies: (a, b) => a === 'short-circuit' || a === b, qualifiesAll: a => a === 'short-circuit', show: v => `${v} transfer`,
      })))
    }
    push(fix(categorical({
      variable: 'filler-group', clause: 'ISO 9606-1, 5.5', basis: 'memory', field: 'fNumber', process, test: t.fNumber, production: p.fNumber,
      qualifies: (a, b) => fillerGroupsQualified(a).includes(b), show: v => `FM${v}`,
    })))
    push(fix(categorical({
      variable: 'filler-type', clause: 'ISO 9606-1, 5.6', basis: 'memory', field: 'fillerType', process, test: t.fillerType, production: p.fillerType,
      qualifies: fillerTypeCovers, show: v => `filler type ${v}`,
    })))
    // Per-process deposit of a multi-process butt weld (Table 6, s of that process).
    if (butt && test.processes && p.depositThickness !== undefined) {
      if (t.depositThickness === undefined) reasons.push(reason('not-recorded', 'thickness', 'ISO 9606-1 Table 6', `The test's ${t.process} deposit was not recorded.`, 'partial', { process, record: `test.${tf}depositThickness` }))
      else {
        const max = isoButtMax(t.depositThickness, t.process)
        const ok = max === null || p.depositThickness <= max
        reasons.push(reason(ok ? 'met' : 'not-met', 'thickness', 'ISO 9606-1 Table 6', `${process} deposit ${p.depositThickness} mm: covered up to ${max === null ? 'no limit' : `${max} mm`} (s of that process ${t.depositThickness} mm).`, 'partial', { process }))
      }
    }
  })

  const sameType = butt === (test.weld === 'groove')
  reasons.push(reason(sameType ? 'met' : 'not-met', 'weld', 'ISO 9606-1, 5.4', sameType
    ? `A ${butt ? 'butt' : 'fillet'} test covers ${butt ? 'butt' : 'fillet'} welds.`
    : butt ? 'A fillet test does not cover butt welds.' : 'A butt test covers fillet welds only with a supplementary fillet test.', 'partial'))
  if (!sameType) return reasons
  const covered = butt ? ranges.positions.groove : ranges.positions.fillet
  const bad = positions.filter(p => !covered.includes(p))
  reasons.push(reason(bad.length ? 'not-met' : 'met', 'position', butt ? 'ISO 9606-1 Table 9' : 'ISO 9606-1 Table 10', `Position ${positions.join(', ')}: the test covers ${covered.join(', ')}.`, 'partial'))
  const total = production.processes ? production.processes.reduce<number | undefined>((a, l) => (a === undefined || l.depositThickness === undefined ? undefined : a + l.depositThickness), 0) : production.thickness
  if (total !== undefined) {
    if (ranges.thickness) {
      const ok = inRange(total, ranges.thickness)
      reasons.push(reason(ok ? 'met' : 'not-met', 'thickness', butt ? 'ISO 9606-1 Table 6' : 'ISO 9606-1 Table 7', `Thickness ${total} mm: covered ${rangeText(ranges.thickness, 'mm')}${test.processes ? ' (the combination: s1 + s2)' : ''}.`, 'partial'))
    }
    else {
      reasons.push(reason('not-recorded', 'thickness', butt ? 'ISO 9606-1 Table 6' : 'ISO 9606-1 Table 7', 'The test thickness was not recorded.', 'partial', { record: butt ? 'test.depositThickness' : 'test.couponThickness' }))
    }
  }
  else if (ranges.thickness) {
    reasons.push(reason('not-recorded', 'thickness', butt ? 'ISO 9606-1 Table 6' : 'ISO 9606-1 Table 7', `Production thickness not given: cannot tell, state it; the test covers ${rangeText(ranges.thickness, 'mm')}.`, 'partial', { record: 'production.thickness' }))
  }
  if (production.form === 'pipe') {
    if (production.outsideDiameter === undefined) reasons.push(reason('not-recorded', 'diameter', 'ISO 9606-1 Table 8', 'The production pipe D is not given.', 'verified', { record: 'production.outsideDiameter' }))
    else if (test.form === 'pipe') {
      if (ranges.diameter) {
        const ok = inRange(production.outsideDiameter, ranges.diameter)
        reasons.push(reason(ok ? 'met' : 'not-met', 'diameter', 'ISO 9606-1 Table 8', `Pipe D ${production.outsideDiameter} mm: covered ${rangeText(ranges.diameter, 'mm')}.`, 'verified'))
      }
      else reasons.push(reason('not-recorded', 'diameter', 'ISO 9606-1 Table 8', 'The test pipe D was not recorded.', 'verified', { record: 'test.outsideDiameter' }))
    }
    else {
      const ok = production.outsideDiameter > 500
      reasons.push(reason(ok ? 'met' : 'not-met', 'product', 'ISO 9606-1, 5.3', ok ? `A plate test covers pipe over 500 mm (D ${production.outsideDiameter} mm).` : `A plate test covers pipe of D ${production.outsideDiameter} mm only when it is rotated (over 75 mm, in PA, PB, PC or PD); that is not decided here.`, 'partial'))
    }
  }
  if (production.form === 'plate' && test.form === 'pipe') {
    if (test.outsideDiameter === undefined) reasons.push(reason('not-recorded', 'product', 'ISO 9606-1, 5.3', 'A pipe test covers plate only over 25 mm: the test pipe D was not recorded.', 'partial', { record: 'test.outsideDiameter' }))
    else {
      const ok = test.outsideDiameter > 25
      reasons.push(reason(ok ? 'met' : 'not-met', 'product', 'ISO 9606-1, 5.3', ok ? 'A pipe test over 25 mm covers plate.' : 'A pipe test of 25 mm or less does not cover plate.', 'partial'))
    }
  }
  if (butt) {
    const detail = (sides: WeldSides | undefined, backing: boolean | undefined): Detail | undefined =>
      sides === 'both' ? { sides, backing: true } : sides === 'single' && backing !== undefined ? { sides, backing } : undefined
    push(categorical({
      variable: 'details', clause: 'ISO 9606-1, 5.9', basis: 'partial', field: 'sides', test: detail(test.sides, test.backing), production: detail(production.sides, production.backing),
      qualifies: (a, b) => (a.sides === 'single' && !a.backing) || (b.sides === 'both' || b.backing), qualifiesAll: a => a.sides === 'single' && !a.backing,
      qualifiedByAll: () => false, show: detailText,
    }))
  }
  else {
    push(categorical({
      variable: 'layering', clause: 'ISO 9606-1, 5.9', basis: 'partial', field: 'layering', test: test.layering, production: production.layering,
      qualifies: (a, b) => a === 'multi' || b === 'single', qualifiesAll: a => a === 'multi', show: v => `${v}-layer`,
    }))
  }
  return reasons
}

/** Does an ISO 9606-1 welder test cover a production weld? Every clause 5 variable both sides state is compared. */
export function covers(input: CoversInput, context: RuleContext): CoversResult {
  return coversEach(input, (test, production) => one(test, production, context))
}
