import { and, asc, desc, eq, inArray, lte, or } from 'drizzle-orm'
import type { Db } from './client'
import {
  accounts, attachments, baseMetals, continuityEntries, customers, fillerMetals, isoValidityRecords, issuedSheets, pqrBendSpecimens, pqrs, pqrTensileSpecimens, procedurePqrs,
  procedures, projectProcedures, projects, projectWelders, qualificationRevocations, shopSettings, signatures, welders, welderTestBends, welderTests,
} from './schema'
import { contentFormatOf, contentHash, newVerifyCode, type SignedRecordType } from './signing'
import { pqrLayersOf, supportPqrs } from './pqrs'
import { prequalifiedOf } from './procedures'
import type { SessionUser } from '../utils/auth'
import type { SheetSignature } from '../sheets/model'
import { todayIso } from '../utils/today'
import { jointCountOf } from './joints'

// Everything the sheets, logs, packets and the verification page read: the builders in server/sheets/ are given
// these rows and only lay them out.

export async function shopName(db: Db): Promise<string> {
  const [row] = await db.select({ name: shopSettings.name }).from(shopSettings).where(eq(shopSettings.id, 1))
  return row?.name ?? useRuntimeConfig().public.shopName
}

export interface SignatureSet {
  signatures: SheetSignature[]
  latest: { sha256: string, verifyCode: string } | null
  /** Hash of the content as stored now */
  current: string
}

export async function signaturesOf(db: Db, type: SignedRecordType, id: number): Promise<SignatureSet> {
  const rows = await db.select().from(signatures)
    .where(and(eq(signatures.recordType, type), eq(signatures.recordId, id)))
    .orderBy(asc(signatures.signedAt), asc(signatures.id))
  const last = rows.at(-1)
  // Compared with the latest signature, in the content format that signature was made with
  const current = (await contentHash(db, type, id, contentFormatOf(last?.contentFormat ?? 2))) ?? ''
  return {
    signatures: rows.map(s => ({ meaning: s.meaning, name: s.signerName, at: s.signedAt.toISOString(), version: s.recordVersion })),
    latest: last ? { sha256: last.sha256, verifyCode: last.verifyCode } : null,
    current,
  }
}

export async function loadProcedure(db: Db, id: number) {
  const [row] = await db.select().from(procedures).where(eq(procedures.id, id))
  if (!row) return null
  const support = await db.select().from(procedurePqrs).innerJoin(pqrs, eq(pqrs.id, procedurePqrs.pqrId))
    .leftJoin(fillerMetals, eq(fillerMetals.id, pqrs.fillerMetalId))
    .where(eq(procedurePqrs.procedureId, id)).orderBy(asc(pqrs.number))
  const later = await db.select({ revision: procedures.revision, status: procedures.status }).from(procedures)
    .where(and(eq(procedures.number, row.number))).orderBy(desc(procedures.revision))
  const fillerCatalogue = await db.select().from(fillerMetals)
  return {
    procedure: row,
    support: await supportPqrs(db, support.map(s => s.pqrs.id)),
    pqrs: support.map(s => ({ ...s.pqrs, fNumber: s.filler_metals?.fNumber ?? null })),
    supersededBy: later.find(l => l.revision > row.revision && l.status !== 'draft')?.revision ?? null,
    fillerCatalogue,
    signed: await signaturesOf(db, 'procedure', id),
    prequalified: await prequalifiedOf(db, row),
  }
}
export type ProcedureRecord = NonNullable<Awaited<ReturnType<typeof loadProcedure>>>

