import { and, asc, eq } from 'drizzle-orm'
import type { Db } from '../database/client'
import { issuedSheets, pqrs, procedures, signatures, welders, welderTests } from '../database/schema'
import { contentFormatOf, contentHash, type SignedRecordType } from '../database/signing'
import { loadContinuityLog } from './continuity'

export interface Verification {
  code: string
  sheet: string
  number: string
  revision: number | null
  /** A line the sheet itself prints under its number (welder and process for a WPQ, period for a log) */
  subject: string | null
  status: string
  signers: { meaning: string, name: string, at: string }[]
  /** unchanged: the stored content still hashes to the signed value; changed: it does not */
  state: 'unchanged' | 'changed'
  signedSha256: string
}

const sheetNames: Record<SignedRecordType, string> = {
  'procedure': 'Welding procedure specification (WPS)',
  'pqr': 'Procedure qualification record (PQR)',
  'welder-test': 'Welder performance qualification (WPQ)',
}

/** What the public verification page shows for a code: no more than the sheet itself prints. */
export async function verifyCode(db: Db, code: string): Promise<Verification | null> {
  const [signature] = await db.select().from(signatures).where(eq(signatures.verifyCode, code)).limit(1)
  if (signature) return verifySigned(db, code, signature)
  const [issue] = await db.select().from(issuedSheets).where(eq(issuedSheets.verifyCode, code)).limit(1)
  if (!issue) return null
  const [welder] = await db.select({ name: welders.name, stamp: welders.stamp }).from(welders).where(eq(welders.id, issue.welderId))
  const log = await loadContinuityLog(db, issue.welderId, { from: issue.periodFrom, to: issue.periodTo })
  return {
    code, sheet: 'Continuity log', number: `CL-${welder?.stamp ?? ''}`, revision: null,
    subject: `${welder?.name ?? ''} (${welder?.stamp ?? ''}), ${issue.periodFrom} to ${issue.periodTo}`,
    status: 'issued', signers: [{ meaning: 'issued', name: issue.issuerName, at: issue.issuedAt.toISOString() }],
    state: log?.sha256 === issue.sha256 ? 'unchanged' : 'changed', signedSha256: issue.sha256,
  }
}

async function verifySigned(db: Db, code: string, signature: typeof signatures.$inferSelect): Promise<Verification | null> {
  const type = signature.recordType as SignedRecordType
  const id = signature.recordId
  const head = await recordHead(db, type, id)
  if (!head) return null
  const all = await db.select({ meaning: signatures.meaning, name: signatures.signerName, at: signatures.signedAt, version: signatures.recordVersion })
    .from(signatures).where(and(eq(signatures.recordType, type), eq(signatures.recordId, id))).orderBy(asc(signatures.signedAt), asc(signatures.id))
  const current = await contentHash(db, type, id, contentFormatOf(signature.contentFormat))
  return {
    code, sheet: sheetNames[type], ...head,
    signers: all.filter(s => s.version === signature.recordVersion).map(s => ({ meaning: s.meaning, name: s.name, at: s.at.toISOString() })),
    state: current === signature.sha256 ? 'unchanged' : 'changed', signedSha256: signature.sha256,
  }
}

async function recordHead(db: Db, type: SignedRecordType, id: number) {
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
