import { and, arrayContains, asc, count, eq, ilike, inArray, or } from 'drizzle-orm'
import { alias } from 'drizzle-orm/pg-core'
import { allOf, containsPattern, orderOf, pageOf } from '../utils/list'
import type { PqrListQuery } from '../../shared/schemas/list-queries'
import type { Db } from './client'
import { baseMetals, fillerMetals, pqrBendSpecimens, pqrs, pqrTensileSpecimens, procedurePqrs, procedures, projectProcedures, signatures, welders } from './schema'
import { grantedProjectIds } from './projects'
import type { SessionUser } from '../utils/auth'
import { missing } from '../../shared/types/outcome'
import { evaluate } from '#shared/rules'
import { bendAcceptance } from '#shared/qualification/bend-acceptance'
import { pqrQualifies, type SupportPqr } from '#shared/qualification/procedure-support'
import { tensileOf } from '#shared/qualification/tensile-acceptance'
import { psiToMpa, totalDeposit, type PqrActuals, type PqrLayer, type PqrResults } from '#shared/schemas/pqr'
import type { CodeId, Unit } from '#shared/rules/types'

import { pqrColumns, pqrDraftOf, pqrLayersOf, wpqrPieceOf, type PqrRow } from './pqr-columns'
import { isoPieceOf, type IsoWpqrRecord } from '#shared/qualification/iso-procedure-support'
import { wpqrRanges, type WpqrRanges } from '#shared/rules/iso-15614-1'
import { RuleRefusal } from '#shared/rules/refusal'
import { isIsoProcedureCode } from '#shared/vocabulary/records'

export { pqrColumns, pqrDraftOf, pqrLayersOf, type PqrRow }

/** Heat input of one layer: as recorded, or from volts, amps and travel speed (QW-409.1(a) for ASME). */
export function layerHeatInput(row: Pick<PqrRow, 'code' | 'unit' | 'edition'>, layer: Pick<PqrLayer, 'heatInput' | 'volts' | 'amps' | 'travelSpeed'>): number | null {
  if (typeof layer.heatInput === 'number') return layer.heatInput
  if (typeof layer.volts !== 'number' || typeof layer.amps !== 'number' || typeof layer.travelSpeed !== 'number') return null
  const result = evaluate({ code: row.code, check: 'heat-input', unit: row.unit, edition: row.edition, input: { volts: layer.volts, amps: layer.amps, travelSpeed: layer.travelSpeed } })
  return 'error' in result ? null : (result as unknown as { heatInput: number }).heatInput
}

/** Heat input of the coupon's first layer (a single-process PQR: of the coupon). */
export function pqrHeatInput(row: Pick<PqrRow, 'code' | 'unit' | 'edition' | 'actuals' | 'layers' | 'process' | 'transfer' | 'fillerMetalId' | 'depositThickness'>): number | null {
  const first = pqrLayersOf(row)[0]
  return first ? layerHeatInput(row, first) : null
}

/**
 * The PQRs as the support check reads them: one entry per process welded on the coupon, each with its own deposit,
 * filler F-No. and heat input (QW-200.4(a): each process's deposit is qualified by that process's deposit on the PQR),
 * sharing the coupon thickness, base-metal P-No. and whether every result passed.
 */
