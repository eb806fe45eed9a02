import { asc, eq } from 'drizzle-orm'
import type { Db } from './client'
import { isoValidityRecords, welderTests } from './schema'
import { canonicalJson, sha256Hex } from './signing'
import { recordAudit } from './audit'
import { mayReadWelderTest } from './welder-tests'
import { settle } from '../utils/outcome'
import { conflict, fieldFailure, missing } from '../../shared/types/outcome'
import type { SessionUser } from '../utils/auth'
import type { IsoValidityRecordInput } from '../../shared/schemas/iso-validity'
import type { isoConfirmers, isoValidityKinds } from '../../shared/vocabulary/iso'
import { isoValidity, type IsoRoute, type IsoValidityRecord } from '../../shared/rules/iso-9606-1/validity'
import { designationOf } from './welder-test-columns'

/** The records of one test, oldest first. */
async function recordsOf(db: Db, testId: number) {
  return db.select().from(isoValidityRecords).where(eq(isoValidityRecords.testId, testId)).orderBy(asc(isoValidityRecords.on), asc(isoValidityRecords.id))
}

/**
 * An ISO 9606-1 test's validity on `today` (9.2 confirmations, 9.3 route) with its signed records and designation.
 * Missing when the user may not read the test, or when it is not an ISO 9606-1 test.
 */
export async function isoValidityOfTest(db: Db, user: SessionUser, id: number, today: string) {
  if (!(await mayReadWelderTest(db, user, id))) return missing('Test')
  const [row] = await db.select().from(welderTests).where(eq(welderTests.id, id))
  if (!row || row.code !== 'iso-9606-1') return missing('ISO 9606-1 test')
  const records = await recordsOf(db, id)
  const route = (row.iso as { route?: IsoRoute } | null)?.route ?? null
  const validity = row.status === 'certified' && route
    ? isoValidity({ testDate: row.testDate, route, today, records: records.map(r => ({ kind: r.kind, on: r.on }) as IsoValidityRecord) })
    : null
  return {
    testId: id, status: row.status, testDate: row.testDate, route, designation: designationOf(row), validity,
    // kind and confirmer hold ids of shared/vocabulary/iso.ts (the record schema checks them when signed).
    records: records.map(r => ({ id: r.id, kind: r.kind as keyof typeof isoValidityKinds, on: r.on, confirmer: r.confirmer as keyof typeof isoConfirmers, statement: r.statement, reference: r.reference, signerName: r.signerName, sha256: r.sha256, createdAt: r.createdAt })),
  }
}

/**
 * Sign a 9.2 confirmation or a 9.3 b) production-weld record for a certified ISO 9606-1 test. The date may not be
 * before the test nor after today; a production-weld record belongs to route b. The record is hashed (sha256 over its
 * content) and never edited.
 */
export async function addIsoValidityRecord(db: Db, id: number, input: IsoValidityRecordInput, signer: { id: number, name: string }, today: string) {
  return settle(async () => db.transaction(async (tx) => {
    const [row] = await tx.select().from(welderTests).where(eq(welderTests.id, id)).for('update')
    if (!row || row.code !== 'iso-9606-1') throw missing('ISO 9606-1 test')
    if (row.status !== 'certified') throw conflict('Only a certified test is confirmed (ISO 9606-1, 9.2).')
    const route = (row.iso as { route?: IsoRoute } | null)?.route
    if (input.on < row.testDate) throw fieldFailure('on', 'The date is before the test')
    if (input.on > today) throw fieldFailure('on', 'The date is after today')
    if (input.kind === 'production-welds' && route !== 'b') throw fieldFailure('kind', 'Production welds tested extend a certificate on route 9.3 b) only')
    const content = { testId: id, kind: input.kind, on: input.on, confirmer: input.confirmer, statement: input.statement, reference: input.reference, signerName: signer.name }
    const sha256 = sha256Hex(canonicalJson(content))
    const [saved] = await tx.insert(isoValidityRecords).values({ ...content, signerId: signer.id, sha256 }).returning()
    await recordAudit(tx as unknown as Db, { accountId: signer.id, action: 'iso-validity', recordType: 'welder-test', recordId: id, after: { ...content, sha256 } })
    return saved!
  }))
}
