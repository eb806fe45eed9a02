import { and, arrayContains, asc, count, desc, eq, ilike, inArray, max, or, sql } from 'drizzle-orm'
import { allOf, containsPattern, orderOf, pageOf } from '../utils/list'
import type { ProcedureListQuery } from '../../shared/schemas/list-queries'
import type { Db } from './client'
import { accounts, baseMetals, procedurePqrs, procedures, readings, signatures, welders } from './schema'
import { equipmentOfReadings } from './equipment'
import { supportPqrs } from './pqrs'
import { auditorMayReadProcedure } from './projects'
import type { SessionUser } from '../utils/auth'
import { missing } from '../../shared/types/outcome'
import { layeredSupport } from '#shared/qualification/layer-support'
import type { ReadingValues } from '#shared/schemas/reading'
import { prequalifiedOfDraft } from '#shared/qualification/prequalified-wps'

import { columnsOf, draftOf, layersOf, obj, str, type ProcedureRow } from './procedure-columns'

export { columnsOf, draftOf, layeredSupport, layersOf, type ProcedureRow }

export async function findProcedure(db: Db, id: number) {
  const [row] = await db.select().from(procedures).where(eq(procedures.id, id)).limit(1)
  return row ?? null
}

export async function supportingPqrIdsOf(db: Db, id: number) {
  const rows = await db.select({ pqrId: procedurePqrs.pqrId }).from(procedurePqrs).where(eq(procedurePqrs.procedureId, id)).orderBy(asc(procedurePqrs.pqrId))
  return rows.map(r => r.pqrId)
}

/** The live support check of a stored WPS against its supporting PQRs. */
export async function supportOf(db: Db, row: ProcedureRow, pqrIds: number[]) {
  const draft = draftOf(row, pqrIds)
  const pqrs = await supportPqrs(db, pqrIds)
  return { pqrs, check: layeredSupport(draft, pqrs) }
}

/** The AWS D1.1 prequalification check of a stored WPS marked prequalified (null otherwise), its base metals read from the catalogue. */
export async function prequalifiedOf(db: Db, row: ProcedureRow) {
  if (!row.prequalified || row.code !== 'aws-d1.1') return null
  const draft = draftOf(row, [])
  const ids = [draft.baseMetals.a.baseMetalId, draft.baseMetals.b.baseMetalId].filter((id): id is number => id !== null)
  const catalogue = ids.length ? await db.select({ id: baseMetals.id, specification: baseMetals.specification, grade: baseMetals.grade }).from(baseMetals).where(inArray(baseMetals.id, ids)) : []
  return prequalifiedOfDraft(draft, catalogue)
}

/** Whether this row is the current revision of its number: the highest approved one. */
export async function isCurrent(db: Db, row: ProcedureRow) {
  if (row.status !== 'approved') return false
  const [top] = await db.select({ revision: max(procedures.revision) }).from(procedures)
    .where(and(eq(procedures.number, row.number), eq(procedures.status, 'approved')))
  return top?.revision === row.revision
}

/** One WPS with its draft variables, supporting PQRs, signatures, revisions and the live support check. */
export async function procedureDetail(db: Db, row: ProcedureRow) {
  const pqrIds = await supportingPqrIdsOf(db, row.id)
  const [{ pqrs, check }, signed, revisions, current, [author], prequalified] = await Promise.all([
    supportOf(db, row, pqrIds),
    db.select({ id: signatures.id, signerName: signatures.signerName, meaning: signatures.meaning, signedAt: signatures.signedAt, sha256: signatures.sha256, verifyCode: signatures.verifyCode, recordVersion: signatures.recordVersion })
      .from(signatures).where(and(eq(signatures.recordType, 'procedure'), eq(signatures.recordId, row.id))).orderBy(asc(signatures.signedAt)),
    db.select({ id: procedures.id, revision: procedures.revision, status: procedures.status, approvedAt: procedures.approvedAt })
      .from(procedures).where(eq(procedures.number, row.number)).orderBy(desc(procedures.revision)),
    isCurrent(db, row),
    row.createdBy ? db.select({ name: accounts.name }).from(accounts).where(eq(accounts.id, row.createdBy)) : Promise.resolve([]),
    prequalifiedOf(db, row),
  ])
  return {
    procedure: {
      id: row.id, number: row.number, revision: row.revision, title: row.title, code: row.code, edition: row.edition, status: row.status,
      unit: row.unit, process: row.process, transfer: row.transfer, version: row.version, approvedAt: row.approvedAt, createdAt: row.createdAt,
      updatedAt: row.updatedAt, createdBy: author?.name ?? null, current, handCheck: str(obj(row.variables).handCheck),
    },
    draft: draftOf(row, pqrIds),
    pqrs, support: check, signatures: signed, revisions, prequalified,
  }
}

