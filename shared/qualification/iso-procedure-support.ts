import { againstWpqr, iso15614Caution, wpqrRanges, type IsoFinding, type IsoWps, type WpqrTestPiece } from '../rules/iso-15614-1'
import { RuleRefusal } from '../rules/refusal'
import { isIsoProcedureCode } from '../vocabulary/records'
import type { ProcedureDraft } from '../schemas/procedure'
import type { PqrQualifies, SupportCheck, SupportFinding, SupportPqr } from './procedure-support'

/**
 * ISO 15609-1 WPSs against ISO 15614-1 WPQRs in the app: the WPS draft and the WPQRs as stored, turned into the rules'
 * shapes (mm, °C, kJ/mm), compared variable by variable (shared/rules/iso-15614-1), and answered in the support check's
 * words. A WPQR without its ISO test piece, or a variable not recorded, is "cannot tell"; what Rootface does not decide is
 * "check by hand" (the supervisor's signed statement at approval). Never "supported" on a variable not compared.
 */

/** The WPQR as the ISO check reads it (kept on SupportPqr.iso by server/database/pqrs.ts). Lengths in mm, heat input in J/mm. */
export interface IsoWpqrRecord {
  processes: string[]
  thickness: number
  form: 'plate' | 'pipe'
  outsideDiameter: number | null
  runs: 'single' | 'multi'
  positions: string[]
  materialGroup: string | null
  /** Heat input of each layer (J/mm), null where not recorded. */
  heatInputs: (number | null)[]
  impactTested: boolean
  hardnessTested: boolean
  preheat: number | null
  interpass: number | null
  pwht: { done: boolean, temperature: number | null, hours: number | null } | null
  filler: string | null
  fillerGroup: string | null
}

const isNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v)
const unique = (list: string[]) => list.filter((p, i) => list.indexOf(p) === i)

/** The rules' test piece of a stored WPQR (null when the record holds no ISO test piece). */
export function isoPieceOf(p: Pick<SupportPqr, 'iso'>): WpqrTestPiece | null {
  const w = p.iso
  if (!w) return null
  const heats = w.heatInputs.filter(isNumber)
  const allHeats = heats.length === w.heatInputs.length && heats.length > 0
  return {
    processes: unique(w.processes), form: w.form, thickness: w.thickness, runs: w.runs, positions: w.positions,
    ...(w.outsideDiameter !== null ? { outsideDiameter: w.outsideDiameter } : {}),
    ...(w.materialGroup ? { materialGroup: w.materialGroup } : {}),
    ...(allHeats ? { heatInputMax: Math.max(...heats) / 1000, heatInputMin: Math.min(...heats) / 1000 } : {}),
    impactTested: w.impactTested, hardnessTested: w.hardnessTested,
    ...(w.preheat !== null ? { preheat: w.preheat } : {}),
    ...(w.interpass !== null ? { interpassMax: w.interpass } : {}),
    ...(w.pwht ? { pwht: { done: w.pwht.done, ...(w.pwht.temperature !== null ? { temperature: w.pwht.temperature } : {}), ...(w.pwht.hours !== null ? { hours: w.pwht.hours } : {}) } } : {}),
    ...(w.filler ? { filler: w.filler } : {}),
    ...(w.fillerGroup ? { fillerGroup: w.fillerGroup } : {}),
  }
}

type IsoDraft = { code: string } & Pick<ProcedureDraft, 'thickness' | 'baseMetals' | 'layers'> & Partial<Pick<ProcedureDraft, 'diameter' | 'preheatMin' | 'interpassMax' | 'pwht' | 'positions' | 'toughnessRequired'>>

/** The rules' WPS of an ISO 15609-1 draft (mm, °C; heat input J/mm → kJ/mm), and the designations of its fillers. */
export function isoWpsOf(draft: IsoDraft): { wps: IsoWps, fillers: string[] } {
  const g = draft.thickness?.groove
  const heat = (draft.layers ?? []).map(l => l.heatInputMax)
  const fillers = unique((draft.layers ?? []).flatMap(l => (l.fillers ?? []).map(f => [f.specification, f.classification].filter(Boolean).join(' ').trim())).filter(Boolean))
  const dMin = draft.diameter?.min
  const pwht = draft.pwht
  const wps: IsoWps = {
    processes: unique((draft.layers ?? []).map(l => l.process)),
    form: isNumber(dMin) ? 'pipe' : 'plate',
    ...(isNumber(dMin) ? { outsideDiameterMin: dMin } : {}),
    ...(isNumber(g?.min) && isNumber(g?.max) ? { thickness: { min: g.min, max: g.max } } : {}),
    ...(draft.positions?.length ? { positions: draft.positions } : {}),
    ...(draft.baseMetals?.a?.pNumber?.trim() ? { materialGroup: draft.baseMetals.a.pNumber.trim() } : {}),
    ...(heat.length && heat.every(isNumber) ? { heatInput: { max: Math.max(...heat) / 1000 } } : {}),
    ...(isNumber(draft.preheatMin) ? { preheatMin: draft.preheatMin } : {}),
    ...(isNumber(draft.interpassMax) ? { interpassMax: draft.interpassMax } : {}),
    ...(pwht ? { pwht: { done: !!pwht.required, ...(isNumber(pwht.temperature?.min) && isNumber(pwht.temperature?.max) ? { temperature: { min: pwht.temperature.min, max: pwht.temperature.max } } : {}), ...(isNumber(pwht.holdHours) ? { hours: pwht.holdHours } : {}) } } : {}),
    ...(fillers[0] ? { filler: fillers[0] } : {}),
  }
  return { wps, fillers }
}

