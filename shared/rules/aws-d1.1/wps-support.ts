import type { WpsSupportInput } from '../inputs'
import type { CoverReason, LayerSupport, WpsSupportResult } from '../results'
import type { RuleContext } from '../types'
import { pqrLayers, wpsLayers } from '../layers'
import { pqrLabel, union, type Interval } from '../pqr-pool'
import { refuse } from '../refusal'
import { toughness as judgeToughness } from '../toughness'
import { formatRange, toMicro } from '../units'
import { answerOf, reason, recordOf, undeterminedOf } from '../variables'
import { clause4 } from './editions'
import { d11ProcedureTables, positionOf, procedureRanges } from './procedure-ranges'

const processes = ['SMAW', 'SAW', 'GMAW', 'FCAW', 'GTAW']

/** D1.1 names the PQR essential-variable tables per edition (Table 4.5 / 4.6 in 2015, Table 6.5 / 6.6 from 2020; from memory). */
export function d11SupportTables(edition: string) {
  const old = clause4(edition)
  return {
    ...d11ProcedureTables(edition),
    essentials: old ? 'Table 4.5' : 'Table 6.5',
    cvn: old ? 'Table 4.6' : 'Table 6.6',
  }
}

/**
 * How far the WPS minimum preheat may sit below the PQR's before a new PQR is needed (the essential-variable table,
 * from memory: a decrease of more than 25 °F / 15 °C). Degrees follow the WPS unit: °F with inches, °C with millimetres.
 */
export const preheatDrop = { in: 25, mm: 15 } as const

/** With CVN testing, heat input may rise at most 10 % above the PQR's (Table 4.6 in 2015, from memory). */
export const heatInputRise = 1.1

const label = pqrLabel
const isShort = (transfer?: string) => transfer === 'short-circuit'

/** Essential variables of the D1.1 table the WPS record does not hold, so Rootface does not compare them: check by hand. */
function byHandRows(table: string, cvn: string, toughness: boolean, processList: string[]): { clause: string, text: string }[] {
  const rows = [
    { clause: table, text: 'Base metal group: a base metal group not qualified by the PQR\'s group needs a new PQR.' },
    { clause: table, text: 'Filler metal: electrode (or electrode–flux) classification and strength, and an increase in electrode diameter.' },
    { clause: table, text: 'Vertical progression (uphill or downhill) against the PQR\'s.' },
    { clause: table, text: 'Electrical: current type and polarity, amperage, voltage and travel speed within the table\'s tolerances of the PQR.' },
    { clause: table, text: 'Joint: omitting backing or backgouging of a CJP groove weld; a change of groove type beyond the table.' },
    { clause: table, text: 'Interpass temperature and PWHT temperature and time.' },
  ]
  if (processList.some(p => p === 'GMAW' || p === 'FCAW' || p === 'GTAW')) rows.push({ clause: table, text: 'Shielding gas: a change of gas or mixture, or of flow rate beyond the table.' })
  if (processList.includes('SAW')) rows.push({ clause: table, text: 'SAW: flux classification, number of electrodes and electrode spacing.' })
  if (toughness) rows.push({ clause: cvn, text: 'With CVN testing: the added essential variables of the CVN table (e.g. vertical-up progression, single to multiple pass, filler lot) beyond heat input.' })
  return rows
}

/**
 * Does an AWS D1.1 WPS qualified by test stay inside what its supporting PQRs qualify? Process, GMAW transfer, base
 * metal thickness, preheat, PWHT and (with CVN testing) heat input are compared; the table's other essential variables
 * are listed to check by hand. Values from memory unless marked otherwise.
 */
