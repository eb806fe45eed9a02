import { and, desc, eq } from 'drizzle-orm'
import type { Db } from './client'
import { accounts, importedTests, processStandings, qualificationRevocations, welders, welderTests } from './schema'
import { recordAudit } from './audit'
import { refreshStandings } from './standings'
import { mayReadWelder } from './welders'
import { settle } from '../utils/outcome'
import { sendSoon } from '../utils/mail'
import { revocationMail } from '../utils/mail-messages'
import { activeQualityManagers, queueMail, shopNameOf } from './mail'
import { todayIso } from '../utils/today'
import type { SessionUser } from '../utils/auth'
import { conflict, fieldFailure, isFailure, missing } from '../../shared/types/outcome'
import type { RevocationInput } from '../../shared/schemas/revocation'
import { isOperatorKey, processOfKey, standingKey } from '../../shared/vocabulary/qualified-as'
import { revocationClause, revocationInForce } from '../../shared/qualification/revocation'
import type { CodeId } from '../../shared/rules/types'
import { sameFamily } from '../../shared/qualification/iso-standing'

/** The certified tests behind one standing key, newest first (a combination coupon counts for each of its processes). */
async function certifiedFor(db: Db, welderId: number, key: string) {
  const rows = await db.select({ id: welderTests.id, testDate: welderTests.testDate, process: welderTests.process, processes: welderTests.processes, qualifiedAs: welderTests.qualifiedAs })
    .from(welderTests).where(and(eq(welderTests.welderId, welderId), eq(welderTests.status, 'certified')))
    .orderBy(desc(welderTests.testDate), desc(welderTests.id))
  // Imported history an inspector has confirmed stands like a certified test (a welder's, never an operator's); negated ids.
  const imported = isOperatorKey(key)
    ? []
    : (await db.select({ id: importedTests.id, testDate: importedTests.testDate, code: importedTests.code }).from(importedTests)
        .where(and(eq(importedTests.welderId, welderId), eq(importedTests.process, key), eq(importedTests.state, 'confirmed')))).filter(t => sameFamily(t.code, key))
  return [
    ...rows.filter(t => (t.processes.length ? t.processes : [t.process]).some(p => standingKey(p, t.qualifiedAs) === key)),
    ...imported.map(t => ({ id: -t.id, testDate: t.testDate, imported: true })),
  ].sort((a, b) => b.testDate.localeCompare(a.testDate) || b.id - a.id)
}

/**
 * The inspector revokes one welder × process qualification for a specific reason (QW-322.1(b)). A new record, never an
 * edit of the signed tests; the trigger on qualification_revocations marks the standing, so it lapses on the next read.
 */
export async function revokeQualification(db: Db, user: SessionUser, welderId: number, input: RevocationInput, baseUrl = '') {
  const done = await settle(() => db.transaction(async (tx) => {
    const t = tx as unknown as Db
    const [welder] = await t.select({ id: welders.id, name: welders.name, stamp: welders.stamp }).from(welders).where(eq(welders.id, welderId)).for('update')
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
      welderId, process: input.process, reason: input.reason, revokedOn: today, revokedBy: user.id, basisTestId: tests[0]!.id > 0 ? tests[0]!.id : null,
    }).returning()
    await recordAudit(t, { accountId: user.id, action: 'revoke', recordType: 'welder', recordId: welderId, after: row })
    await queueRevocationMail(t, row!, welder, user.name, baseUrl)
    return row!
  }))
  if (!isFailure(done)) sendSoon(db)
  return done
}

/**
 * The welder (through their active account, when they have one) and every active quality manager hear of a revocation,
 * in the same transaction as the revocation itself (the outbox sends it after; a re-run queues nothing twice).
 */
async function queueRevocationMail(db: Db, row: typeof qualificationRevocations.$inferSelect, welder: { id: number, name: string, stamp: string }, revokedBy: string, baseUrl: string) {
  const [basis] = row.basisTestId ? await db.select({ code: welderTests.code }).from(welderTests).where(eq(welderTests.id, row.basisTestId)) : []
  const words = revocationClause[(basis?.code ?? 'asme-ix') as CodeId] ?? revocationClause['asme-ix']
  const revocation = { id: row.id, process: row.process, revokedOn: row.revokedOn, reason: row.reason, clause: words.revoke, restore: words.restore }
  const shopName = await shopNameOf(db)
  const own = await db.select({ id: accounts.id, name: accounts.name, email: accounts.email }).from(accounts)
    .where(and(eq(accounts.welderId, welder.id), eq(accounts.active, true)))
  for (const a of own) {
    await queueMail(db, revocationMail({ revocation, welder, recipient: { ...a, isWelder: true }, revokedBy, link: `${baseUrl}/me`, shopName }))
  }
  for (const a of await activeQualityManagers(db)) {
    await queueMail(db, revocationMail({ revocation, welder, recipient: { ...a, isWelder: false }, revokedBy, link: `${baseUrl}/welders/${welder.id}`, shopName }))
  }
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
    items.push({ ...r, processName: processOfKey(r.process), inForce: kept.some(k => k.process === r.process && k.revokedOn === r.revokedOn) && !restoredBy, restoredBy: restoredBy && { id: Math.abs(restoredBy.id), testDate: restoredBy.testDate, imported: restoredBy.id < 0 } })
  }
  return { items }
}
