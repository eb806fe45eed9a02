import type { PqrLayer, PqrRecord, WpsLayer, WpsSupportInput } from '../inputs'
import type { CoverReason, LayerSupport, WpsSupportResult } from '../results'
import type { RuleContext } from '../types'
import { pqrLayers, wpsLayers } from '../layers'
import { pqrLabel, union, type Interval } from '../pqr-pool'
import { refuse } from '../refusal'
import { toughness as judgeToughness } from '../toughness'
import { formatLength, formatRange, scale, toMicro } from '../units'
import { answerOf, reason, recordOf, undeterminedOf } from '../variables'
import { asmeProcess, isShortCircuit } from './processes'
import { procedureRanges } from './procedure-ranges'
import { qw4241 } from './qw-424'

const label = pqrLabel

/** Supplementary essential variables (with toughness) and essential variables Rootface does not compare, per process (QW-250 series, from memory). */
const byHandRows: { clause: string, text: string, processes?: string[], toughness?: boolean }[] = [
  { clause: 'QW-403.5', text: 'Base metal Group No. (with toughness): compared only when the WPS and the PQR give the group.', toughness: true },
  { clause: 'QW-405.2', text: 'A change of position to vertical uphill (with toughness).', toughness: true },
  { clause: 'QW-407.2', text: 'PWHT temperature and time at temperature (with toughness).', toughness: true },
  { clause: 'QW-410.9', text: 'A change from multipass to single pass per side (with toughness).', toughness: true },
  { clause: 'QW-404.12', text: 'Filler classification change (with toughness).', toughness: true },
  { clause: 'QW-409.4', text: 'Current type or polarity (with toughness).', toughness: true },
  { clause: 'QW-408.2', text: 'Shielding gas: single gas, mixture or composition.', processes: ['GMAW', 'FCAW', 'GTAW', 'PAW'] },
  { clause: 'QW-404.9, QW-404.10', text: 'Flux and electrode–flux classification; alloy flux.', processes: ['SAW'] },
  { clause: 'QW-404.33', text: 'Filler AWS classification where the QW-250 table lists it.', processes: ['GMAW', 'FCAW', 'GTAW', 'SAW'] },
  { clause: 'QW-200.4(b)', text: 'The root-process exception for combination procedures (a process used for the root of a coupon 1/2 in or thicker): not applied by Rootface; it may widen the range.' },
]