export async function supportPqrs(db: Db, ids: number[]): Promise<(SupportPqr & { pNumberB: string | null })[]> {
  if (!ids.length) return []
  const baseB = alias(baseMetals, 'base_b')
  const rows = await db.select({ pqr: pqrs, pNumber: baseMetals.pNumber, pNumberB: baseB.pNumber }).from(pqrs)
    .leftJoin(baseMetals, eq(baseMetals.id, pqrs.baseMetalId)).leftJoin(baseB, eq(baseB.id, pqrs.baseMetalBId))
    .where(inArray(pqrs.id, ids)).orderBy(asc(pqrs.number))
  const [tensile, bends, fillers] = await Promise.all([
    db.select({ pqrId: pqrTensileSpecimens.pqrId, accepted: pqrTensileSpecimens.accepted }).from(pqrTensileSpecimens).where(inArray(pqrTensileSpecimens.pqrId, ids)),
    db.select({ pqrId: pqrBendSpecimens.pqrId, accepted: pqrBendSpecimens.accepted }).from(pqrBendSpecimens).where(inArray(pqrBendSpecimens.pqrId, ids)),
    db.select({ id: fillerMetals.id, fNumber: fillerMetals.fNumber }).from(fillerMetals),
  ])
  return rows.flatMap(({ pqr, pNumber, pNumberB }) => {
    const t = tensile.filter(s => s.pqrId === pqr.id)
    const b = bends.filter(s => s.pqrId === pqr.id)
    const layers = pqrLayersOf(pqr)
    const byProcess = [...new Set(layers.map(l => l.process))].map(process => layers.filter(l => l.process === process))
    return byProcess.map((group) => {
      const first = group[0]!
      const deposit = totalDeposit(group)
      const actuals = (pqr.actuals ?? {}) as PqrActuals
      return {
        id: pqr.id, number: byProcess.length > 1 ? `${pqr.number} (${first.process})` : pqr.number, code: pqr.code, edition: pqr.edition,
        unit: pqr.unit as Unit, process: first.process, transfer: first.transfer,
        couponThickness: pqr.couponThickness, depositThickness: deposit, toughnessTested: pqr.toughnessRequired,
        heatInput: layerHeatInput(pqr, first), fNumber: fillers.find(f => f.id === first.fillerMetalId)?.fNumber ?? null,
        pNumber: pNumber ?? null, pNumberB: pNumberB ?? pNumber ?? null, status: pqr.status,
        resultsPass: t.length > 0 && b.length > 0 && t.every(s => s.accepted) && b.every(s => s.accepted),
        preheat: actuals.preheat ?? null, pwht: actuals.pwht ?? null, pwhtTemperature: actuals.pwhtTemperature ?? null, testPosition: actuals.position ?? null,
        iso: isoWpqrOf(pqr, layers),
      }
    })
  })
}

/** An ISO 15614-1 WPQR as the ISO support check reads it (mm and °C records only; null for every other PQR). */
export function isoWpqrOf(pqr: PqrRow, layers: PqrLayer[]): IsoWpqrRecord | null {
  const piece = wpqrPieceOf(pqr)
  if (!piece || !isIsoProcedureCode(pqr.code) || pqr.unit !== 'mm') return null
  const a = (pqr.actuals ?? {}) as PqrActuals
  const text = a.pwht?.trim() ?? ''
  const none = /^(none|no|n\/?a|as[- ]?welded|-)$/i.test(text)
  const hasTemperature = typeof a.pwhtTemperature === 'number'
  const pwht = hasTemperature
    ? { done: true, temperature: a.pwhtTemperature!, hours: a.pwhtHours ?? null }
    : none
      ? { done: false, temperature: null, hours: null }
      : text ? { done: true, temperature: null, hours: a.pwhtHours ?? null } : null
  return {
    processes: layers.map(l => l.process), thickness: pqr.couponThickness, form: piece.form, outsideDiameter: piece.outsideDiameter,
    runs: piece.runs, positions: piece.positions, materialGroup: piece.materialGroup,
    heatInputs: layers.map(l => layerHeatInput(pqr, l)), impactTested: pqr.toughnessRequired, hardnessTested: piece.hardnessTested,
    preheat: a.preheat ?? null, interpass: a.interpass ?? null, pwht, filler: piece.fillerDesignation, fillerGroup: piece.fillerGroup,
  }
}

export async function findPqr(db: Db, id: number) {
  const [row] = await db.select().from(pqrs).where(eq(pqrs.id, id)).limit(1)
  return row ?? null
}

