import { codeName } from '../caution'
import type { CoversInput, FillerForm, ProcessVariables, ProductionWeld, WelderTestInput } from '../inputs'
import type { CoverReason, CoversResult } from '../results'
import type { RuleContext } from '../types'
import { inRange, rangeText } from '../coverage'
import { productionLayers, productionPositions, strip, testLayers } from '../layers'
import { refuse } from '../refusal'
import { formatLength, fromMicro, pick, toMicro } from '../units'
import { categorical, layerBacking, reason, show, weldsVertical } from '../variables'
import { coversEach } from '../covers-each'
import { qw4231 } from './base-metals'
import { diameterBand } from './diameter'
import { qw433 } from './f-numbers'
import { asme } from './limits'
import { describeLetters, qw4619, type Letter } from './positions'
import { asmeProcess, isShortCircuit } from './processes'
import { listsVariable } from './variables'
import { welderDeposit } from './welder-deposit'

const formFamily = (f: FillerForm) => (f === 'flux-cored' ? 'flux-cored' : f === 'powder' ? 'powder' : 'solid or metal-cored')
const yesNo = (what: string) => show.bool(`with ${what}`, `without ${what}`)

/** Positions: every production position in the QW-461.9 column of the test (column A or B by OD for groove welds). */
function positionFindings(test: WelderTestInput, production: ProductionWeld, letters: Letter[], context: RuleContext): CoverReason[] {
  const u = context.unit
  const f = (m: number) => formatLength(m, u)
  const pos = qw4619(test.form, test.weld, test.testPositions)
  if (production.weld === 'fillet') {
    const bad = letters.filter(p => !pos.fillet.includes(p))
    return [reason(bad.length ? 'not-met' : 'met', 'position', 'QW-461.9', `Fillet ${letters.join(', ')}: the test qualifies ${describeLetters(pos.fillet)}${bad.length ? `; not ${bad.join(', ')}` : ''}.`, pos.fromMemory ? 'memory' : 'verified')]
  }
  const od24 = pick(asme.od24, u)
  const od = production.outsideDiameter === undefined ? undefined : toMicro(production.outsideDiameter)
  if (production.form === 'pipe' && od === undefined) {
    // Column B (pipe of 24 in OD or less) is never wider than column A: a position in B is qualified whatever the OD.
    const bad = letters.filter(p => !pos.groovePipe.includes(p))
    const unknown = bad.filter(p => pos.groove.includes(p))
    const no = bad.filter(p => !pos.groove.includes(p))
    if (no.length) return [reason('not-met', 'position', 'QW-461.9', `Groove ${no.join(', ')} on pipe: the test qualifies ${describeLetters(pos.groove)} at most.`, 'verified')]
    if (unknown.length) return [reason('not-recorded', 'position', 'QW-461.9', `Groove ${unknown.join(', ')} on pipe is qualified only over ${f(od24)} OD (column A); the pipe OD is not given.`, 'verified', { record: 'production.outsideDiameter' })]
    return [reason('met', 'position', 'QW-461.9', `Groove ${letters.join(', ')} on pipe of any OD: the test qualifies ${describeLetters(pos.groovePipe)}.`, 'verified')]
  }
  const over24 = production.form === 'plate' || (od !== undefined && od > od24)
  const column = over24 ? pos.groove : pos.groovePipe
  const where = over24 ? (production.form === 'plate' ? 'plate' : `pipe over ${f(od24)} OD`) : `pipe of ${f(od24)} OD or less`
  const bad = letters.filter(p => !column.includes(p))
  return [reason(bad.length ? 'not-met' : 'met', 'position', 'QW-461.9', `Groove ${letters.join(', ')} on ${where}: the test qualifies ${describeLetters(column)}${bad.length ? `; not ${bad.join(', ')}` : ''}.`, 'verified')]
}

