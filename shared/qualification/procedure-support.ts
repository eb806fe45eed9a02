import { codes, evaluate, getRuleSet } from '../rules'
import { codeName } from '../rules/caution'
import { convertLength } from '../rules/units'
import type { ToughnessResults } from '../rules/inputs'
import type { Basis, CodeId, Range, Unit } from '../rules/types'
import { isoQualifies, isoSupportCheck, type IsoWpqrRecord } from './iso-procedure-support'
import { isIsoProcedureCode } from '../vocabulary/records'

type ProcedureDraftLike = Parameters<typeof isoSupportCheck>[0]

/** A supporting PQR as the support check needs it (lengths in the PQR's own unit). */
export interface SupportPqr {
  id: number
  number: string
  code: string
  edition: string
  unit: Unit
  process: string
  transfer: string | null
  couponThickness: number
  depositThickness: number | null
  toughnessTested: boolean
  heatInput: number | null
  fNumber: string | null
  pNumber: string | null
  status: string
  /** Every tensile and bend specimen recorded and accepted. */
  resultsPass: boolean
  /** Base metal B when the coupon joined two P-Nos. (pNumber is then base metal A). */
  pNumberB?: string | null
  /** Charpy results and the acceptance values entered: a toughness WPS is supported only when they are recorded and accepted. */
  toughnessResults?: ToughnessResults | null
  /** The coupon as welded (AWS D1.1 compares them): preheat, PWHT as written, and the test position (1G, 3G...). */
  preheat?: number | null
  pwht?: string | null
  pwhtTemperature?: number | null
  testPosition?: string | null
  /** ISO 15614-1 WPQRs: the test piece and the values the ISO check compares (absent on ASME/AWS PQRs). */
  iso?: IsoWpqrRecord | null
}

/** The WPS variables the support check reads; a half-filled form is fine. */
export interface SupportWps {
  code: string
  edition: string
  unit: Unit
  process: string
  transfer?: string | null
  thickness?: { groove?: Partial<Range> }
  depositMax?: number | null
  toughnessRequired?: boolean
  baseMetals?: { a?: { pNumber?: string | null }, b?: { pNumber?: string | null } }
  fillers?: { fNumber?: string | null }[]
  electrical?: { heatInputMax?: number | null }
  preheatMin?: number | null
  pwht?: { required?: boolean } | null
  positions?: string[] | null
}

export interface SupportFinding {
  met: boolean
  clause: string
  text: string
  basis: Basis
  /** The form field the finding is about (dot path), so the clause can sit beside the value. */
  field: string | null
  /** A variable of the code's table that Rootface does not compare: the supervisor states how it was checked. */
  byHand?: boolean
}

export interface PqrQualifies {
  pqrId: number
  number: string
  baseMetal: Range | null
  depositMax: number | null
  reasons: { clause: string, text: string, basis: Basis }[]
  error: string | null
}

export interface SupportCheck {
  /** The rules could evaluate the WPS against its PQRs. */
  checked: boolean
  /** The WPS's code carries no procedure-support rules here: its ranges are checked by hand. */
  rulesMissing: boolean
  supported: boolean
  findings: SupportFinding[]
  violations: SupportFinding[]
  /** What stops approval besides the violations (no passing PQR, nothing to check). */
  blockers: string[]
  qualifies: PqrQualifies[]
  caution: string | null
}

const fieldOfClause: [RegExp, string][] = [
  [/^QW-200\.2/, 'process'],
  [/^QW-409\.2/, 'transfer'],
  [/^QW-403\.6/, 'toughnessRequired'],
  [/^QW-403\.8/, 'thickness.groove'],
  [/^QW-404\.30/, 'depositMax'],
  [/^QW-409\.1/, 'electrical.heatInputMax'],
  [/^QW-404\.4/, 'fillers'],
  [/^QW-424\.1/, 'baseMetals'],
]

export function fieldOf(clause: string): string | null {
  return fieldOfClause.find(([pattern]) => pattern.test(clause))?.[1] ?? null
}

const isNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v)

function inUnit(value: number, from: Unit, to: Unit) {
  return convertLength(value, from, to)
}