/** One WPS as its page reads it; a welder reads approved revisions only, and not the PQR records behind them. */
export async function procedurePage(db: Db, user: SessionUser, id: number) {
  const row = await findProcedure(db, id)
  if (!row || (user.role === 'welder' && row.status !== 'approved')) return missing('Procedure')
  const detail = await procedureDetail(db, row)
  if (user.role === 'welder') return { ...detail, pqrs: detail.pqrs.map(p => ({ id: p.id, number: p.number, status: p.status })) }
  return detail
}

export async function readingsOf(db: Db, procedureId: number, welderId: number | null) {
  const where = welderId === null ? eq(readings.procedureId, procedureId) : and(eq(readings.procedureId, procedureId), eq(readings.welderId, welderId))
  const rows = await db.select({
    id: readings.id, takenAt: readings.takenAt, values: readings.values, outOfWindow: readings.outOfWindow, calibrationFlag: readings.calibrationFlag,
    welderId: readings.welderId, welderStamp: welders.stamp, welderName: welders.name, recordedBy: accounts.name,
  }).from(readings).leftJoin(welders, eq(welders.id, readings.welderId)).leftJoin(accounts, eq(accounts.id, readings.recordedBy))
    .where(where).orderBy(desc(readings.takenAt)).limit(200)
  const used = await equipmentOfReadings(db, rows.map(r => r.id))
  return rows.map(r => ({ ...r, values: r.values as ReadingValues, equipment: used.get(r.id) ?? [] }))
}

/**
 * Who may read a WPS, its sheet and its files: staff any; a welder approved revisions; an auditor those on a granted
 * project. False also when there is no such WPS.
 */
export async function mayReadProcedure(db: Db, user: SessionUser, id: number) {
  const [row] = await db.select({ status: procedures.status }).from(procedures).where(eq(procedures.id, id))
  if (!row) return false
  if (user.role === 'supervisor' || user.role === 'inspector') return true
  if (user.role === 'welder') return row.status === 'approved'
  return auditorMayReadProcedure(db, user, id)
}

/** The WPS list; a welder sees approved revisions only. `current` marks the highest approved revision of a number. */
export async function listProcedures(db: Db, user: SessionUser, query: ProcedureListQuery) {
  const where = allOf([
    user.role === 'welder' && eq(procedures.status, 'approved'),
    query.status && eq(procedures.status, query.status),
    // A WPS with a layer of the process (the process column is its first layer's)
    query.process && or(eq(procedures.process, query.process), arrayContains(procedures.processes, [query.process])),
    query.code && eq(procedures.code, query.code),
    query.pNumber && or(eq(procedures.pNumberA, query.pNumber), eq(procedures.pNumberB, query.pNumber)),
    query.thickness && sql`${procedures.thicknessMin} <= ${query.thickness} and ${procedures.thicknessMax} >= ${query.thickness}`,
    query.q && or(ilike(procedures.number, containsPattern(query.q)), ilike(procedures.title, containsPattern(query.q))),
  ])
  // The outer row is named in full: drizzle prints columns of a one-table query unqualified, which inside the
  // subquery would bind to p2.
  const current = sql<boolean>`${procedures.status} = 'approved' and ${procedures.revision} = (
    select max(p2.revision) from procedures p2 where p2.number = "procedures"."number" and p2.status = 'approved')`
  return pageOf(query, ({ limit, offset }) => db.select({
    id: procedures.id, number: procedures.number, revision: procedures.revision, title: procedures.title, code: procedures.code,
    edition: procedures.edition, status: procedures.status, unit: procedures.unit, process: procedures.process, processes: procedures.processes, transfer: procedures.transfer,
    pNumberA: procedures.pNumberA, pNumberB: procedures.pNumberB, thicknessMin: procedures.thicknessMin, thicknessMax: procedures.thicknessMax,
    positions: procedures.positions, updatedAt: procedures.updatedAt, current,
  }).from(procedures).where(where).orderBy(orderOf(procedures[query.sort], query.dir), procedures.number, procedures.revision).limit(limit).offset(offset),
  () => db.select({ total: count() }).from(procedures).where(where))
}