export async function loadPqr(db: Db, id: number) {
  const [row] = await db.select().from(pqrs).where(eq(pqrs.id, id))
  if (!row) return null
  const [base] = row.baseMetalId ? await db.select().from(baseMetals).where(eq(baseMetals.id, row.baseMetalId)) : []
  const [baseB] = row.baseMetalBId ? await db.select().from(baseMetals).where(eq(baseMetals.id, row.baseMetalBId)) : []
  const [coupon] = row.welderId ? await db.select({ name: welders.name, stamp: welders.stamp }).from(welders).where(eq(welders.id, row.welderId)) : []
  const layers = pqrLayersOf(row)
  const fillerIds = [...new Set([row.fillerMetalId, ...layers.map(l => l.fillerMetalId)].filter((f): f is number => f !== null))]
  const fillers = fillerIds.length ? await db.select().from(fillerMetals).where(inArray(fillerMetals.id, fillerIds)) : []
  const filler = fillers.find(f => f.id === row.fillerMetalId)
  const [tensile, bends, supports] = await Promise.all([
    db.select().from(pqrTensileSpecimens).where(eq(pqrTensileSpecimens.pqrId, id)).orderBy(asc(pqrTensileSpecimens.id)),
    db.select().from(pqrBendSpecimens).where(eq(pqrBendSpecimens.pqrId, id)).orderBy(asc(pqrBendSpecimens.id)),
    db.select({ number: procedures.number, revision: procedures.revision, status: procedures.status }).from(procedurePqrs)
      .innerJoin(procedures, eq(procedures.id, procedurePqrs.procedureId)).where(eq(procedurePqrs.pqrId, id))
      .orderBy(asc(procedures.number), asc(procedures.revision)),
  ])
  return {
    pqr: row, base: base ?? null, baseB: baseB ?? null, welder: coupon ?? null, filler: filler ?? null,
    layers: layers.map(l => ({ ...l, filler: fillers.find(f => f.id === l.fillerMetalId) ?? null })),
    tensile, bends, supports, signed: await signaturesOf(db, 'pqr', id),
  }
}
export type PqrRecord = NonNullable<Awaited<ReturnType<typeof loadPqr>>>

export async function loadWelderTest(db: Db, id: number) {
  const [row] = await db.select().from(welderTests).innerJoin(welders, eq(welders.id, welderTests.welderId)).where(eq(welderTests.id, id))
  if (!row) return null
  const test = row.welder_tests
  const [procedure] = test.procedureId
    ? await db.select({ number: procedures.number, revision: procedures.revision }).from(procedures).where(eq(procedures.id, test.procedureId))
    : []
  const [inspector] = test.inspectorId
    ? await db.select({ name: accounts.name }).from(accounts).where(eq(accounts.id, test.inspectorId))
    : []
  const bends = await db.select().from(welderTestBends).where(eq(welderTestBends.testId, id)).orderBy(asc(welderTestBends.id))
  // ISO 9606-1: the signed 9.2 confirmations and 9.3 b) records, for the certificate
  const isoRecords = test.code === 'iso-9606-1' ? await db.select().from(isoValidityRecords).where(eq(isoValidityRecords.testId, id)).orderBy(asc(isoValidityRecords.on), asc(isoValidityRecords.id)) : []
  return { test, welder: row.welders, procedure: procedure ?? null, inspector: inspector?.name ?? null, bends, isoRecords, signed: await signaturesOf(db, 'welder-test', id) }
}
export type WelderTestRecord = NonNullable<Awaited<ReturnType<typeof loadWelderTest>>>

/** Procedure ids whose sheets a project's packet carries, with the PQRs behind them. */
export async function pqrIdsOf(db: Db, procedureIds: number[]) {
  if (!procedureIds.length) return []
  const rows = await db.select({ procedureId: procedurePqrs.procedureId, pqrId: procedurePqrs.pqrId, number: pqrs.number })
    .from(procedurePqrs).innerJoin(pqrs, eq(pqrs.id, procedurePqrs.pqrId))
    .where(inArray(procedurePqrs.procedureId, procedureIds)).orderBy(asc(pqrs.number))
  return rows
}

/** A certified test as continuity reads it; `processes` lists every process of a combination coupon (each counts). */
export interface CertifiedTest { id: number, process: string, processes?: string[] | null, qualifiedAs?: string, code: string, edition: string, testDate: string, procedure: string | null }