const fieldOf: Record<string, string> = {
  'process': 'layers.0.process', 'thickness': 'thickness.groove', 'diameter': 'diameter', 'position': 'positions', 'material': 'baseMetals',
  'heat-input': 'layers.0.heatInputMax', 'preheat': 'preheatMin', 'interpass': 'interpassMax', 'pwht': 'pwht', 'filler': 'layers.0.fillers',
}
const asFinding = (x: IsoFinding, prefix: string): SupportFinding => ({
  met: x.state === 'met', clause: x.clause, basis: x.basis, field: fieldOf[x.variable] ?? null,
  text: prefix + x.text, ...(x.state === 'by-hand' ? { byHand: true, state: 'not-checked' } : x.state === 'not-recorded' ? { state: 'not-recorded' } : {}),
}) as SupportFinding

/** The support check of an ISO 15609-1 WPS (or one stored under the ISO code before ISO 15614-1 had its own id). */
export function isoSupportCheck(draft: IsoDraft, pqrs: SupportPqr[]): SupportCheck {
  const findings: SupportFinding[] = []
  const blockers: string[] = []
  const wpqrs = [...new Map(pqrs.map(p => [p.id, p])).values()]
  const qualifies = wpqrs.map(isoQualifies)
  const done = (checked: boolean): SupportCheck => {
    const violations = findings.filter(f => !f.met)
    return { checked, rulesMissing: false, supported: checked && violations.length === 0 && blockers.length === 0, findings, violations, blockers, qualifies, caution: iso15614Caution }
  }
  if (!wpqrs.length) {
    blockers.push('Pick at least one supporting WPQR.')
    return done(false)
  }
  if (!wpqrs.some(p => p.status === 'certified' && p.resultsPass)) blockers.push('No supporting WPQR has certified results that pass (tensile and bends accepted).')
  for (const p of wpqrs) {
    if (p.status === 'recorded') blockers.push(`${p.number}: its results are not certified by an inspector yet.`)
    if (p.status === 'failed') blockers.push(`${p.number}: its certified results failed; it cannot support a WPS.`)
  }
  const iso = wpqrs.filter(p => isIsoProcedureCode(p.code))
  for (const p of wpqrs.filter(q => !isIsoProcedureCode(q.code))) {
    findings.push({ met: false, clause: 'code', basis: 'convention', field: 'supportingPqrIds', text: `${p.number} is not an ISO 15614-1 WPQR; this WPS is written to ISO 15609-1.` })
  }
  if (!iso.length) return done(false)
  const { wps, fillers } = isoWpsOf(draft)
  const runs = iso.map((p) => {
    const piece = isoPieceOf(p)
    if (!piece) return { p, list: [{ variable: 'wpqr', state: 'not-recorded', clause: 'ISO 15614-1:2017, 8', basis: 'convention', text: `Cannot tell: ${p.number} holds no ISO 15614-1 test piece (positions welded, plate or pipe): record it on the WPQR.` } as IsoFinding] }
    try {
      return { p, list: againstWpqr(wps, piece) }
    }
    catch (error) {
      if (!(error instanceof RuleRefusal)) throw error
      return { p, list: [{ variable: 'wpqr', state: 'not-recorded', clause: 'ISO 15614-1:2017, 8', basis: 'convention', text: `Cannot tell: ${p.number}: ${error.message}` } as IsoFinding] }
    }
  })
  const best = runs.find(r => r.list.every(x => x.state === 'met')) ?? runs.find(r => r.list.every(x => x.state !== 'not-met')) ?? runs[0]!
  const prefix = iso.length > 1 ? `${best.p.number}: ` : ''
  findings.push(...best.list.map(x => asFinding(x, prefix)))
  if (fillers.length > 1) findings.push({ met: false, byHand: true, state: 'not-checked', clause: 'ISO 15614-1:2017, 8.4.4', basis: 'memory', field: 'layers', text: `Check by hand: the WPS names ${fillers.length} filler designations (${fillers.join('; ')}); only the first is compared.` } as SupportFinding)
  if (draft.thickness?.fillet && (isNumber(draft.thickness.fillet.min) || isNumber(draft.thickness.fillet.max))) {
    findings.push({ met: false, byHand: true, state: 'not-checked', clause: 'ISO 15614-1:2017, 8.3.2.1', basis: 'memory', field: 'thickness.fillet', text: 'Check by hand: fillet weld thickness and throat ranges (Table 6 notes) are not compared here.' } as SupportFinding)
  }
  return done(true)
}

/** What one WPQR qualifies, in the support check's words (thickness as the base-metal range; every range as a reason). */
export function isoQualifies(p: SupportPqr): PqrQualifies {
  const piece = isoPieceOf(p)
  if (!piece) return { pqrId: p.id, number: p.number, baseMetal: null, depositMax: null, reasons: [], error: 'No ISO 15614-1 test piece recorded: record its positions and whether it is plate or pipe.' }
  try {
    const r = wpqrRanges(piece)
    return { pqrId: p.id, number: p.number, baseMetal: r.thickness, depositMax: null, reasons: r.reasons.map(({ clause, text, basis }) => ({ clause, text, basis })), error: null }
  }
  catch (error) {
    if (!(error instanceof RuleRefusal)) throw error
    return { pqrId: p.id, number: p.number, baseMetal: null, depositMax: null, reasons: [], error: error.message }
  }
}