/** One PQR with its metals, results, signatures, the procedures it supports and the ranges it qualifies. */
export async function pqrDetail(db: Db, id: number) {
  const row = await findPqr(db, id)
  if (!row) return missing('PQR')
  const layers = pqrLayersOf(row)
  const fillerIds = [...new Set(layers.map(l => l.fillerMetalId).filter((f): f is number => f !== null))]
  const [[base], [baseB], [welder], fillers, tensile, bends, signed, supports, support] = await Promise.all([
    row.baseMetalId ? db.select().from(baseMetals).where(eq(baseMetals.id, row.baseMetalId)) : Promise.resolve([]),
    row.baseMetalBId ? db.select().from(baseMetals).where(eq(baseMetals.id, row.baseMetalBId)) : Promise.resolve([]),
    row.welderId ? db.select({ id: welders.id, name: welders.name, stamp: welders.stamp }).from(welders).where(eq(welders.id, row.welderId)) : Promise.resolve([]),
    fillerIds.length ? db.select().from(fillerMetals).where(inArray(fillerMetals.id, fillerIds)) : Promise.resolve([]),
    db.select().from(pqrTensileSpecimens).where(eq(pqrTensileSpecimens.pqrId, id)).orderBy(asc(pqrTensileSpecimens.id)),
    db.select().from(pqrBendSpecimens).where(eq(pqrBendSpecimens.pqrId, id)).orderBy(asc(pqrBendSpecimens.id)),
    db.select({ id: signatures.id, signerName: signatures.signerName, meaning: signatures.meaning, signedAt: signatures.signedAt, sha256: signatures.sha256, verifyCode: signatures.verifyCode, recordVersion: signatures.recordVersion })
      .from(signatures).where(and(eq(signatures.recordType, 'pqr'), eq(signatures.recordId, id))).orderBy(asc(signatures.signedAt)),
    db.select({ id: procedures.id, number: procedures.number, revision: procedures.revision, status: procedures.status, title: procedures.title })
      .from(procedurePqrs).innerJoin(procedures, eq(procedures.id, procedurePqrs.procedureId)).where(eq(procedurePqrs.pqrId, id))
      .orderBy(asc(procedures.number), asc(procedures.revision)),
    supportPqrs(db, [id]),
  ])
  // What the coupon qualifies, per process (each with its own deposit)
  const qualifies = support.map(s => pqrQualifies(s, { code: row.code, edition: row.edition, unit: row.unit as Unit }))
  const specimensNeeded = specimensRequired(row)
  return {
    pqr: { ...row, actuals: (row.actuals ?? {}) as PqrActuals, toughness: row.toughness as PqrResults['toughness'], unit: row.unit as Unit, heatInput: pqrHeatInput(row) },
    draft: pqrDraftOf(row),
    layers: layers.map(l => ({ ...l, heatInput: layerHeatInput(row, l), filler: fillers.find(f => f.id === l.fillerMetalId) ?? null })),
    baseMetal: base ?? null, baseMetalB: baseB ?? null, welder: welder ?? null, fillerMetal: fillers.find(f => f.id === row.fillerMetalId) ?? fillers[0] ?? null,
    tensile, bends, signatures: signed, procedures: supports,
    qualifies: qualifies[0] ?? null, qualifiesByProcess: qualifies, specimensNeeded, resultsPass: support[0]?.resultsPass ?? false,
    minimumStrength: base?.minTensilePsi ? minimumStrengthOf(base.minTensilePsi, row.unit as Unit) : null,
    iso: isoRangesOf(row, layers),
  }
}

/** An ISO 15614-1 WPQR's range of qualification (clause 8, from memory), or why it cannot be told; null for other PQRs. */
function isoRangesOf(row: PqrRow, layers: PqrLayer[]): { ranges: WpqrRanges | null, error: string | null } | null {
  if (!isIsoProcedureCode(row.code)) return null
  const record = isoWpqrOf(row, layers)
  const piece = record ? isoPieceOf({ iso: record }) : null
  if (!piece) return { ranges: null, error: 'Cannot tell: record the test piece (positions welded, plate or pipe) in mm and °C.' }
  try {
    return { ranges: wpqrRanges(piece), error: null }
  }
  catch (error) {
    if (error instanceof RuleRefusal) return { ranges: null, error: `Cannot tell: ${error.message}` }
    throw error
  }
}

/** The base metal's specified minimum in the record's stress unit: psi, or MPa for a millimetre record. */
export function minimumStrengthOf(psi: number, unit: Unit) {
  return unit === 'in' ? psi : psiToMpa(psi)
}

/** Specimens Table QW-451.1 asks of this coupon (ASME IX); null when the code carries no procedure table here. */
export function specimensRequired(row: Pick<PqrRow, 'code' | 'edition' | 'unit' | 'process' | 'transfer' | 'couponThickness' | 'depositThickness'>) {
  const result = evaluate({
    code: row.code, check: 'procedure-ranges', unit: row.unit, edition: row.edition,
    input: Object.fromEntries(Object.entries({ process: row.process, transfer: row.transfer ?? undefined, couponThickness: row.couponThickness, depositThickness: row.depositThickness ?? undefined }).filter(([, v]) => v !== undefined)),
  })
  if ('error' in result) return null
  return (result as unknown as { specimens: { tension: number, face: number, root: number, side: number } }).specimens
}