export async function loadCertifiedTests(db: Db, welderId: number, upTo: string): Promise<CertifiedTest[]> {
  const rows = await db.select({
    id: welderTests.id, process: welderTests.process, processes: welderTests.processes, qualifiedAs: welderTests.qualifiedAs, code: welderTests.code, edition: welderTests.edition, testDate: welderTests.testDate,
    number: procedures.number, revision: procedures.revision,
  }).from(welderTests).leftJoin(procedures, eq(procedures.id, welderTests.procedureId))
    .where(and(eq(welderTests.welderId, welderId), eq(welderTests.status, 'certified'), lte(welderTests.testDate, upTo)))
    .orderBy(asc(welderTests.testDate), asc(welderTests.id))
  return rows.map(r => ({ ...r, procedure: r.number === null ? null : `${r.number} rev. ${r.revision}` }))
}

/** Every logged use up to the end of the period: the chain of continuity needs the uses before it starts too. */
export async function loadUses(db: Db, welderId: number, upTo: string) {
  return db.select({
    id: continuityEntries.id, process: continuityEntries.process, weldedOn: continuityEntries.weldedOn,
    reference: continuityEntries.reference, recordedBy: accounts.name,
  }).from(continuityEntries).leftJoin(accounts, eq(accounts.id, continuityEntries.recordedBy))
    .where(and(eq(continuityEntries.welderId, welderId), lte(continuityEntries.weldedOn, upTo)))
    .orderBy(asc(continuityEntries.weldedOn), asc(continuityEntries.id))
}

/** A welder's revocations made up to the end of a period (QW-322.1(b)), with the name of who revoked each. */
export async function loadRevocations(db: Db, welderId: number, upTo: string) {
  return db.select({
    id: qualificationRevocations.id, process: qualificationRevocations.process, revokedOn: qualificationRevocations.revokedOn,
    reason: qualificationRevocations.reason, revokedBy: accounts.name, basisTestId: qualificationRevocations.basisTestId,
  }).from(qualificationRevocations).innerJoin(accounts, eq(accounts.id, qualificationRevocations.revokedBy))
    .where(and(eq(qualificationRevocations.welderId, welderId), lte(qualificationRevocations.revokedOn, upTo)))
}

export async function welderOf(db: Db, welderId: number) {
  const [welder] = await db.select().from(welders).where(eq(welders.id, welderId))
  return welder
}

/** The first day the welder has anything on record (a test or a logged use), for a log "from the start". */
export async function firstRecordDay(db: Db, welderId: number): Promise<string | null> {
  const [test] = await db.select({ day: welderTests.testDate }).from(welderTests).where(eq(welderTests.welderId, welderId)).orderBy(asc(welderTests.testDate)).limit(1)
  const [use] = await db.select({ day: continuityEntries.weldedOn }).from(continuityEntries).where(eq(continuityEntries.welderId, welderId)).orderBy(asc(continuityEntries.weldedOn)).limit(1)
  const days = [test?.day, use?.day].filter((d): d is string => !!d).sort()
  return days[0] ?? null
}

/**
 * The issue of a continuity log with this content: the same welder, period and content keep one code; a changed log
 * gets a new one (the old code then verifies as changed).
 */
export async function issueContinuityLog(db: Db, welderId: number, period: { from: string, to: string }, sha256: string, user: Pick<SessionUser, 'id' | 'name'>) {
  const match = and(eq(issuedSheets.kind, 'continuity-log'), eq(issuedSheets.welderId, welderId), eq(issuedSheets.periodFrom, period.from),
    eq(issuedSheets.periodTo, period.to), eq(issuedSheets.sha256, sha256))
  let [issue] = await db.select().from(issuedSheets).where(match).limit(1)
  if (!issue) {
    const code = await unusedCode(db)
    ;[issue] = await db.insert(issuedSheets).values({
      kind: 'continuity-log', welderId, periodFrom: period.from, periodTo: period.to, sha256, verifyCode: code,
      issuedBy: user.id, issuerName: user.name,
    }).onConflictDoNothing().returning()
    if (!issue) [issue] = await db.select().from(issuedSheets).where(match).limit(1)
  }
  return issue!
}

