import { and, asc, count, desc, eq, ilike, max, or, sql } from 'drizzle-orm'
import { allOf, containsPattern, orderOf, pageOf } from '../utils/list'
import type { ProcedureListQuery } from '../../shared/schemas/list-queries'
import type { Db } from './client'
import { accounts, procedurePqrs, procedures, readings, signatures, welders } from './schema'
import { supportPqrs } from './pqrs'
import { auditorMayReadProcedure } from './projects'
import type { SessionUser } from '../utils/auth'
import { supportCheck } from '#shared/qualification/procedure-support'
import type { ProcedureDraft, ProcedureVariables } from '#shared/schemas/procedure'
import type { Unit } from '#shared/rules/types'

export type ProcedureRow = typeof procedures.$inferSelect

type Loose = Record<string, unknown>
const obj = (v: unknown): Loose => (v && typeof v === 'object' && !Array.isArray(v) ? v as Loose : {})
const num = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? v : null)
const str = (v: unknown) => (typeof v === 'string' && v.trim() !== '' ? v : null)
const range = (v: unknown) => ({ min: num(obj(v).min), max: num(obj(v).max) })
const windowRange = (v: unknown) => ({ ...range(v), setPoint: num(obj(v).setPoint) })

/** A stored WPS as the form's draft, reading older or partial `variables` with empty defaults. */
export function draftOf(row: ProcedureRow, supportingPqrIds: number[]): ProcedureDraft {
  const v = obj(row.variables)
  const bm = obj(v.baseMetals)
  const side = (s: unknown, fallback: string | null) => ({ baseMetalId: num(obj(s).baseMetalId), pNumber: str(obj(s).pNumber) ?? fallback ?? '', groupNumber: num(obj(s).groupNumber) })
  const joints = obj(v.joints)
  const gas = obj(v.gas)
  const el = obj(v.electrical)
  const tech = obj(v.technique)
  const fillers = Array.isArray(v.fillers) ? v.fillers.map(obj) : []
  return {
    number: row.number, title: row.title, code: row.code as ProcedureDraft['code'], edition: row.edition, unit: row.unit as Unit,
    process: row.process as ProcedureDraft['process'], transfer: (row.transfer as ProcedureDraft['transfer']) ?? null, supportingPqrIds,
    baseMetals: { a: side(bm.a, row.pNumberA), b: side(bm.b, row.pNumberB) },
    thickness: { groove: { min: row.thicknessMin, max: row.thicknessMax }, fillet: range(obj(v.thickness).fillet) },
    depositMax: num(v.depositMax),
    diameter: { min: row.diameterMin, max: num(obj(v.diameter).max) },
    joints: {
      type: str(joints.type) ?? '', groove: str(joints.groove), grooveAngle: num(joints.grooveAngle),
      rootOpening: range(joints.rootOpening), rootFace: range(joints.rootFace), backing: str(joints.backing),
    },
    fillers: fillers.map((f, i) => ({
      fillerMetalId: num(f.fillerMetalId), specification: str(f.specification) ?? '', classification: str(f.classification) ?? '',
      fNumber: str(f.fNumber) ?? row.fNumbers[i] ?? row.fNumbers[0] ?? '', aNumber: str(f.aNumber), size: str(f.size),
    })),
    positions: row.positions as ProcedureDraft['positions'],
    progression: (str(v.progression) as ProcedureDraft['progression']) ?? null,
    toughnessRequired: v.toughnessRequired === true,
    preheatMin: num(v.preheatMin), interpassMax: num(v.interpassMax), pwht: str(v.pwht) ?? 'none',
    gas: { composition: str(gas.composition), flow: windowRange(gas.flow) },
    electrical: {
      current: (str(el.current) as ProcedureDraft['electrical']['current']) ?? 'DCEP',
      amps: windowRange(el.amps), volts: windowRange(el.volts), wireFeed: windowRange(el.wireFeed), travelSpeed: windowRange(el.travelSpeed), heatInputMax: num(el.heatInputMax),
    },
    technique: { bead: str(tech.bead) ?? '', ctwd: windowRange(tech.ctwd), cleaning: str(tech.cleaning) },
  }
}