/** The tensile and bend rows as the rules judge them: strength from load and area, bends by the code's bend rule. */
export function judgedResults(row: Pick<PqrRow, 'id' | 'code' | 'unit'>, results: PqrResults, minimumStrength: number) {
  const unit = row.unit as Unit
  // ISO 15614-1 WPQRs: tensile strength against the parent metal's minimum and bends to ISO 5173 with the 3 mm open
  // imperfection limit (7.4.2, from memory), the same judgement the ISO 9606-1 rules carry.
  const code = (isIsoProcedureCode(row.code) ? 'iso-9606-1' : row.code) as CodeId
  const tensile = results.tensile.map((s) => {
    const judged = tensileOf({ width: s.width, thickness: s.thickness, load: s.load, minimumStrength, unit, code })
    return { ...s, pqrId: row.id, strength: judged.strength, accepted: judged.accepted }
  })
  const bends = results.bends.map(b => ({
    ...b, pqrId: row.id, accepted: bendAcceptance(code, unit, [{ type: b.type, largestIndication: b.largestIndication, atCorner: b.atCorner }]).accepted,
  }))
  return { tensile, bends }
}

export { pqrBendSpecimens, pqrTensileSpecimens }

/**
 * Who may read a PQR, its sheet and its files: staff any; an auditor those supporting a WPS on a granted project;
 * a welder none. False also when there is no such PQR.
 */
export async function mayReadPqr(db: Db, user: SessionUser, id: number) {
  const [row] = await db.select({ id: pqrs.id }).from(pqrs).where(eq(pqrs.id, id))
  if (!row) return false
  if (user.role === 'supervisor' || user.role === 'inspector') return true
  if (user.role !== 'auditor') return false
  const granted = await grantedProjectIds(db, user.id)
  if (!granted.length) return false
  const hit = await db.select({ id: procedurePqrs.pqrId }).from(procedurePqrs)
    .innerJoin(projectProcedures, eq(projectProcedures.procedureId, procedurePqrs.procedureId))
    .where(and(eq(procedurePqrs.pqrId, id), inArray(projectProcedures.projectId, granted))).limit(1)
  return hit.length > 0
}

/** The PQR list with what the support check needs of each (staff). */
export async function listPqrs(db: Db, query: PqrListQuery) {
  const where = allOf([
    query.status && eq(pqrs.status, query.status),
    query.process && or(eq(pqrs.process, query.process), arrayContains(pqrs.processes, [query.process])),
    query.code && eq(pqrs.code, query.code),
    query.pNumber && eq(baseMetals.pNumber, query.pNumber),
    query.q && or(ilike(pqrs.number, containsPattern(query.q)), ilike(pqrs.labReportNumber, containsPattern(query.q))),
  ])
  const page = await pageOf(query, ({ limit, offset }) => db.select({
    id: pqrs.id, number: pqrs.number, testDate: pqrs.testDate, code: pqrs.code, edition: pqrs.edition, unit: pqrs.unit, process: pqrs.process,
    transfer: pqrs.transfer, processes: pqrs.processes, couponThickness: pqrs.couponThickness, status: pqrs.status, labReportNumber: pqrs.labReportNumber,
    baseMetalId: pqrs.baseMetalId, baseMetal: baseMetals.specification, baseGrade: baseMetals.grade, pNumber: baseMetals.pNumber, groupNumber: baseMetals.groupNumber,
    fillerMetalId: pqrs.fillerMetalId, fillerSpecification: fillerMetals.specification, filler: fillerMetals.classification, fNumber: fillerMetals.fNumber, aNumber: fillerMetals.aNumber,
  }).from(pqrs).leftJoin(baseMetals, eq(baseMetals.id, pqrs.baseMetalId)).leftJoin(fillerMetals, eq(fillerMetals.id, pqrs.fillerMetalId))
    .where(where).orderBy(orderOf(pqrs[query.sort], query.dir), asc(pqrs.number)).limit(limit).offset(offset),
  () => db.select({ total: count() }).from(pqrs).leftJoin(baseMetals, eq(baseMetals.id, pqrs.baseMetalId)).where(where))
  const support = await supportPqrs(db, page.items.map(r => r.id))
  // One support entry per process of the coupon (a combination PQR has several)
  return { ...page, items: page.items.map(r => ({ ...r, support: support.find(s => s.id === r.id)!, supports: support.filter(s => s.id === r.id) })) }
}
