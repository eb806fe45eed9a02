import { and, desc, eq } from 'drizzle-orm'
import type { Db } from './client'
import { accounts, processStandings, qualificationRevocations, welders, welderTests } from './schema'
import { recordAudit } from './audit'
import { refreshStandings } from './standings'
import { mayReadWelder } from './welders'
import { settle } from '../utils/outcome'
import { todayIso } from '../utils/today'
import type { SessionUser } from '../utils/auth'
import { conflict, fieldFailure, missing } from '../../shared/types/outcome'
import type { RevocationInput } from '../../shared/schemas/revocation'
import { processOfKey, standingKey } from '../../shared/vocabulary/qualified-as'
import { revocationInForce } from '../../shared/qualification/revocation'

/** The certified tests behind one standing key, newest first (a combination coupon counts for each of its processes). */
async function certifiedFor(db: Db, welderId: number, key: string) {
  const rows = await db.select({ id: welderTests.id, testDate: welderTests.testDate, process: welderTests.process, processes: welderTests.processes, qualifiedAs: welderTests.qualifiedAs })
    .from(welderTests).where(and(eq(welderTests.welderId, welderId), eq(welderTests.status, 'certified')))
    .orderBy(desc(welderTests.testDate), desc(welderTests.id))
  return rows.filter(t => (t.processes.length ? t.processes : [t.process]).some(p => standingKey(p, t.qualifiedAs) === key))
}

/**
 * The inspector revokes one welder × process qualification for a specific reason (QW-322.1(b)). A new record, never an
 * edit of the signed tests; the trigger on qualification_revocations marks the standing, so it lapses on the next read.
 */
export async function revokeQualification(db: Db, user: SessionUser, welderId: number, input: RevocationInput) {
  return settle(() => db.transaction(async (tx) => {
    const t = tx as unknown as Db
    const [welder] = await t.select({ id: welders.id }).from(welders).where(eq(welders.id, welderId)).for('update')
    if (!welder) throw missing('Welder')
    const tests = await certifiedFor(t, welderId, input.process)
    if (!tests.length) throw fieldFailure('process', `This welder holds no certified ${input.process} qualification to revoke`)
    const today = todayIso()
    const earlier = await t.select({ id: qualificationRevocations.id, process: qualificationRevocations.process, revokedOn: qualificationRevocations.revokedOn, reason: qualificationRevocations.reason, revokedBy: accounts.name, basisTestId: qualificationRevocations.basisTestId })
      .from(qualificationRevocations).innerJoin(accounts, eq(accounts.id, qualificationRevocations.revokedBy))
      .where(and(eq(qualificationRevocations.welderId, welderId), eq(qualificationRevocations.process, input.process)))
    const holding = revocationInForce(earlier, tests, today)
    if (holding) throw conflict(`${input.process} is already revoked since ${holding.revokedOn} (${holding.reason}); a new certified test restores it`, 'process')
    const [row] = await t.insert(qualificationRevocations).values({
      welderId, process: input.process, reason: input.reason, revokedOn: today, revokedBy: user.id, basisTestId: tests[0]!.id,
    }).returning()
    await recordAudit(t, { accountId: user.id, action: 'revoke', recordType: 'welder', recordId: welderId, after: row })
    return row!
  }))
}

/**
 * A welder's revocations, newest first, each with who revoked it and whether a later certified test has restored the
 * qualification (QW-322.2(b)). Staff read any; a welder their own; an auditor a welder of a granted project.
 */
export async function revocationsOf(db: Db, user: SessionUser, welderId: number) {
  if (!(await mayReadWelder(db, user, welderId))) return missing('Welder')
  const [welder] = await db.select({ id: welders.id }).from(welders).where(eq(welders.id, welderId))
  if (!welder) return missing('Welder')
  await refreshStandings(db)
  const rows = await db.select({ id: qualificationRevocations.id, process: qualificationRevocations.process, revokedOn: qualificationRevocations.revokedOn, reason: qualificationRevocations.reason, revokedBy: accounts.name, basisTestId: qualificationRevocations.basisTestId, createdAt: qualificationRevocations.createdAt })
    .from(qualificationRevocations).innerJoin(accounts, eq(accounts.id, qualificationRevocations.revokedBy))
    .where(eq(qualificationRevocations.welderId, welderId)).orderBy(desc(qualificationRevocations.revokedOn), desc(qualificationRevocations.id))
  const kept = await db.select({ process: processStandings.process, revokedOn: processStandings.revokedOn }).from(processStandings).where(eq(processStandings.welderId, welderId))
  const items = []
  for (const r of rows) {
    const tests = await certifiedFor(db, welderId, r.process)
    const restoredBy = tests.filter(t => t.id !== r.basisTestId && t.testDate >= r.revokedOn).at(-1) ?? null
    items.push({ ...r, processName: processOfKey(r.process), inForce: kept.some(k => k.process === r.process && k.revokedOn === r.revokedOn) && !restoredBy, restoredBy: restoredBy && { id: restoredBy.id, testDate: restoredBy.testDate } })
  }
  return { items }
}
