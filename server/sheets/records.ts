import { and, asc, desc, eq, inArray } from 'drizzle-orm'
import type { Db } from '../database/client'
import {
  accounts, baseMetals, fillerMetals, pqrBendSpecimens, pqrs, pqrTensileSpecimens, procedurePqrs, procedures, shopSettings,
  signatures, welders, welderTestBends, welderTests,
} from '../database/schema'
import { contentFormatOf, contentHash, type SignedRecordType } from '../database/signing'
import type { SheetSignature } from './model'
import { pqrLayersOf, supportPqrs } from '../database/pqrs'

/** Everything the sheet of one signed record is built from. */

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
  return { test, welder: row.welders, procedure: procedure ?? null, inspector: inspector?.name ?? null, bends, signed: await signaturesOf(db, 'welder-test', id) }
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