async function unusedCode(db: Db) {
  for (;;) {
    const code = newVerifyCode()
    const [a] = await db.select({ id: signatures.id }).from(signatures).where(eq(signatures.verifyCode, code)).limit(1)
    const [b] = await db.select({ id: issuedSheets.id }).from(issuedSheets).where(eq(issuedSheets.verifyCode, code)).limit(1)
    if (!a && !b) return code
  }
}

/** A project's start and end (end null while it is open). */
export async function projectDates(db: Db, projectId: number) {
  const [p] = await db.select({ startsOn: projects.startsOn, endsOn: projects.endsOn }).from(projects).where(eq(projects.id, projectId))
  return p
}

/** The period a project's sheets cover: its start to its end, or to today while it is open. */
export async function projectPeriod(db: Db, projectId: number): Promise<{ from: string, to: string } | null> {
  const p = await projectDates(db, projectId)
  if (!p) return null
  const today = todayIso()
  return { from: p.startsOn, to: p.endsOn && p.endsOn < today ? p.endsOn : today }
}

export interface PacketPlan {
  project: { id: number, number: string, name: string, customer: string }
  period: { from: string, to: string }
  procedureIds: number[]
  pqrIds: number[]
  pqrs: { id: number, number: string }[]
  welders: { id: number, name: string, stamp: string, testIds: number[], tests: { id: number, process: string, testDate: string }[] }[]
  processes: string[]
  /** Joints in the project's weld register (the packet prints the register when there are any) */
  registerJoints: number
}

/** What goes into a project's packet: its WPSs and their PQRs, its welders' certified tests up to the period's end. */
export async function packetPlan(db: Db, projectId: number): Promise<PacketPlan | null> {
  const [project] = await db.select({ id: projects.id, number: projects.number, name: projects.name, customer: customers.name })
    .from(projects).innerJoin(customers, eq(customers.id, projects.customerId)).where(eq(projects.id, projectId))
  const period = await projectPeriod(db, projectId)
  if (!project || !period) return null
  const procs = await db.select({ id: procedures.id, process: procedures.process, processes: procedures.processes }).from(projectProcedures)
    .innerJoin(procedures, eq(procedures.id, projectProcedures.procedureId)).where(eq(projectProcedures.projectId, projectId))
    .orderBy(asc(procedures.number), asc(procedures.revision))
  const support = await pqrIdsOf(db, procs.map(p => p.id))
  const crew = await db.select({ id: welders.id, name: welders.name, stamp: welders.stamp }).from(projectWelders)
    .innerJoin(welders, eq(welders.id, projectWelders.welderId)).where(eq(projectWelders.projectId, projectId)).orderBy(asc(welders.stamp))
  const tests = crew.length
    ? await db.select({ id: welderTests.id, welderId: welderTests.welderId, process: welderTests.process, testDate: welderTests.testDate }).from(welderTests)
        .where(and(inArray(welderTests.welderId, crew.map(w => w.id)), eq(welderTests.status, 'certified'), lte(welderTests.testDate, period.to)))
        .orderBy(asc(welderTests.testDate), asc(welderTests.id))
    : []
  return {
    project, period,
    procedureIds: procs.map(p => p.id),
    pqrIds: [...new Set(support.map(s => s.pqrId))],
    welders: crew.map((w) => {
      const own = tests.filter(t => t.welderId === w.id).map(t => ({ id: t.id, process: t.process, testDate: t.testDate }))
      return { ...w, testIds: own.map(t => t.id), tests: own }
    }),
    pqrs: [...new Map(support.map(s => [s.pqrId, { id: s.pqrId, number: s.number }])).values()],
    // Every process of every layer of the project's WPSs (a GTAW root, SMAW fill WPS needs both held).
    processes: [...new Set(procs.flatMap(p => (p.processes?.length ? p.processes : [p.process])))].sort(),
    registerJoints: await jointCountOf(db, projectId),
  }
}

