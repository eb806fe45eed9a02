import { and, arrayContains, asc, count, eq, ilike, or } from 'drizzle-orm'
import { allOf, containsPattern, orderOf, pageOf } from '../utils/list'
import type { WelderTestListQuery } from '../../shared/schemas/list-queries'
import type { Db } from './client'
import { accounts, pqrs, procedures, signatures, welders, welderTestBends, welderTests } from './schema'
import { contentHash, currentContentFormat, newVerifyCode } from './signing'
import { testOutcome } from '../../shared/qualification/test-outcome'
import { columnsOf, depositsOf, designationOf, examRecordOf, recordOf, type ExamRecord, type StoredDeposit } from './welder-test-columns'
import type { WelderTestInput } from '../../shared/schemas/welder-test'
import { recordAudit } from './audit'
import { settle } from '../utils/outcome'
import { conflict, fieldFailure, frozen, missing, stale } from '../../shared/types/outcome'
import { todayIso } from '../utils/today'
import type { SessionUser } from '../utils/auth'
import { auditorMayReadWelder } from './projects'

export { depositsOf, examRecordOf, recordOf, type StoredDeposit }

async function checkReferences(db: Db, input: WelderTestInput) {
  if (input.testDate > todayIso()) throw fieldFailure('testDate', 'The test date is after today')
  const [welder] = await db.select({ id: welders.id }).from(welders).where(eq(welders.id, input.welderId))
  if (!welder) throw fieldFailure('welderId', 'No such welder on the roster')
  if (input.procedureId) {
    const [wps] = await db.select({ id: procedures.id }).from(procedures).where(eq(procedures.id, input.procedureId))
    if (!wps) throw fieldFailure('procedureId', 'No such procedure')
  }
  if (input.pqrId) {
    const [pqr] = await db.select({ id: pqrs.id, welderId: pqrs.welderId }).from(pqrs).where(eq(pqrs.id, input.pqrId))
    if (!pqr) throw fieldFailure('pqrId', 'No such PQR')
    if (pqr.welderId !== input.welderId) throw fieldFailure('pqrId', 'This PQR names another welder (or none) as the welder of its coupon')
  }
}

export async function insertWelderTest(db: Db, input: WelderTestInput, accountId: number) {
  return settle(async () => {
    await checkReferences(db, input)
    const { values, bends, outcome } = columnsOf(input)
    if (outcome.rangesError) throw fieldFailure('ranges', outcome.rangesError)
    return db.transaction(async (tx) => {
      const [row] = await tx.insert(welderTests).values({ ...values, status: 'recorded', inspectorId: accountId }).returning()
      if (bends.length) await tx.insert(welderTestBends).values(bends.map(b => ({ ...b, testId: row!.id })))
      await recordAudit(tx as unknown as Db, { accountId, action: 'create', recordType: 'welder-test', recordId: row!.id, after: { ...values, bends } })
      return row!
    })
  })
}

/** Replace a test's content; null when missing. Frozen (certified or failed) and stale versions are conflicts. */
export async function updateWelderTest(db: Db, id: number, input: WelderTestInput & { version: number }, accountId: number) {
  return settle(async () => {
    await checkReferences(db, input)
    const { values, bends, outcome } = columnsOf(input)
    if (outcome.rangesError) throw fieldFailure('ranges', outcome.rangesError)
    return db.transaction(async (tx) => {
      const [before] = await tx.select().from(welderTests).where(eq(welderTests.id, id)).for('update')
      if (!before) throw missing('Welder test')
      if (before.status !== 'recorded') throw frozen(`This test was ${before.status === 'failed' ? 'certified as failed' : 'certified'} and is frozen; record a new test instead.`)
      if (before.version !== input.version) throw stale(`Someone saved this test after you opened it (version ${before.version}, yours ${input.version}). Reload and enter your change again.`)
      const { version: _v, ...changes } = values as typeof values & { version?: number }
      const [row] = await tx.update(welderTests).set({ ...changes, version: before.version + 1, updatedAt: new Date() })
        .where(and(eq(welderTests.id, id), eq(welderTests.version, input.version))).returning()
      await tx.delete(welderTestBends).where(eq(welderTestBends.testId, id))
      if (bends.length) await tx.insert(welderTestBends).values(bends.map(b => ({ ...b, testId: id })))
      await recordAudit(tx as unknown as Db, { accountId, action: 'update', recordType: 'welder-test', recordId: id, before, after: { ...values, bends } })
      return row!
    })
  })
}

/**
 * The inspector certifies the result: a passed test becomes 'certified', a failed one 'failed'; either way it is
 * signed over its content hash and frozen. A test without a result yet cannot be certified.
 */
export async function certifyWelderTest(db: Db, id: number, version: number, signer: { id: number, name: string }) {
  return settle(async () => {
    return db.transaction(async (tx) => {
      const t = tx as unknown as Db
      const [row] = await tx.select().from(welderTests).where(eq(welderTests.id, id)).for('update')
      if (!row) throw missing('Welder test')
      if (row.status !== 'recorded') throw frozen('This test is already certified and frozen.')
      if (row.version !== version) throw stale(`Someone saved this test after you opened it (version ${row.version}, yours ${version}). Reload before certifying.`)
      const bends = await tx.select().from(welderTestBends).where(eq(welderTestBends.testId, id)).orderBy(asc(welderTestBends.id))
      const outcome = testOutcome(recordOf(row, bends))
      if (outcome.outcome === 'pending') throw conflict(`The test has no result yet: ${outcome.steps.at(-1)?.text ?? 'record the examinations first'}`)
      const status = outcome.outcome === 'passed' ? 'certified' : 'failed'
      const [updated] = await tx.update(welderTests).set({ status, inspectorId: signer.id, certifiedAt: new Date(), version: row.version + 1, updatedAt: new Date() })
        .where(eq(welderTests.id, id)).returning()
      const sha256 = (await contentHash(t, 'welder-test', id))!
      const [signature] = await tx.insert(signatures).values({
        recordType: 'welder-test', recordId: id, recordVersion: updated!.version, signerId: signer.id, signerName: signer.name,
        meaning: 'certified', sha256, verifyCode: newVerifyCode(), contentFormat: currentContentFormat,
      }).returning()
      await recordAudit(t, { accountId: signer.id, action: 'certify', recordType: 'welder-test', recordId: id, before: { status: row.status }, after: { status, sha256, verifyCode: signature!.verifyCode } })
      return { test: updated!, signature: signature! }
    })
  })
}

