import { randomBytes } from 'node:crypto'
import { and, arrayContained, asc, desc, eq, sql } from 'drizzle-orm'
import type { Db } from './client'
import { procedures, welders, welderTests } from './schema'
import { qualifiedRangesOf } from '../../shared/qualification/test-ranges'
import { depositsOf, variablesOf } from './welder-test-columns'
import { rangesInWords } from '../../shared/qualification/plain-words'
import type { WelderRangesResult } from '../../shared/rules/results'
import type { Unit } from '../../shared/rules/types'
import { renewalOf } from '../../shared/qualification/renewal'
import { missing } from '../../shared/types/outcome'
import { welderLogsOwnContinuity } from './continuity'
import { standingsOf } from './standings'
import { recordAudit } from './audit'
import type { SessionUser } from '../utils/auth'

/**
 * A welder's own page: every test, what each certified one covers in plain words, and the approved WPSs whose every
 * layer's process the welder is current in (a GTAW root and SMAW fill WPS needs both).
 */
export async function ownQualifications(db: Db, welderId: number, standings: { process: string, standing: string }[]) {
  const [welder] = await db.select({ id: welders.id, name: welders.name, stamp: welders.stamp, calendarToken: welders.calendarToken })
    .from(welders).where(eq(welders.id, welderId)).limit(1)
  if (!welder) return null
  const tests = await db.select().from(welderTests).where(eq(welderTests.welderId, welderId)).orderBy(desc(welderTests.testDate), desc(welderTests.id))
  const current = standings.filter(s => s.standing !== 'lapsed').map(s => s.process)
  const wps = current.length
    ? await db.select({ id: procedures.id, number: procedures.number, revision: procedures.revision, title: procedures.title, process: procedures.process, processes: procedures.processes })
        .from(procedures).where(and(eq(procedures.status, 'approved'), sql`cardinality(${procedures.processes}) > 0`, arrayContained(procedures.processes, current))).orderBy(asc(procedures.number))
    : []
  const described = tests.map((t) => {
    const ranges = qualifiedRangesOf(variablesOf(t))
    return {
      id: t.id, testDate: t.testDate, process: t.process, processes: depositsOf(t), transfer: t.transfer, form: t.form, weld: t.weld, positions: t.positions,
      status: t.status, unit: t.unit, couponThickness: t.couponThickness, outsideDiameter: t.outsideDiameter, code: t.code, edition: t.edition,
      covers: t.status === 'certified' && !('error' in ranges) ? rangesInWords(ranges as unknown as WelderRangesResult, t.unit as Unit) : [],
    }
  })
  return { welder: { id: welder.id, name: welder.name, stamp: welder.stamp }, hasFeed: Boolean(welder.calendarToken), tests: described, procedures: wps }
}

/** A new secret for the welder's subscribable calendar (the old link stops working); its address. */
export async function rotateCalendarToken(db: Db, user: SessionUser) {
  const token = randomBytes(24).toString('base64url')
  await db.update(welders).set({ calendarToken: token }).where(eq(welders.id, user.welderId ?? -1))
  await recordAudit(db, { accountId: user.id, action: 'calendar-feed', recordType: 'welder', recordId: user.welderId })
  return { path: `/api/me/feed/${token}.ics` }
}

/** Turns the subscription address off. */
export async function clearCalendarToken(db: Db, user: SessionUser) {
  await db.update(welders).set({ calendarToken: null }).where(eq(welders.id, user.welderId ?? -1))
  await recordAudit(db, { accountId: user.id, action: 'calendar-feed-off', recordType: 'welder', recordId: user.welderId })
}

export async function welderByCalendarToken(db: Db, token: string) {
  const [row] = await db.select({ id: welders.id, name: welders.name, stamp: welders.stamp }).from(welders)
    .where(and(eq(welders.calendarToken, token), eq(welders.status, 'active'))).limit(1)
  return row ?? null
}

export async function welderName(db: Db, welderId: number) {
  const [row] = await db.select({ id: welders.id, name: welders.name, stamp: welders.stamp }).from(welders).where(eq(welders.id, welderId)).limit(1)
  return row ?? null
}

/** The signed-in welder's page: tests, what each covers, standings with how to renew, usable WPSs. */
export async function myQualifications(db: Db, welderId: number, today: string) {
  const standings = (await standingsOf(db, [welderId], today)).get(welderId) ?? []
  const own = await ownQualifications(db, welderId, standings)
  if (!own) return missing('Roster entry')
  return {
    ...own, today, logsOwnContinuity: await welderLogsOwnContinuity(db),
    // Fewest days left first: a lapsed process at the top, then the one that lapses next.
    standings: [...standings].sort((a, b) => a.daysLeft - b.daysLeft || a.process.localeCompare(b.process))
      .map(s => ({ ...s, renewal: s.standing === 'lapsed' && !s.revoked ? renewalOf[s.code] : null })),
  }
}

/** A welder (by roster id, or by the secret of their calendar address) and where they stand, for the lapse calendar. */
export async function calendarOf(db: Db, who: { welderId: number } | { token: string }, today: string) {
  const welder = 'token' in who ? await welderByCalendarToken(db, who.token) : await welderName(db, who.welderId)
  if (!welder) return missing('token' in who ? 'Calendar' : 'Roster entry')
  return { welder, standings: (await standingsOf(db, [welder.id], today)).get(welder.id) ?? [] }
}