/** Diameter (QW-403.16): QW-452.3 for grooves, QW-452.4 for fillet tests, plate tests 2-7/8 in and over (†). */
function diameterFinding(test: WelderTestInput, production: ProductionWeld, context: RuleContext): CoverReason | null {
  const u = context.unit
  if (production.form !== 'pipe') return null
  if (production.weld === 'fillet' && test.weld === 'groove') return reason('met', 'diameter', 'QW-452.6', 'A groove test qualifies fillet welds of all sizes, thicknesses and diameters.', 'verified')
  if (production.outsideDiameter === undefined) return reason('not-recorded', 'diameter', 'QW-403.16', 'The pipe OD is not given.', 'verified', { record: 'production.outsideDiameter' })
  const two78 = pick(asme.od2_7_8, u)
  let min: number
  let clause: string
  if (test.form === 'plate') {
    min = two78
    clause = 'QW-461.9 †'
  }
  else {
    if (test.outsideDiameter === undefined) return reason('not-recorded', 'diameter', test.weld === 'groove' ? 'QW-452.3' : 'QW-452.4', 'The test pipe OD was not recorded.', 'verified', { record: 'test.outsideDiameter' })
    min = diameterBand(toMicro(test.outsideDiameter), u).min
    clause = test.weld === 'groove' ? 'QW-452.3' : 'QW-452.4'
  }
  const range = { min: fromMicro(min), max: null }
  const ok = inRange(production.outsideDiameter, range)
  return reason(ok ? 'met' : 'not-met', 'diameter', clause, `OD ${production.outsideDiameter} ${u}: qualified ${rangeText(range, u)}.`, 'verified')
}

/** The variables of one production process against one test layer of the same process. */
function layerFindings(pair: { t: ProcessVariables, p: ProcessVariables, ti: number, pi: number }, test: WelderTestInput, production: ProductionWeld, letters: Letter[], context: RuleContext): CoverReason[] {
  const u = context.unit
  const f = (m: number) => formatLength(m, u)
  const { t, p } = pair
  const process = asmeProcess(t.process)
  const reasons: CoverReason[] = []
  const tag = { process }
  const push = (r: CoverReason | null) => {
    if (r) reasons.push(r)
  }
  const testSingle = test.processes === undefined
  const prodSingle = production.processes === undefined
  const tf = testSingle ? '' : `processes[${pair.ti}].`
  const pf = prodSingle ? '' : `processes[${pair.pi}].`
  const fix = (r: CoverReason | null) => (r && r.record ? { ...r, record: r.record.replace(/^test\./, `test.${tf}`).replace(/^production\./, `production.${pf}`) } : r)
  const groove = production.weld === 'groove'
  const testBacking = layerBacking(test.backing, pair.ti)
  const prodBacking = layerBacking(production.backing, pair.pi)

  if (listsVariable(process, 'transfer')) {
    push(fix(categorical({
      variable: 'transfer', clause: 'QW-409.2', basis: 'memory', field: 'transfer', process, test: t.transfer, production: p.transfer,
      qualifies: (a, b) => (a === 'short-circuit') === (b === 'short-circuit'), show: v => `${v} transfer`,
    })))
  }
  if (p.fNumber !== undefined || t.fNumber !== undefined) {
    push(fix(categorical({
      variable: 'f-number', clause: 'QW-404.15, QW-433', basis: 'memory', field: 'fNumber', process, test: t.fNumber, production: p.fNumber,
      qualifies: (a, b) => qw433(a, false, context.edition).numbers.includes(b), show: v => `F-No. ${v}`,
    })))
  }
  if (groove && listsVariable(process, 'deposit')) {
    const given = t.depositThickness ?? (testSingle ? test.couponThickness : undefined)
    const produced = p.depositThickness
    if (given === undefined) {
      if (produced !== undefined) reasons.push(reason('not-recorded', 'deposit', 'QW-452.1(b)', `Production deposit ${produced} ${u} with ${process}: the test's ${process} deposit was not recorded.`, 'verified', { ...tag, record: `test.${tf}depositThickness` }))
      else reasons.push(reason('not-recorded', 'deposit', 'QW-452.1(b)', `Neither the test's nor the production's ${process} deposit is given: cannot tell, record the test's deposit.`, 'verified', { ...tag, record: `test.${tf}depositThickness` }))
    }
    else {
      const layers = t.layers ?? (testSingle ? test.layers : undefined)
      const short = isShortCircuit(process, t.transfer)
      const max = welderDeposit(toMicro(given), layers, short, u).max
      const clause = short && toMicro(given) < pick(asme.t1_2, u) ? 'QW-404.32' : 'QW-404.30, QW-452.1(b)'
      const limit = max === null ? 'the maximum to be welded' : f(max)
      if (produced === undefined) {
        if (max === null) reasons.push(reason('met', 'deposit', clause, `The ${process} deposit qualifies the maximum to be welded.`, 'verified', tag))
        else reasons.push(reason('not-recorded', 'deposit', clause, `The test qualifies a ${process} deposit up to ${limit}; the production deposit is not given: cannot tell, state it.`, 'verified', { ...tag, record: prodSingle ? 'production.thickness' : `production.${pf}depositThickness` }))
      }
      else {
        const ok = max === null || toMicro(produced) <= max
        reasons.push(reason(ok ? 'met' : 'not-met', 'deposit', clause, `${process} deposit ${produced} ${u}: qualified up to ${limit}.`, 'verified', tag))
      }
    }
  }
  if (groove && listsVariable(process, 'backing')) {
    push(fix(categorical({
      variable: 'backing', clause: 'QW-402.4', basis: 'memory', field: 'backing', process, test: testBacking, production: prodBacking,
      qualifies: (a, b) => !a || b, qualifiesAll: a => !a, qualifiedByAll: b => b, show: yesNo('backing'),
    })))
  }
  if (groove && listsVariable(process, 'backing-added')) {
    push(fix(categorical({
      variable: 'backing-added', clause: 'QW-402.7', basis: 'memory', field: 'backing', process, test: testBacking, production: prodBacking,
      qualifies: (a, b) => a || !b, qualifiesAll: a => a, qualifiedByAll: b => !b, show: yesNo('backing'),
    })))
  }
  if (listsVariable(process, 'progression') && weldsVertical(letters)) {
    push(fix(categorical({
      variable: 'progression', clause: 'QW-405.3', basis: 'memory', field: 'progression', process, test: t.progression, production: p.progression,
      qualifies: (a, b) => a === b, show: v => `${v} vertical`,
    })))
  }
  if (listsVariable(process, 'filler-added')) {
    push(fix(categorical({
      variable: 'filler-added', clause: 'QW-404.14', basis: 'memory', field: 'fillerAdded', process, test: t.fillerAdded, production: p.fillerAdded,
      qualifies: (a, b) => a === b, show: yesNo('filler metal'),
    })))
  }
  // QW-404.22 and QW-408.8 matter in single-welded groove welds without backing (open root).
  const openRoot = groove && prodBacking !== true
  if (listsVariable(process, 'consumable-insert') && openRoot) {
    push(fix(categorical({
      variable: 'consumable-insert', clause: 'QW-404.22', basis: 'memory', field: 'consumableInsert', process, test: t.consumableInsert, production: p.consumableInsert,
      qualifies: (a, b) => a === b, show: yesNo('a consumable insert'),
    })))
  }
  if (listsVariable(process, 'filler-form')) {
    push(fix(categorical({
      variable: 'filler-form', clause: 'QW-404.23', basis: 'memory', field: 'fillerForm', process, test: t.fillerForm, production: p.fillerForm,
      qualifies: (a, b) => formFamily(a) === formFamily(b), show: v => `${v} filler`,
    })))
  }
  if (listsVariable(process, 'backing-gas') && openRoot) {
    push(fix(categorical({
      variable: 'backing-gas', clause: 'QW-408.8', basis: 'memory', field: 'backingGas', process, test: t.backingGas, production: p.backingGas,
      qualifies: (a, b) => !a || b, qualifiesAll: a => !a, qualifiedByAll: b => b, show: yesNo('inert backing gas'),
    })))
  }
  if (listsVariable(process, 'current')) {
    push(fix(categorical({
      variable: 'current', clause: 'QW-409.4', basis: 'memory', field: 'current', process, test: t.current, production: p.current,
      qualifies: (a, b) => a === b, show: v => v,
    })))
  }
  return reasons
}