/** The PQR as a rules record, its lengths converted exactly (25.4 mm/in) into the WPS's unit. */
function pqrRecord(pqr: SupportPqr, unit: Unit, code?: string) {
  const fNumber = pqr.fNumber !== null && /^\d+$/.test(pqr.fNumber) ? Number(pqr.fNumber) : undefined
  const transfer = pqr.transfer && ['short-circuit', 'globular', 'spray', 'pulse'].includes(pqr.transfer) ? pqr.transfer : undefined
  // Heat input per length: J/in ÷ 25.4 = J/mm.
  const heat = pqr.heatInput === null ? undefined : pqr.unit === unit ? pqr.heatInput : pqr.unit === 'in' ? pqr.heatInput / 25.4 : pqr.heatInput * 25.4
  return strip({
    id: pqr.number, process: pqr.process, transfer, couponThickness: inUnit(pqr.couponThickness, pqr.unit, unit),
    depositThickness: pqr.depositThickness === null ? undefined : inUnit(pqr.depositThickness, pqr.unit, unit),
    toughness: pqr.toughnessTested, heatInput: heat, fNumber,
    baseMetals: pqr.pNumber ? { a: { pNumber: pqr.pNumber }, ...(pqr.pNumberB ? { b: { pNumber: pqr.pNumberB } } : {}) } : undefined,
    toughnessResults: pqr.toughnessResults ?? undefined,
    ...(code === 'aws-d1.1' ? d11Actuals(pqr) : {}),
  })
}

/** The coupon's preheat, PWHT and test position for AWS D1.1 (a PWHT written as none or as-welded is none; unwritten is not recorded). */
function d11Actuals(pqr: SupportPqr) {
  const text = pqr.pwht?.trim() ?? ''
  const none = /^(none|no|n\/?a|as[- ]?welded|-)$/i.test(text)
  const pwht = text === '' && !isNumber(pqr.pwhtTemperature) ? undefined : { condition: none && !isNumber(pqr.pwhtTemperature) ? 'none' as const : 'between' as const }
  return strip({ preheat: isNumber(pqr.preheat) ? pqr.preheat : undefined, pwht, testPositions: pqr.testPosition?.trim() ? [pqr.testPosition.trim()] : undefined })
}

/** The support check needs the supervisor's signed statement: the code's rules are not carried, or its table lists variables not compared. */
export function handCheckNeeded(check: Pick<SupportCheck, 'rulesMissing' | 'violations'>): boolean {
  const byHand = (v: SupportFinding) => v.clause === 'rules' || v.byHand === true
  return (check.rulesMissing || check.violations.some(v => v.byHand)) && check.violations.every(byHand)
}

function strip<T extends Record<string, unknown>>(o: T): T {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined && v !== null)) as T
}

/** What one PQR qualifies for a procedure, in the WPS's code, edition and unit (Table QW-451.1 and its notes). */
export function pqrQualifies(pqr: SupportPqr, context: { code: string, edition: string, unit: Unit }, toughness = pqr.toughnessTested): PqrQualifies {
  if (isIsoProcedureCode(context.code) || isIsoProcedureCode(pqr.code)) return isoQualifies(pqr)
  const record = pqrRecord(pqr, context.unit)
  const result = evaluate({
    code: context.code, check: 'procedure-ranges', unit: context.unit, edition: context.edition,
    input: strip({ process: record.process, transfer: record.transfer, couponThickness: record.couponThickness, depositThickness: record.depositThickness, toughness }),
  })
  if ('error' in result) return { pqrId: pqr.id, number: pqr.number, baseMetal: null, depositMax: null, reasons: [], error: String(result.error) }
  const r = result as unknown as { baseMetal: Range, depositMax?: number | null, reasons: PqrQualifies['reasons'] }
  return { pqrId: pqr.id, number: pqr.number, baseMetal: r.baseMetal, depositMax: r.depositMax ?? null, reasons: r.reasons, error: null }
}

/**
 * Whether a WPS stays inside what its supporting PQRs qualify: the rules' wps-support check, run once per
 * F-No. of its fillers, plus the base-metal P-No. rule; and what else stops its approval.
 */
