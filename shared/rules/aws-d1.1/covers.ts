import { codeName } from '../caution'
import type { CoversInput, ProductionWeld, WelderTestInput } from '../inputs'
import type { CoverReason, CoversResult } from '../results'
import type { RuleContext } from '../types'
import { inRange, rangeText } from '../coverage'
import { coversEach } from '../covers-each'
import { productionLayers, productionPositions, testLayers } from '../layers'
import { refuse } from '../refusal'
import { formatLength, pick, toMicro } from '../units'
import { categorical, layerBacking, reason, show, weldsVertical } from '../variables'
import { d11Tables } from './editions'
import { d11 } from './limits'
import { d11Letters } from './positions'
import { d11Process, welderRanges } from './welder-ranges'

const group = (f: number) => Array.from({ length: f }, (_, i) => i + 1)

function one(test: WelderTestInput, production: ProductionWeld, context: RuleContext): CoverReason[] {
  const u = context.unit
  const tables = d11Tables(context.edition)
  const ranges = welderRanges(test, context)
  const reasons: CoverReason[] = []
  const letters = productionPositions(production).map((p) => {
    const letter = p.toUpperCase().replace('OH', 'O')
    if (!['F', 'H', 'V', 'O'].includes(letter)) refuse(`production.position: "${p}" is not F, H, V or OH`)
    return letter
  })
  const shown = letters.map(p => (p === 'O' ? 'OH' : p)).join(', ')
  const positionsClause = test.form === 'plate' ? tables.platePositions : tables.pipePositions
  const push = (r: CoverReason | null) => {
    if (r) reasons.push(r)
  }

  if (production.code !== undefined) {
    const same = production.code === 'aws-d1.1'
    reasons.push(reason(same ? 'met' : 'not-met', 'code', tables.essentials, same ? 'The joint is welded to AWS D1.1.' : `The joint is welded to ${codeName(production.code)}; an AWS D1.1 test does not qualify it.`, 'convention'))
  }

  // Process (GMAW-S is a process of its own for welders), then the variables of that process.
  const tLayers = testLayers(test)
  const named = productionLayers(production)
  if (named.length === 0) {
    reasons.push(reason('not-recorded', 'process', tables.essentials, `Production does not name its process: cannot tell, state it; the test was ${tLayers.map(l => l.process).join(' + ')}.`, 'memory', { record: 'production.process' }))
  }
  const pLayers = named.length > 0 ? named : tLayers.length === 1 ? [{ ...production, process: tLayers[0]!.process, depositThickness: production.thickness }] : []
  pLayers.forEach((p, pi) => {
    const process = d11Process(p.process)
    const ti = tLayers.findIndex(t => d11Process(t.process) === process)
    const t = tLayers[ti]
    if (!t) {
      reasons.push(reason('not-met', 'process', tables.essentials, `The test was ${tLayers.map(l => l.process).join(' + ')}; ${process} needs its own test.`, 'memory', { process }))
      return
    }
    if (named.length > 0) reasons.push(reason('met', 'process', tables.essentials, `${process} was tested.`, 'memory', { process }))
    const tf = test.processes ? `processes[${ti}].` : ''
    const pf = production.processes ? `processes[${pi}].` : ''
    const fix = (r: CoverReason | null) => (r && r.record ? { ...r, record: r.record.replace(/^test\./, `test.${tf}`).replace(/^production\./, `production.${pf}`) } : r)
    if (process === 'GMAW') {
      push(fix(categorical({
        variable: 'transfer', clause: `${tables.essentials} (GMAW-S)`, basis: 'memory', field: 'transfer', process, test: t.transfer, production: p.transfer,
        qualifies: (a, b) => (a === 'short-circuit') === (b === 'short-circuit'), show: v => `${v} transfer`,
      })))
    }
    if (process === 'SMAW') {
      push(fix(categorical({
        variable: 'f-number', clause: tables.electrodeGroups, basis: 'memory', field: 'fNumber', process, test: t.fNumber, production: p.fNumber,
        qualifies: (a, b) => a <= 4 && group(a).includes(b), show: v => `electrode group F${v}`,
      })))
    }
    if (weldsVertical(letters)) {
      push(fix(categorical({
        variable: 'progression', clause: tables.essentials, basis: 'memory', field: 'progression', process, test: t.progression, production: p.progression,
        qualifies: (a, b) => a === b, show: v => `${v} vertical`,
      })))
    }
    if (production.weld === 'groove') {
      push(fix(categorical({
        variable: 'backing', clause: tables.essentials, basis: 'memory', field: 'backing', process, test: layerBacking(test.backing, ti), production: layerBacking(production.backing, pi),
        qualifies: (a, b) => !a || b, qualifiesAll: a => !a, qualifiedByAll: b => b, show: show.bool('with backing', 'without backing'),
      })))
    }
  })

  if (production.weld === 'groove') {
    const isGroove = test.weld === 'groove'
    reasons.push(reason(isGroove ? 'met' : 'not-met', 'weld', positionsClause, isGroove ? 'A groove test qualifies groove welds.' : 'A fillet test qualifies fillet welds only.', 'verified'))
    if (!isGroove) return reasons
    const bad = letters.filter(p => !ranges.positions.groove.includes(p))
    reasons.push(reason(bad.length ? 'not-met' : 'met', 'position', positionsClause, `Groove ${shown}: the test qualifies ${d11Letters(ranges.positions.groove)}.`, 'verified'))
    if (production.form === 'pipe') {
      if (production.outsideDiameter === undefined) {
        reasons.push(reason('not-recorded', 'diameter', tables.pipeRanges, 'The production pipe size is not given.', 'verified', { record: 'production.outsideDiameter' }))
      }
      else if (test.form === 'plate') {
        const big = toMicro(production.outsideDiameter) >= pick(d11.od24, u)
        const text = `A plate test covers pipe CJP welds only of ${formatLength(pick(d11.od24, u), u)} and over with backing or backgouging (pipe ${production.outsideDiameter} ${u}, ${production.backing === undefined ? 'backing not stated' : production.backing ? 'with backing or backgouging' : 'no backing or backgouging'}).`
        if (!big || production.backing === false) reasons.push(reason('not-met', 'diameter', `${tables.platePositions} note b`, text, 'verified'))
        else if (production.backing === undefined) reasons.push(reason('not-recorded', 'diameter', `${tables.platePositions} note b`, text, 'verified', { record: 'production.backing' }))
        else reasons.push(reason('met', 'diameter', `${tables.platePositions} note b`, text, 'verified'))
      }
      else if (ranges.diameter) {
        const ok = inRange(production.outsideDiameter, ranges.diameter)
        reasons.push(reason(ok ? 'met' : 'not-met', 'diameter', tables.pipeRanges, `Size ${production.outsideDiameter} ${u}: qualified ${rangeText(ranges.diameter, u)}.`, 'verified'))
      }
      else if (test.outsideDiameter === undefined) {
        reasons.push(reason('not-recorded', 'diameter', tables.pipeRanges, 'The test pipe size was not recorded.', 'verified', { record: 'test.outsideDiameter' }))
      }
      else {
        reasons.push(reason('not-checked', 'diameter', `${tables.pipeRanges} note f`, 'The minimum pipe size this test qualifies (note f) is not carried: check by hand.', 'partial'))
      }
    }
    if (production.thickness !== undefined) {
      if (ranges.thickness) {
        const ok = inRange(production.thickness, ranges.thickness)
        reasons.push(reason(ok ? 'met' : 'not-met', 'thickness', test.form === 'plate' ? tables.plateThickness : tables.pipeRanges, `Thickness ${production.thickness} ${u}: qualified ${rangeText(ranges.thickness, u)}.`, u === 'mm' ? 'memory' : 'verified'))
      }
      else {
        reasons.push(reason('not-recorded', 'thickness', test.form === 'plate' ? tables.plateThickness : tables.pipeRanges, 'The test thickness was not recorded.', 'verified', { record: 'test.couponThickness' }))
      }
    }
    else if (ranges.thickness && ranges.thickness.max !== null) {
      reasons.push(reason('not-recorded', 'thickness', test.form === 'plate' ? tables.plateThickness : tables.pipeRanges, `Production thickness not given: cannot tell, state it; the test qualifies ${rangeText(ranges.thickness, u)}.`, 'verified', { record: 'production.thickness' }))
    }
  }
  else {
    const bad = letters.filter(p => !ranges.positions.fillet.includes(p))
    reasons.push(reason(bad.length ? 'not-met' : 'met', 'position', positionsClause, `Fillet ${shown}: the test qualifies ${d11Letters(ranges.positions.fillet)}.`, 'verified'))
  }
  return reasons
}

/** Does an AWS D1.1 welder test (or set of tests) cover a production weld? */
export function covers(input: CoversInput, context: RuleContext): CoversResult {
  return coversEach(input, (test, production) => one(test, production, context))
}