export function wpsSupport(input: WpsSupportInput, context: RuleContext): WpsSupportResult {
  const u = context.unit
  const wps = input.wps
  const tables = d11SupportTables(context.edition)
  const degText = u === 'in' ? '°F' : '°C'
  if (input.pqrs.length === 0) refuse('pqrs: give at least one supporting PQR')
  const wLayers = wpsLayers(wps)
  const known = (p: string) => {
    if (!processes.includes(p.toUpperCase())) refuse(`process: AWS D1.1 qualification of a ${p} WPS by test is not carried (carried: ${processes.join(', ')})`)
    return p.toUpperCase()
  }
  wLayers.forEach(l => known(l.process))
  input.pqrs.forEach(p => pqrLayers(p).forEach(l => known(l.process)))
  const toughness = wps.toughness ?? false
  const procedure: CoverReason[] = []
  const indexed = input.pqrs.map((pqr, i) => ({ pqr, i, name: label(pqr, i) }))

  // CVN testing: a WPS with toughness requirements is supported only by a CVN-tested PQR whose results pass.
  let usable = indexed
  const waiting = new Set<string>()
  if (toughness) {
    const tested = indexed.filter(({ pqr }) => pqr.toughness)
    procedure.push(reason(tested.length > 0 ? 'met' : 'not-met', 'toughness', tables.cvn, tested.length > 0
      ? `CVN testing is qualified by ${tested.map(x => x.name).join(', ')}.`
      : 'The WPS requires CVN toughness but no supporting PQR was CVN-tested.', 'memory'))
    usable = tested.filter(({ pqr, name }) => {
      if (!pqr.toughnessResults) {
        procedure.push(reason('not-recorded', 'toughness-results', tables.cvn, `${name} is marked CVN-tested but its results and acceptance values are not recorded.`, 'convention', { record: 'pqrs[].toughnessResults' }))
        waiting.add(name)
        return false
      }
      const judged = judgeToughness(pqr.toughnessResults, context)
      procedure.push(reason(judged.accepted ? 'met' : judged.answer === 'rejected' ? 'not-met' : 'not-recorded', 'toughness-results', tables.cvn,
        `${name} CVN results ${judged.answer}: ${judged.reasons.map(r => r.text).join(' ')}`, 'convention', judged.answer === 'cannot-tell' ? { record: 'pqrs[].toughnessResults' } : {}))
      if (judged.answer === 'cannot-tell') waiting.add(name)
      return judged.accepted
    })
  }

  // Preheat: not lower than the PQR's by more than the table allows.
  const drop = preheatDrop[u]
  if (wps.preheatMin !== undefined) {
    const missing = usable.filter(({ pqr }) => pqr.preheat === undefined)
    if (missing.length || usable.length === 0) {
      procedure.push(reason('not-recorded', 'preheat', tables.essentials, `${missing.map(x => x.name).join(', ') || 'No usable PQR'} ${missing.length > 1 ? 'do' : 'does'} not record the preheat used.`, 'memory', { record: 'pqrs[].preheat' }))
    }
    else {
      const highest = Math.max(...usable.map(({ pqr }) => pqr.preheat as number))
      const ok = wps.preheatMin >= highest - drop
      procedure.push(reason(ok ? 'met' : 'not-met', 'preheat', tables.essentials, `Preheat ${wps.preheatMin} ${degText} minimum: at most ${drop} ${degText} below the PQR preheat (${highest} ${degText}).`, 'memory'))
    }
  }
  else {
    procedure.push(reason('not-recorded', 'preheat', tables.essentials, 'The WPS must state its minimum preheat to be compared with the PQR\'s.', 'memory', { record: 'wps.preheatMin' }))
  }

  // PWHT: adding or deleting PWHT needs a new PQR; both heat treated → temperature and time by hand.
  const treated = (c?: string) => c !== undefined && c !== 'none'
  if (wps.pwht) {
    const missing = usable.filter(({ pqr }) => !pqr.pwht)
    if (missing.length || usable.length === 0) procedure.push(reason('not-recorded', 'pwht', tables.essentials, `${missing.map(x => x.name).join(', ') || 'No usable PQR'}: the PWHT condition is not recorded.`, 'memory', { record: 'pqrs[].pwht' }))
    else {
      const bad = usable.filter(({ pqr }) => treated(pqr.pwht!.condition) !== treated(wps.pwht!.condition))
      procedure.push(reason(bad.length ? 'not-met' : 'met', 'pwht', tables.essentials, bad.length
        ? `PWHT ${treated(wps.pwht.condition) ? 'added' : 'deleted'} against ${bad.map(x => x.name).join(', ')}: a new PQR is needed.`
        : `PWHT ${treated(wps.pwht.condition) ? 'applied' : 'not applied'}, as on the PQRs.`, 'memory'))
    }
  }
  else {
    procedure.push(reason('not-recorded', 'pwht', tables.essentials, 'The WPS must state whether PWHT is applied to be compared with the PQRs.', 'memory', { record: 'wps.pwht' }))
  }

  // Positions: each PQR test position qualifies its own position (the least the WPS positions table can mean).
  if (wps.positions?.length) {
    const names = { F: 'F', H: 'H', V: 'V', O: 'OH' } as const
    const qualified = new Set<string>()
    const unknown: string[] = []
    for (const { pqr, name } of usable) {
      if (!pqr.testPositions?.length) unknown.push(name)
      for (const p of pqr.testPositions ?? []) {
        const found = positionOf[p.trim().toUpperCase()]
        if (found) found.forEach(x => qualified.add(x))
        else unknown.push(`${name} (${p})`)
      }
    }
    const outside = wps.positions.filter(p => !qualified.has(p))
    const wanted = wps.positions.map(p => names[p]).join(', ')
    const have = [...qualified].map(p => names[p as keyof typeof names]).join(', ') || 'none'
    if (outside.length === 0) procedure.push(reason('met', 'positions', tables.positions, `Positions ${wanted}: qualified by the PQR test positions (${have}).`, 'memory'))
    else if (unknown.length || usable.length === 0) procedure.push(reason('not-recorded', 'positions', tables.positions, `Positions ${wanted}: the test position of ${unknown.join(', ') || 'a usable PQR'} is not recorded as a groove test position (1G–6G).`, 'memory', { record: 'pqrs[].testPositions' }))
    else procedure.push(reason('not-met', 'positions', tables.positions, `Positions ${outside.map(p => names[p]).join(', ')} are not qualified by the PQR test positions (${have}); each test qualifies its own position here, a wider reading of the table is checked by hand.`, 'memory'))
  }
  else {
    procedure.push(reason('not-recorded', 'positions', tables.positions, 'The WPS must state its positions to be compared with the PQR test positions.', 'memory', { record: 'wps.positions' }))
  }

  const wMin = wps.thickness.min === null ? null : toMicro(wps.thickness.min)
  const wMax = wps.thickness.max === null ? null : toMicro(wps.thickness.max)
  if (wMin !== null && wMax !== null && wMin > wMax) refuse('wps.thickness: the minimum is above the maximum')

  const layers: LayerSupport[] = wLayers.map((w, layer) => {
    const process = w.process.toUpperCase()
    const tag = { process }
    const variables: CoverReason[] = []
    const withProcess = usable.flatMap(({ pqr, name }) => pqrLayers(pqr).filter(l => l.process.toUpperCase() === process).map(l => ({ pqr, name, l })))
    const pending = indexed.some(({ pqr, name }) => waiting.has(name) && pqrLayers(pqr).some(l => l.process.toUpperCase() === process))
    variables.push(reason(withProcess.length ? 'met' : pending ? 'not-recorded' : 'not-met', 'process', tables.essentials, withProcess.length
      ? `${process} is qualified by ${[...new Set(withProcess.map(x => x.name))].join(', ')}.`
      : pending ? `The ${process} PQR waits for its CVN results.` : `No usable PQR was welded with ${process}: a change of process needs a new PQR.`, 'memory', { ...tag, ...(pending && !withProcess.length ? { record: 'pqrs[].toughnessResults' } : {}) }))

    // Per candidate PQR layer: transfer and heat input; the layer is supported when one candidate meets them all.
    const judged = withProcess.map(({ pqr, name, l }) => {
      const rs: CoverReason[] = []
      if (process === 'GMAW') {
        if (w.transfer === undefined || l.transfer === undefined) {
          rs.push(reason('not-recorded', 'transfer', tables.essentials, `${name}: the ${w.transfer === undefined ? 'WPS' : 'PQR'} does not state the GMAW transfer mode.`, 'memory', { ...tag, record: w.transfer === undefined ? 'wps.transfer' : 'pqrs[].transfer' }))
        }
        else {
          const ok = isShort(w.transfer) === isShort(l.transfer)
          rs.push(reason(ok ? 'met' : 'not-met', 'transfer', tables.essentials, ok
            ? `${isShort(w.transfer) ? 'Short-circuit' : 'Spray, globular or pulsed'} transfer is qualified by ${name}.`
            : `A change to or from short-circuit transfer needs a new PQR: ${name} used ${l.transfer}, the WPS ${w.transfer}.`, 'memory', tag))
        }
      }
      if (toughness) {
        const limit = w.heatInputMax
        const used = l.heatInput ?? pqr.heatInput
        const per = u === 'in' ? 'J/in' : 'J/mm'
        if (limit === undefined) rs.push(reason('not-recorded', 'heat-input', tables.cvn, `With CVN testing the WPS must limit heat input${used === undefined ? '' : ` (${name} recorded ${used} ${per})`}.`, 'memory', { ...tag, record: 'wps.heatInputMax' }))
        else if (used === undefined) rs.push(reason('not-recorded', 'heat-input', tables.cvn, `With CVN testing heat input is limited, but ${name} does not record its heat input.`, 'memory', { ...tag, record: 'pqrs[].heatInput' }))
        else {
          const ok = limit <= used * heatInputRise
          rs.push(reason(ok ? 'met' : 'not-met', 'heat-input', tables.cvn, `Heat input up to ${limit} ${per}: at most 10 % above ${name}'s ${used} ${per} (${Math.round(used * heatInputRise)} ${per}).`, 'memory', tag))
        }
      }
      return { pqr, name, l, rs }
    })
    const best = judged.find(j => j.rs.every(r => r.met)) ?? judged.find(j => j.rs.every(r => r.state !== 'not-met')) ?? judged[0]
    if (best) variables.push(...best.rs)
    const supporting = judged.filter(j => j.rs.every(r => r.met))

    // Base metal thickness: the union of what the PQR plates of this process qualify (the PQR thickness table).
    const pool = supporting.length ? supporting : judged
    const joined = union(pool.map(({ pqr, l }) => {
      const r = procedureRanges({ process: l.process, ...(l.transfer ? { transfer: l.transfer } : {}), couponThickness: pqr.couponThickness, toughness }, context)
      return [toMicro(r.baseMetal.min ?? 0), r.baseMetal.max === null ? Infinity : toMicro(r.baseMetal.max)] as Interval
    }))
    if (wMin === null || wMax === null) {
      variables.push(reason('not-recorded', 'thickness', tables.thickness, 'The WPS base metal thickness range needs a minimum and a maximum to be compared (write "unlimited" only where the PQR qualifies it).', 'memory', { ...tag, record: 'wps.thickness' }))
    }
    else if (withProcess.length) {
      const inside = joined.some(([low, high]) => wMin >= low && wMax <= high)
      const qualified = joined.map(([low, high]) => formatRange(low, high === Infinity ? null : high, u)).join(' and ')
      variables.push(reason(inside ? 'met' : 'not-met', 'thickness', tables.thickness, inside
        ? `Base metal ${formatRange(wMin, wMax, u)} lies within ${qualified}.`
        : `Base metal ${formatRange(wMin, wMax, u)} is outside what the PQRs qualify (${qualified || 'nothing'}).`, 'memory', tag))
    }
    const answer = answerOf(variables)
    return { layer, process, state: answer === 'covered' ? 'met' : answer === 'not-covered' ? 'not-met' : 'not-recorded', pqrs: [...new Set(supporting.map(s => s.name))], variables }
  })

  const processList = wLayers.map(l => l.process.toUpperCase())
  const byHand = byHandRows(tables.essentials, tables.cvn, toughness, processList)
    .map(r => reason('not-checked', 'by-hand', r.clause, `Not compared by Rootface: check by hand. ${r.text}`, 'memory'))
  const reasons = [...procedure, ...layers.flatMap(l => l.variables)]
  const answer = answerOf(reasons)
  const violations = reasons.filter(r => r.state === 'not-met').map(({ clause, text, basis }) => ({ clause, text, basis }))
  const mapped = answer === 'covered' ? 'supported' : answer === 'not-covered' ? 'not-supported' : 'cannot-tell'
  return { supported: mapped === 'supported', answer: mapped, violations, reasons, layers, procedure, byHand, record: recordOf(reasons), undetermined: undeterminedOf(reasons) }
}