/** PQR layer that supports a WPS layer, with its findings. */
function layerAgainst(w: WpsLayer, p: PqrLayer, pqr: PqrRecord, name: string, wpsToughness: boolean, context: RuleContext): CoverReason[] {
  const u = context.unit
  const f = (m: number) => formatLength(m, u)
  const process = asmeProcess(w.process)
  const out: CoverReason[] = []
  const tag = { process }
  if (process === 'GMAW') {
    const wShort = isShortCircuit(process, w.transfer)
    if (w.transfer === undefined || p.transfer === undefined) {
      out.push(reason('not-recorded', 'transfer', 'QW-409.2', `${name}: the ${w.transfer === undefined ? 'WPS' : 'PQR'} does not state the GMAW transfer mode.`, 'memory', { ...tag, record: w.transfer === undefined ? 'wps.transfer' : 'pqrs[].transfer' }))
    }
    else {
      const ok = isShortCircuit(p.process, p.transfer) === wShort
      out.push(reason(ok ? 'met' : 'not-met', 'transfer', 'QW-409.2', ok ? `${wShort ? 'Short-circuiting' : 'Spray, globular or pulsed'} transfer is qualified by ${name}.` : `${name} used ${p.transfer} transfer; the WPS ${w.transfer}.`, 'memory', tag))
    }
  }
  // Deposit of this process (QW-404.30 → Table QW-451.1 column t), from this process's deposit in the PQR coupon.
  if (w.depositMax !== undefined) {
    const r = procedureRanges({ process: p.process, ...(p.transfer ? { transfer: p.transfer } : {}), couponThickness: pqr.couponThickness, ...(p.depositThickness === undefined ? {} : { depositThickness: p.depositThickness }), ...(p.maxPassThickness === undefined ? {} : { maxPassThickness: p.maxPassThickness }), toughness: wpsToughness }, context)
    if (p.depositThickness === undefined && pqr.layers !== undefined && pqr.layers.length > 1) {
      out.push(reason('not-recorded', 'deposit', 'QW-404.30, QW-451.1', `${name}: the ${process} deposit of the combination coupon is not recorded.`, 'memory', { ...tag, record: 'pqrs[].layers[].depositThickness' }))
    }
    else {
      const best = r.depositMax === undefined ? undefined : r.depositMax === null ? null : toMicro(r.depositMax)
      const ok = best === null || (best !== undefined && w.depositMax !== null && toMicro(w.depositMax) <= best)
      out.push(reason(ok ? 'met' : 'not-met', 'deposit', 'QW-404.30, QW-451.1', `${process} deposit up to ${w.depositMax === null ? 'unlimited' : f(toMicro(w.depositMax))}: ${name} qualifies up to ${best === undefined ? 'nothing' : best === null ? 'unlimited' : f(best)}.`, 'memory', tag))
    }
  }
  const exact = (variable: string, clause: string, what: string, wv: unknown, pv: unknown, field: string) => {
    if (wv === undefined) return
    if (pv === undefined) out.push(reason('not-recorded', variable, clause, `${name} does not record its ${what}; the WPS states ${String(wv)}.`, 'memory', { ...tag, record: `pqrs[].${field}` }))
    else out.push(reason(wv === pv ? 'met' : 'not-met', variable, clause, `${what} ${String(wv)}: ${name} used ${String(pv)}.`, 'memory', tag))
  }
  exact('f-number', 'QW-404.4', 'F-No.', w.fNumber, p.fNumber, 'fNumber')
  exact('a-number', 'QW-404.5', 'A-No.', w.aNumber, p.aNumber, 'aNumber')
  if (process === 'GTAW' || process === 'PAW') exact('filler-added', 'QW-404.14', 'filler metal added', w.fillerAdded, p.fillerAdded, 'fillerAdded')
  if (wpsToughness) {
    if (w.heatInputMax !== undefined) {
      const per = u === 'in' ? 'J/in' : 'J/mm'
      if (p.heatInput === undefined) out.push(reason('not-recorded', 'heat-input', 'QW-409.1', `Heat input is limited when toughness is required, but ${name} does not record its heat input.`, 'verified', { ...tag, record: 'pqrs[].heatInput' }))
      else {
        const ok = p.heatInput >= w.heatInputMax
        out.push(reason(ok ? 'met' : 'not-met', 'heat-input', 'QW-409.1', `Heat input up to ${w.heatInputMax} ${per}: ${name} recorded ${p.heatInput} ${per}.`, 'verified', tag))
      }
    }
    else if (p.heatInput !== undefined) {
      out.push(reason('not-recorded', 'heat-input', 'QW-409.1', `With toughness the WPS must limit heat input (${name} recorded ${p.heatInput}).`, 'verified', { ...tag, record: 'wps.heatInputMax' }))
    }
  }
  return out
}