/** The columns of a draft: searchable values in their own columns, the rest in `variables`. */
export function columnsOf(draft: ProcedureDraft) {
  const { number, title, code, edition, unit, process, transfer, supportingPqrIds: _pqrs, ...rest } = draft
  const variables: ProcedureVariables = rest
  return {
    number, title, code, edition, unit, process, transfer,
    pNumberA: draft.baseMetals.a.pNumber, pNumberB: draft.baseMetals.b.pNumber,
    thicknessMin: draft.thickness.groove.min, thicknessMax: draft.thickness.groove.max, diameterMin: draft.diameter.min,
    positions: draft.positions, fNumbers: [...new Set(draft.fillers.map(f => f.fNumber))],
    variables,
  }
}

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
  return { pqrs, check: supportCheck({ ...draft, unit: row.unit as Unit, fillers: draft.fillers }, pqrs) }
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
  const [{ pqrs, check }, signed, revisions, current, [author]] = await Promise.all([
    supportOf(db, row, pqrIds),
    db.select({ id: signatures.id, signerName: signatures.signerName, meaning: signatures.meaning, signedAt: signatures.signedAt, sha256: signatures.sha256, verifyCode: signatures.verifyCode, recordVersion: signatures.recordVersion })
      .from(signatures).where(and(eq(signatures.recordType, 'procedure'), eq(signatures.recordId, row.id))).orderBy(asc(signatures.signedAt)),
    db.select({ id: procedures.id, revision: procedures.revision, status: procedures.status, approvedAt: procedures.approvedAt })
      .from(procedures).where(eq(procedures.number, row.number)).orderBy(desc(procedures.revision)),
    isCurrent(db, row),
    row.createdBy ? db.select({ name: accounts.name }).from(accounts).where(eq(accounts.id, row.createdBy)) : Promise.resolve([]),
  ])
  return {
    procedure: {
      id: row.id, number: row.number, revision: row.revision, title: row.title, code: row.code, edition: row.edition, status: row.status,
      unit: row.unit, process: row.process, transfer: row.transfer, version: row.version, approvedAt: row.approvedAt, createdAt: row.createdAt,
      updatedAt: row.updatedAt, createdBy: author?.name ?? null, current, handCheck: str(obj(row.variables).handCheck),
    },
    draft: draftOf(row, pqrIds),
    pqrs, support: check, signatures: signed, revisions,
  }
}

export async function readingsOf(db: Db, procedureId: number, welderId: number | null) {
  const where = welderId === null ? eq(readings.procedureId, procedureId) : and(eq(readings.procedureId, procedureId), eq(readings.welderId, welderId))
  return db.select({
    id: readings.id, takenAt: readings.takenAt, values: readings.values, outOfWindow: readings.outOfWindow,
    welderId: readings.welderId, welderStamp: welders.stamp, welderName: welders.name, recordedBy: accounts.name,
  }).from(readings).leftJoin(welders, eq(welders.id, readings.welderId)).leftJoin(accounts, eq(accounts.id, readings.recordedBy))
    .where(where).orderBy(desc(readings.takenAt)).limit(200)
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
    query.process && eq(procedures.process, query.process),
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
    edition: procedures.edition, status: procedures.status, unit: procedures.unit, process: procedures.process, transfer: procedures.transfer,
    pNumberA: procedures.pNumberA, pNumberB: procedures.pNumberB, thicknessMin: procedures.thicknessMin, thicknessMax: procedures.thicknessMax,
    positions: procedures.positions, updatedAt: procedures.updatedAt, current,
  }).from(procedures).where(where).orderBy(orderOf(procedures[query.sort], query.dir), procedures.number, procedures.revision).limit(limit).offset(offset),
  () => db.select({ total: count() }).from(procedures).where(where))
}