export function supportCheck(wps: SupportWps, pqrs: SupportPqr[]): SupportCheck {
  // An ISO 15609-1 WPS is checked whole (isoSupportCheck), never layer by layer with the ASME/AWS rules.
  if (isIsoProcedureCode(wps.code)) {
    return isoSupportCheck({ code: wps.code, thickness: { groove: { min: wps.thickness?.groove?.min ?? null, max: wps.thickness?.groove?.max ?? null }, fillet: { min: null, max: null } }, baseMetals: wps.baseMetals as ProcedureDraftLike['baseMetals'], layers: [], positions: (wps.positions ?? []) as ProcedureDraftLike['positions'], preheatMin: wps.preheatMin ?? null }, pqrs)
  }
  const findings: SupportFinding[] = []
  const blockers: string[] = []
  const context = { code: wps.code, edition: wps.edition, unit: wps.unit }
  const ruleSet = codes.includes(wps.code as CodeId) ? getRuleSet(wps.code as CodeId) : null
  const rulesMissing = ruleSet !== null && !ruleSet.wpsSupport
  const result = (checked: boolean, caution: string | null): SupportCheck => {
    const violations = findings.filter(f => !f.met)
    return { checked, rulesMissing, supported: checked && violations.length === 0, findings, violations, blockers, qualifies: pqrs.map(p => pqrQualifies(p, context, wps.toughnessRequired ?? false)), caution }
  }
  if (pqrs.length === 0) {
    blockers.push('Pick at least one supporting PQR.')
    return result(false, null)
  }
  const passing = pqrs.filter(p => p.status === 'certified' && p.resultsPass)
  if (passing.length === 0) blockers.push('No supporting PQR has certified results that pass (tensile and bends accepted).')
  for (const p of pqrs) {
    if (p.status === 'recorded') blockers.push(`${p.number}: its results are not certified by an inspector yet.`)
    if (p.status === 'failed') blockers.push(`${p.number}: its certified results failed; it cannot support a WPS.`)
  }
  const sameCode = pqrs.filter(p => p.code === wps.code)
  for (const p of pqrs.filter(q => q.code !== wps.code)) {
    findings.push({ met: false, clause: 'code', text: `${p.number} was qualified to ${codeName(p.code as CodeId)}; this WPS is written to ${codeName(wps.code as CodeId)}.`, basis: 'convention', field: 'supportingPqrIds' })
  }
  if (sameCode.length === 0) return result(false, null)
  if (rulesMissing) {
    findings.push({ met: false, clause: 'rules', basis: 'convention', field: null,
      text: `Rootface carries no procedure-support rules for ${ruleSet!.title}: check each range against the PQRs by hand and say how when approving.` })
    return result(false, null)
  }

  const groove = wps.thickness?.groove ?? {}
  const d11 = wps.code === 'aws-d1.1'
  const fNumbers = d11 ? [] : [...new Set((wps.fillers ?? []).map(f => f.fNumber?.trim()).filter((f): f is string => !!f))]
  const runs: (number | undefined)[] = fNumbers.length ? [] : [undefined]
  for (const f of fNumbers) {
    if (/^\d+$/.test(f)) runs.push(Number(f))
    else findings.push({ met: false, clause: 'QW-404.4', text: `F-No. "${f}" is not a number the rules can compare.`, basis: 'convention', field: 'fillers' })
  }
  let caution: string | null = null
  const seen = new Set<string>()
  for (const fNumber of runs) {
    const evaluated = evaluate({
      code: wps.code, check: 'wps-support', unit: wps.unit, edition: wps.edition,
      input: {
        wps: strip({
          process: wps.process, transfer: wps.transfer ?? undefined,
          thickness: { min: isNumber(groove.min) ? groove.min : null, max: isNumber(groove.max) ? groove.max : null },
          depositMax: isNumber(wps.depositMax) ? wps.depositMax : undefined, toughness: wps.toughnessRequired ?? false,
          heatInputMax: isNumber(wps.electrical?.heatInputMax) ? wps.electrical.heatInputMax : undefined, fNumber,
          baseMetals: baseMetalsOf(wps),
          ...(d11 ? d11Wps(wps) : {}),
        }),
        pqrs: sameCode.map(p => pqrRecord(p, wps.unit, wps.code)),
      },
    })
    if ('error' in evaluated) {
      findings.push({ met: false, clause: 'rules', text: String(evaluated.error), basis: 'convention', field: null })
      return result(false, null)
    }
    caution = String((evaluated as { caution?: string }).caution ?? '')
    for (const r of (evaluated as unknown as { reasons: { met: boolean, clause: string, text: string, basis: Basis, variable?: string }[] }).reasons) {
      const key = `${r.clause}|${r.text}`
      if (seen.has(key)) continue
      seen.add(key)
      findings.push({ ...r, field: d11 ? d11Field(r) : fieldOf(r.clause) })
    }
    // AWS D1.1: the table's variables not compared go to the signed hand-check statement (never a silent yes).
    for (const r of d11 ? (evaluated as unknown as { byHand: { clause: string, text: string, basis: Basis }[] }).byHand : []) {
      const key = `${r.clause}|${r.text}`
      if (seen.has(key)) continue
      seen.add(key)
      findings.push({ met: false, clause: r.clause, text: r.text, basis: r.basis, field: null, byHand: true, state: 'not-checked' } as SupportFinding)
    }
  }
  if (wps.code === 'asme-ix') findings.push(...unlimitedFindings(wps))
  return result(true, caution)
}