/** Does a WPS stay inside what its supporting PQRs qualify? Per process layer and variable by variable, with the clause of each. */
export function wpsSupport(input: WpsSupportInput, context: RuleContext): WpsSupportResult {
  const u = context.unit
  const wps = input.wps
  const deg = u === 'in' ? 100 : 55
  const degText = u === 'in' ? '°F' : '°C'
  if (input.pqrs.length === 0) refuse('pqrs: give at least one supporting PQR')
  const wLayers = wpsLayers(wps)
  wLayers.forEach(l => asmeProcess(l.process))
  input.pqrs.forEach(p => pqrLayers(p).forEach(l => asmeProcess(l.process)))
  const toughness = wps.toughness ?? false
  const procedure: CoverReason[] = []

  // QW-403.6 and the PQR's toughness results: a PQR supports a toughness WPS only when its results are recorded and accepted.
  const indexed = input.pqrs.map((pqr, i) => ({ pqr, i, name: label(pqr, i) }))
  let usable = indexed
  const waiting = new Set<string>()
  if (toughness) {
    const tested = indexed.filter(({ pqr }) => pqr.toughness)
    procedure.push(reason(tested.length > 0 ? 'met' : 'not-met', 'toughness', 'QW-403.6', tested.length > 0
      ? `Toughness is qualified by ${tested.map(x => x.name).join(', ')}.`
      : 'The WPS requires toughness but no supporting PQR was toughness-tested.', 'verified'))
    usable = tested.filter(({ pqr, name }) => {
      if (!pqr.toughnessResults) {
        procedure.push(reason('not-recorded', 'toughness-results', 'QW-403.6, construction code', `${name} is marked toughness-tested but its Charpy results and acceptance values are not recorded.`, 'convention', { record: 'pqrs[].toughnessResults' }))
        waiting.add(name)
        return false
      }
      const judged = judgeToughness(pqr.toughnessResults, context)
      procedure.push(reason(judged.accepted ? 'met' : judged.answer === 'rejected' ? 'not-met' : 'not-recorded', 'toughness-results', 'QW-403.6, construction code',
        `${name} Charpy results ${judged.answer}: ${judged.reasons.map(r => r.text).join(' ')}`, 'convention', judged.answer === 'cannot-tell' ? { record: 'pqrs[].toughnessResults' } : {}))
      if (judged.answer === 'cannot-tell') waiting.add(name)
      return judged.accepted
    })
  }

  // QW-424.1: the WPS base metals need ONE PQR whose base metals qualify them.
  if (wps.baseMetals) {
    const wa = wps.baseMetals.a.pNumber
    const wb = wps.baseMetals.b?.pNumber ?? wa
    const named = usable.filter(({ pqr }) => pqr.baseMetals)
    const fits = named.filter(({ pqr }) => qw4241(pqr.baseMetals!.a.pNumber, pqr.baseMetals!.b?.pNumber ?? pqr.baseMetals!.a.pNumber, wa, wb))
    if (fits.length) procedure.push(reason('met', 'base-metals', 'QW-424.1', `P-No. ${wa} to P-No. ${wb}: qualified by ${fits.map(x => `${x.name} (P-No. ${x.pqr.baseMetals!.a.pNumber} to ${x.pqr.baseMetals!.b?.pNumber ?? x.pqr.baseMetals!.a.pNumber})`).join(', ')}.`, 'memory'))
    else if (named.length < usable.length) procedure.push(reason('not-recorded', 'base-metals', 'QW-424.1', `P-No. ${wa} to P-No. ${wb}: ${usable.filter(x => !x.pqr.baseMetals).map(x => x.name).join(', ')} do not record their base metals.`, 'memory', { record: 'pqrs[].baseMetals' }))
    else procedure.push(reason('not-met', 'base-metals', 'QW-424.1', `P-No. ${wa} to P-No. ${wb} is qualified by no single PQR (${named.map(x => `${x.name}: P-No. ${x.pqr.baseMetals!.a.pNumber} to ${x.pqr.baseMetals!.b?.pNumber ?? x.pqr.baseMetals!.a.pNumber}`).join('; ') || 'none'}); PQRs of each metal to itself do not qualify a dissimilar joint.`, 'memory'))
    if (toughness && wps.baseMetals.a.group !== undefined) {
      const groups = fits.filter(({ pqr }) => pqr.baseMetals!.a.group !== undefined)
      const ok = groups.some(({ pqr }) => pqr.baseMetals!.a.group === wps.baseMetals!.a.group && (wps.baseMetals!.b?.group === undefined || (pqr.baseMetals!.b ?? pqr.baseMetals!.a).group === wps.baseMetals!.b.group))
      procedure.push(groups.length === 0
        ? reason('not-recorded', 'group', 'QW-403.5', 'With toughness the Group No. must match; the PQRs do not record it.', 'memory', { record: 'pqrs[].baseMetals.a.group' })
        : reason(ok ? 'met' : 'not-met', 'group', 'QW-403.5', ok ? 'Group No. matches a PQR.' : 'With toughness the base metal Group No. must be the one of the PQR.', 'memory'))
    }
  }

  // QW-406.1: preheat not more than 100 °F (55 °C) below the PQR's; QW-406.3 (toughness): interpass not more than 100 °F (55 °C) above.
  const preheats = usable.filter(({ pqr }) => pqr.preheat !== undefined)
  if (wps.preheatMin !== undefined) {
    if (preheats.length < usable.length) procedure.push(reason('not-recorded', 'preheat', 'QW-406.1', `${usable.filter(({ pqr }) => pqr.preheat === undefined).map(x => x.name).join(', ')} do not record the preheat used.`, 'memory', { record: 'pqrs[].preheat' }))
    else {
      const highest = Math.max(...preheats.map(({ pqr }) => pqr.preheat ?? 0))
      const ok = wps.preheatMin >= highest - deg
      procedure.push(reason(ok ? 'met' : 'not-met', 'preheat', 'QW-406.1', `Preheat ${wps.preheatMin} ${degText} minimum: at most ${deg} ${degText} below the PQR preheat (${highest} ${degText}).`, 'memory'))
    }
  }
  else if (preheats.length) {
    procedure.push(reason('not-recorded', 'preheat', 'QW-406.1', 'The PQRs record a preheat; the WPS must state its minimum preheat.', 'memory', { record: 'wps.preheatMin' }))
  }
  if (toughness && wps.interpassMax !== undefined) {
    const recorded = usable.filter(({ pqr }) => pqr.interpassMax !== undefined)
    if (recorded.length < usable.length) procedure.push(reason('not-recorded', 'interpass', 'QW-406.3', 'With toughness the interpass temperature is limited; a PQR does not record it.', 'memory', { record: 'pqrs[].interpassMax' }))
    else {
      const lowest = Math.min(...recorded.map(({ pqr }) => pqr.interpassMax ?? 0))
      const ok = wps.interpassMax <= lowest + deg
      procedure.push(reason(ok ? 'met' : 'not-met', 'interpass', 'QW-406.3', `Interpass ${wps.interpassMax} ${degText} maximum: at most ${deg} ${degText} above the PQR's (${lowest} ${degText}).`, 'memory'))
    }
  }

  // QW-407.1: the PWHT condition must be the PQR's.
  if (wps.pwht) {
    const recorded = usable.filter(({ pqr }) => pqr.pwht)
    if (recorded.length < usable.length) procedure.push(reason('not-recorded', 'pwht', 'QW-407.1', `${usable.filter(({ pqr }) => !pqr.pwht).map(x => x.name).join(', ')} do not record their PWHT condition.`, 'memory', { record: 'pqrs[].pwht' }))
    else {
      const bad = recorded.filter(({ pqr }) => pqr.pwht!.condition !== wps.pwht!.condition)
      procedure.push(reason(bad.length ? 'not-met' : 'met', 'pwht', 'QW-407.1', bad.length ? `PWHT ${wps.pwht.condition}: ${bad.map(x => `${x.name} was ${x.pqr.pwht!.condition}`).join(', ')}.` : `PWHT ${wps.pwht.condition}: as welded on the PQRs.`, 'memory'))
    }
  }
  else if (usable.some(({ pqr }) => pqr.pwht && pqr.pwht.condition !== 'none')) {
    procedure.push(reason('not-recorded', 'pwht', 'QW-407.1', 'A PQR was heat treated; the WPS must state its PWHT condition.', 'memory', { record: 'wps.pwht' }))
  }

  // Per layer: the PQRs with a layer of the same process, thickness from their coupons, the rest from that layer.
  const wMin = wps.thickness.min === null ? null : toMicro(wps.thickness.min)
  const wMax = wps.thickness.max === null ? null : toMicro(wps.thickness.max)
  if (wMin !== null && wMax !== null && wMin > wMax) refuse('wps.thickness: the minimum is above the maximum')
  const layers: LayerSupport[] = wLayers.map((w, layer) => {
    const process = asmeProcess(w.process)
    const variables: CoverReason[] = []
    const withProcess = usable.flatMap(({ pqr, name }) => pqrLayers(pqr).filter(l => asmeProcess(l.process) === process).map(l => ({ pqr, name, l })))
    const anyProcess = indexed.some(({ pqr }) => pqrLayers(pqr).some(l => asmeProcess(l.process) === process))
    const pending = indexed.some(({ pqr, name }) => waiting.has(name) && pqrLayers(pqr).some(l => asmeProcess(l.process) === process))
    variables.push(reason(withProcess.length > 0 ? 'met' : pending ? 'not-recorded' : 'not-met', 'process', 'QW-200.2', withProcess.length > 0
      ? `${process} is qualified by ${[...new Set(withProcess.map(x => x.name))].join(', ')}.`
      : pending ? `The ${process} PQR waits for its toughness results.` : anyProcess ? `No usable PQR was welded with ${process}.` : `No supporting PQR was welded with ${process}.`, 'memory', { process, ...(pending && withProcess.length === 0 ? { record: 'pqrs[].toughnessResults' } : {}) }))
    // Each candidate PQR layer: all its layer variables; the layer is supported when one candidate meets them all.
    const judged = withProcess.map(x => ({ ...x, rs: layerAgainst(w, x.l, x.pqr, x.name, toughness, context) }))
    const best = judged.find(j => j.rs.every(r => r.met)) ?? judged.find(j => j.rs.every(r => r.state !== 'not-met')) ?? judged[0]
    if (best) variables.push(...best.rs)
    const supporting = judged.filter(j => j.rs.every(r => r.met))
    // QW-403.8 → Table QW-451.1 (and QW-403.6/.9/.10, QW-407.4): base metal thickness, from the PQR coupons of this process.
    const pool = supporting.length ? supporting : judged
    const ranges = pool.map(({ pqr, l }) => {
      const r = procedureRanges({ process: l.process, ...(l.transfer ? { transfer: l.transfer } : {}), couponThickness: pqr.couponThickness, ...(l.maxPassThickness === undefined ? {} : { maxPassThickness: l.maxPassThickness }), toughness }, context)
      let high = r.baseMetal.max === null ? Infinity : toMicro(r.baseMetal.max)
      if (pqr.pwht && (pqr.pwht.condition === 'above-upper' || pqr.pwht.condition === 'above-upper-then-below-lower')) high = Math.min(high, scale(toMicro(pqr.couponThickness), 11, 10))
      return [toMicro(r.baseMetal.min ?? 0), high] as Interval
    })
    const joined = union(ranges)
    if (wMin === null || wMax === null) {
      variables.push(reason('not-met', 'thickness', 'QW-403.8', 'A WPS thickness range must have a minimum and a maximum: QW-451.1 never qualifies an unlimited range.', 'verified', { process }))
    }
    else if (withProcess.length) {
      const inside = joined.some(([low, high]) => wMin >= low && wMax <= high)
      const qualified = joined.map(([low, high]) => formatRange(low, high === Infinity ? null : high, u)).join(' and ')
      variables.push(reason(inside ? 'met' : 'not-met', 'thickness', 'QW-403.8, QW-451.1', inside
        ? `Base metal ${formatRange(wMin, wMax, u)} lies within ${qualified}.`
        : `Base metal ${formatRange(wMin, wMax, u)} is outside what the PQRs qualify (${qualified || 'nothing'}).`, 'verified', { process }))
    }
    const answer = answerOf(variables)
    return { layer, process, state: answer === 'covered' ? 'met' : answer === 'not-covered' ? 'not-met' : 'not-recorded', pqrs: [...new Set(supporting.map(s => s.name))], variables }
  })

  const processes = wLayers.map(l => asmeProcess(l.process))
  const byHand = byHandRows
    .filter(r => (!r.toughness || toughness) && (!r.processes || r.processes.some(p => processes.includes(p as never))))
    .filter(r => !(r.clause === 'QW-200.4(b)' && wLayers.length < 2))
    .map(r => reason('not-checked', r.clause.toLowerCase(), r.clause, `Not checked by Rootface: check by hand. ${r.text}`, 'memory'))
  const reasons = [...procedure, ...layers.flatMap(l => l.variables)]
  const answer = answerOf(reasons)
  const violations = reasons.filter(r => r.state === 'not-met').map(({ clause, text, basis }) => ({ clause, text, basis }))
  const mapped = answer === 'covered' ? 'supported' : answer === 'not-covered' ? 'not-supported' : 'cannot-tell'
  return { supported: mapped === 'supported', answer: mapped, violations, reasons, layers, procedure, byHand, record: recordOf(reasons), undetermined: undeterminedOf(reasons) }
}