export interface Appendix { fileName: string, contentType: string, sha256: string, storageKey: string, owner: string }

/** The files attached to the packet's WPSs, PQRs and welder tests, in the packet's order. */
export async function appendicesOf(db: Db, plan: PacketPlan): Promise<Appendix[]> {
  const owners: [string, number[]][] = [['procedure', plan.procedureIds], ['pqr', plan.pqrIds], ['welder-test', plan.welders.flatMap(w => w.testIds)]]
  const wanted = owners.filter(([, ids]) => ids.length).map(([type, ids]) => and(eq(attachments.recordType, type), inArray(attachments.recordId, ids))!)
  if (!wanted.length) return []
  const rows = await db.select().from(attachments).where(or(...wanted)).orderBy(asc(attachments.recordType), asc(attachments.recordId), asc(attachments.id))
  const order = new Map(owners.flatMap(([type, ids]) => ids.map((id, i) => [`${type}:${id}`, i] as const)))
  const rank = (t: string) => owners.findIndex(([type]) => type === t)
  return rows.sort((a, b) => rank(a.recordType) - rank(b.recordType) || (order.get(`${a.recordType}:${a.recordId}`)! - order.get(`${b.recordType}:${b.recordId}`)!))
    .map(r => ({ fileName: r.fileName, contentType: r.contentType, sha256: r.sha256, storageKey: r.storageKey, owner: `${r.recordType} ${r.recordId}` }))
}

/** The signature a sheet's code names, if any. */
export async function signatureByCode(db: Db, code: string) {
  const [signature] = await db.select().from(signatures).where(eq(signatures.verifyCode, code)).limit(1)
  return signature
}

/** The issued (unsigned) sheet a code names, if any: a continuity log or a weld register. */
export async function issuedSheetByCode(db: Db, code: string) {
  const [issue] = await db.select().from(issuedSheets).where(eq(issuedSheets.verifyCode, code)).limit(1)
  return issue
}

/** Every signature of a record, oldest first, with the record version each was made on. */
export async function signersOf(db: Db, type: SignedRecordType, id: number) {
  return db.select({ meaning: signatures.meaning, name: signatures.signerName, at: signatures.signedAt, version: signatures.recordVersion })
    .from(signatures).where(and(eq(signatures.recordType, type), eq(signatures.recordId, id))).orderBy(asc(signatures.signedAt), asc(signatures.id))
}

/** Number, revision, the line under it and the status of a signed record, as its sheet prints them. */
export async function recordHead(db: Db, type: SignedRecordType, id: number) {
  if (type === 'procedure') {
    const [p] = await db.select({ number: procedures.number, revision: procedures.revision, status: procedures.status, title: procedures.title }).from(procedures).where(eq(procedures.id, id))
    return p ? { number: p.number, revision: p.revision, subject: p.title, status: p.status } : null
  }
  if (type === 'pqr') {
    const [q] = await db.select({ number: pqrs.number, status: pqrs.status, process: pqrs.process, testDate: pqrs.testDate }).from(pqrs).where(eq(pqrs.id, id))
    return q ? { number: q.number, revision: null, subject: `${q.process}, tested ${q.testDate}`, status: q.status } : null
  }
  const [t] = await db.select({ id: welderTests.id, status: welderTests.status, process: welderTests.process, testDate: welderTests.testDate, name: welders.name, stamp: welders.stamp })
    .from(welderTests).innerJoin(welders, eq(welders.id, welderTests.welderId)).where(eq(welderTests.id, id))
  return t ? { number: `WPQ-${t.id}`, revision: null, subject: `${t.name} (${t.stamp}), ${t.process}, tested ${t.testDate}`, status: t.status } : null
}