/** A production weld that names no process, as a layer of its own variables. */
function stripProduction(production: ProductionWeld): Omit<ProcessVariables, 'process'> {
  const { transfer, fNumber, progression, fillerAdded, consumableInsert, fillerForm, backingGas, current, fillerType } = production
  return strip({ transfer, depositThickness: production.thickness, fNumber, progression, fillerAdded, consumableInsert, fillerForm, backingGas, current, fillerType })
}

function one(test: WelderTestInput, production: ProductionWeld, context: RuleContext): CoverReason[] {
  const u = context.unit
  const reasons: CoverReason[] = []
  const letters = productionPositions(production).map((p) => {
    const letter = p.toUpperCase()
    if (!['F', 'H', 'V', 'O'].includes(letter)) refuse(`production.position: "${p}" is not F, H, V or O (QW-461.1, QW-461.2)`)
    return letter as Letter
  })
  const tLayers = testLayers(test)
  tLayers.forEach(l => asmeProcess(l.process))
  qw4619(test.form, test.weld, test.testPositions)

  if (production.code !== undefined) {
    const same = production.code === 'asme-ix'
    reasons.push(reason(same ? 'met' : 'not-met', 'code', 'QW-301', same ? 'The joint is welded to ASME IX.' : `The joint is welded to ${codeName(production.code)}; an ASME IX test does not qualify it.`, 'convention'))
  }
  const isGroove = test.weld === 'groove'
  if (production.weld === 'groove') {
    reasons.push(reason(isGroove ? 'met' : 'not-met', 'weld', isGroove ? 'QW-303.1' : 'QW-452.5', isGroove ? 'A groove test qualifies groove welds.' : 'A fillet test qualifies fillet welds only, not groove welds.', 'verified'))
  }
  else if (isGroove) {
    reasons.push(reason('met', 'weld', 'QW-452.6, QW-303.1', 'A groove test qualifies fillet welds of all sizes, thicknesses and diameters.', 'verified'))
  }
  reasons.push(...positionFindings(test, production, letters, context))
  const dia = diameterFinding(test, production, context)
  if (dia) reasons.push(dia)

  // Fillet test, fillet production: base metal thickness (QW-452.5).
  if (production.weld === 'fillet' && !isGroove) {
    if (test.couponThickness === undefined) {
      reasons.push(reason('not-recorded', 'thickness', 'QW-452.5', 'The fillet test coupon thickness was not recorded.', 'partial', { record: 'test.couponThickness' }))
    }
    else if (toMicro(test.couponThickness) < pick(asme.t3_16, u)) {
      const range = { min: test.couponThickness, max: fromMicro(2 * toMicro(test.couponThickness)) }
      if (production.thickness === undefined) reasons.push(reason('not-recorded', 'thickness', 'QW-452.5', `The test qualifies base metal ${rangeText(range, u)}; the production thickness is not given.`, 'memory', { record: 'production.thickness' }))
      else reasons.push(reason(inRange(production.thickness, range) ? 'met' : 'not-met', 'thickness', 'QW-452.5', `Base metal ${production.thickness} ${u}: qualified ${rangeText(range, u)}.`, 'memory'))
    }
    else {
      reasons.push(reason('met', 'thickness', 'QW-452.5', `A fillet test coupon of ${formatLength(pick(asme.t3_16, u), u)} or more qualifies all base metal thicknesses and fillet sizes.`, 'partial'))
    }
  }

  // Processes: each production process against a test layer of the same process.
  const named = productionLayers(production)
  const pLayers = named.length > 0 ? named : tLayers.length === 1 ? [{ ...stripProduction(production), process: tLayers[0]!.process }] : []
  if (named.length === 0) {
    // Production names no process: the variables of the test's process are compared as if production were welded with it, and the process itself is not stated.
    reasons.push(reason('not-recorded', 'process', 'QW-350', `Production does not name its process: cannot tell, state it; the test was ${tLayers.map(l => l.process).join(' + ')} (its other variables are compared as for that process).`, 'partial', { record: 'production.process' }))
  }
  pLayers.forEach((p, pi) => {
    const process = asmeProcess(p.process)
    const candidates = tLayers.map((t, ti) => ({ t, ti })).filter(({ t }) => asmeProcess(t.process) === process)
    if (candidates.length === 0) {
      reasons.push(reason('not-met', 'process', 'QW-350', `The test was ${tLayers.map(l => l.process).join(' + ')}; ${process} needs its own test.`, 'partial', { process }))
      return
    }
    const judged = candidates.map(({ t, ti }) => layerFindings({ t, p, ti, pi }, test, production, letters, context))
    const best = judged.find(rs => rs.every(r => r.met)) ?? judged.find(rs => rs.every(r => r.state !== 'not-met')) ?? judged[0]!
    reasons.push(reason('met', 'process', 'QW-350', `${process} was tested${tLayers.length > 1 ? ' in the combination coupon (QW-306; each process within its own deposit)' : ''}.`, 'partial', { process }))
    reasons.push(...best)
  })

  // P-No. (QW-403.18, QW-423.1).
  const pNo = categorical({
    variable: 'p-number', clause: 'QW-403.18, QW-423.1', basis: 'verified', field: 'pNumber', test: test.pNumber, production: production.pNumber,
    qualifies: (a, b) => qw4231(a, context.edition).contains(b), show: v => `P-No. ${v}`,
  })
  if (pNo) reasons.push(pNo)
  return reasons
}

/** Does an ASME IX welder test (or set of tests) cover a production weld? Every QW-350 variable both sides state is compared. */
export function covers(input: CoversInput, context: RuleContext): CoversResult {
  return coversEach(input, (test, production) => one(test, production, context))
}