/** One test with its welder, WPS, bends, signatures and the rules' verdict; null when missing. */
export async function loadWelderTest(db: Db, id: number) {
  const [found] = await db.select({
    test: welderTests, welder: { id: welders.id, name: welders.name, stamp: welders.stamp },
    procedure: { id: procedures.id, number: procedures.number, revision: procedures.revision, title: procedures.title, status: procedures.status },
    inspectorName: accounts.name,
  }).from(welderTests)
    .innerJoin(welders, eq(welders.id, welderTests.welderId))
    .leftJoin(procedures, eq(procedures.id, welderTests.procedureId))
    .leftJoin(accounts, eq(accounts.id, welderTests.inspectorId))
    .where(eq(welderTests.id, id))
  if (!found) return null
  const [bends, signed] = await Promise.all([
    db.select().from(welderTestBends).where(eq(welderTestBends.testId, id)).orderBy(asc(welderTestBends.id)),
    db.select().from(signatures).where(and(eq(signatures.recordType, 'welder-test'), eq(signatures.recordId, id))).orderBy(asc(signatures.signedAt)),
  ])
  const record = recordOf(found.test, bends)
  const exam = found.test.radiography as ExamRecord | null
  return {
    ...found.test,
    unit: found.test.unit as 'in' | 'mm',
    processes: depositsOf(found.test),
    radiography: exam?.kind === 'radiography' ? { indications: exam.indications, reportNumber: exam.reportNumber } : null,
    macro: exam?.kind === 'macro-fracture' ? { accepted: exam.accepted, notes: exam.notes } : null,
    bends: bends.map(b => ({ type: b.type, largestIndication: b.largestIndication, atCorner: b.atCorner, accepted: b.accepted })),
    welder: found.welder, procedure: found.procedure?.id ? found.procedure : null, inspectorName: found.inspectorName,
    signatures: signed.map(s => ({ id: s.id, meaning: s.meaning, signerName: s.signerName, signedAt: s.signedAt, sha256: s.sha256, verifyCode: s.verifyCode, recordVersion: s.recordVersion })),
    evaluation: testOutcome(record),
    designation: designationOf(found.test),
  }
}

/**
 * Who may read a welder test, its sheet and its files: staff any; a welder their own; an auditor only a certified
 * test of a welder on a granted project (a packet carries certified qualifications; tests still recorded or failed
 * stay in the shop). False also when there is no such test.
 */
export async function mayReadWelderTest(db: Db, user: SessionUser, id: number) {
  const [row] = await db.select({ welderId: welderTests.welderId, status: welderTests.status }).from(welderTests).where(eq(welderTests.id, id))
  if (!row) return false
  if (user.role === 'supervisor' || user.role === 'inspector') return true
  if (user.role === 'welder') return user.welderId === row.welderId
  return row.status === 'certified' && auditorMayReadWelder(db, user, row.welderId)
}

const testSortColumns = { testDate: welderTests.testDate, welder: welders.name, process: welderTests.process, status: welderTests.status }

/** Welder tests, paged; a welder sees only their own. */
export async function listWelderTests(db: Db, user: SessionUser, query: WelderTestListQuery) {
  const where = allOf([
    user.role === 'welder' && eq(welderTests.welderId, user.welderId ?? -1),
    query.welderId && eq(welderTests.welderId, query.welderId),
    query.status && eq(welderTests.status, query.status),
    // A combination coupon is listed under each of its processes
    query.process && or(eq(welderTests.process, query.process), arrayContains(welderTests.processes, [query.process])),
    query.q && or(ilike(welders.name, containsPattern(query.q)), ilike(welders.stamp, containsPattern(query.q))),
  ])
  return pageOf(query, ({ limit, offset }) => db.select({
    id: welderTests.id, testDate: welderTests.testDate, status: welderTests.status, process: welderTests.process, processes: welderTests.processes,
    transfer: welderTests.transfer, form: welderTests.form, weld: welderTests.weld, positions: welderTests.positions,
    couponThickness: welderTests.couponThickness, outsideDiameter: welderTests.outsideDiameter, unit: welderTests.unit,
    code: welderTests.code, welderId: welders.id, welderName: welders.name, welderStamp: welders.stamp,
    procedureNumber: procedures.number, procedureRevision: procedures.revision,
  }).from(welderTests).innerJoin(welders, eq(welders.id, welderTests.welderId)).leftJoin(procedures, eq(procedures.id, welderTests.procedureId))
    .where(where).orderBy(orderOf(testSortColumns[query.sort], query.dir), welderTests.id).limit(limit).offset(offset),
  () => db.select({ total: count() }).from(welderTests).innerJoin(welders, eq(welders.id, welderTests.welderId)).where(where))
}

/** One test a user may read (a welder only their own); missing otherwise. */
export async function readWelderTest(db: Db, user: SessionUser, id: number) {
  const test = await loadWelderTest(db, id)
  if (!test || (user.role === 'welder' && test.welderId !== user.welderId)) return missing('Test')
  return test
}