/** The WPS preheat, PWHT and positions as the AWS D1.1 rules read them. */
function d11Wps(wps: SupportWps) {
  return strip({
    preheatMin: isNumber(wps.preheatMin) ? wps.preheatMin : undefined,
    pwht: wps.pwht ? { condition: wps.pwht.required ? 'between' as const : 'none' as const } : undefined,
    positions: wps.positions?.length ? wps.positions : undefined,
  })
}

const d11Fields: Record<string, string> = { 'process': 'process', 'transfer': 'transfer', 'thickness': 'thickness.groove', 'preheat': 'preheatMin', 'pwht': 'pwht', 'positions': 'positions', 'toughness': 'toughnessRequired', 'heat-input': 'electrical.heatInputMax' }
function d11Field(r: { variable?: string }): string | null {
  return (r.variable && d11Fields[r.variable]) ?? null
}

/** The WPS base metals for QW-424.1 (the rules compare them with each PQR's A and B), when both are given. */
function baseMetalsOf(wps: SupportWps) {
  const a = wps.baseMetals?.a?.pNumber?.trim()
  const b = wps.baseMetals?.b?.pNumber?.trim()
  if (!a || !b || !/^\d{1,2}[A-Z]?$/i.test(a) || !/^\d{1,2}[A-Z]?$/i.test(b)) return undefined
  return { a: { pNumber: a }, b: { pNumber: b } }
}

/**
 * Ranges a groove-weld PQR does not limit for a procedure (from memory): QW-202.2(c) lets it qualify fillet welds of
 * all sizes on all base-metal thicknesses, and QW-403 sets no pipe-diameter limit for procedures (QW-452 is for welders).
 */
function unlimitedFindings(wps: SupportWps & { thickness?: { fillet?: Partial<Range> }, diameter?: Partial<Range> }): SupportFinding[] {
  const out: SupportFinding[] = []
  const given = (r?: Partial<Range>) => !!r && (isNumber(r.min) || isNumber(r.max))
  if (given(wps.thickness?.fillet)) {
    out.push({ met: true, clause: 'QW-202.2(c)', basis: 'memory', field: 'thickness.fillet', text: 'Fillet welds: a groove-weld PQR qualifies all fillet sizes on all base-metal thicknesses.' })
  }
  if (given(wps.diameter)) {
    out.push({ met: true, clause: 'QW-403', basis: 'memory', field: 'diameter', text: 'Pipe diameter is not a procedure variable: any diameter the WPS states is within support.' })
  }
  return out
}

/** The findings about one form field (and the fields under it). */
export function findingsFor(check: SupportCheck | null | undefined, field: string): SupportFinding[] {
  if (!check) return []
  return check.violations.filter(f => f.field !== null && (f.field === field || field.startsWith(`${f.field}.`) || f.field.startsWith(`${field}.`)))
}

export type { CodeId }
