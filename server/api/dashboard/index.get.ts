import { asc, count, eq } from 'drizzle-orm'
import { procedures, welders, welderTests } from '../../database/schema'
import { lapseWeeks } from '#shared/qualification/lapse-weeks'
import { renewalOf } from '#shared/qualification/renewal'

// The lists stop at this many rows (a large shop sees the rest on the continuity page); the counts are whole.
const listLimit = 200

/** GET /api/dashboard: who lapses in the next 30/60/90 days, who has lapsed, every lapse date for the timeline, tests awaiting certification */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  const db = await useDb()
  const today = todayIso()
  const roster = await db.select({ id: welders.id, name: welders.name, stamp: welders.stamp }).from(welders)
    .where(eq(welders.status, 'active')).orderBy(asc(welders.name))
  const [standings, awaiting, [waiting]] = await Promise.all([
    standingsOfWelders(db, roster.map(w => w.id), today),
    db.select({
      id: welderTests.id, testDate: welderTests.testDate, process: welderTests.process, positions: welderTests.positions, form: welderTests.form,
      weld: welderTests.weld, welderId: welders.id, welderName: welders.name, welderStamp: welders.stamp, procedureNumber: procedures.number,
    }).from(welderTests).innerJoin(welders, eq(welders.id, welderTests.welderId)).leftJoin(procedures, eq(procedures.id, welderTests.procedureId))
      .where(eq(welderTests.status, 'recorded')).orderBy(asc(welderTests.testDate)).limit(100),
    db.select({ n: count() }).from(welderTests).where(eq(welderTests.status, 'recorded')),
  ])
  const rows = roster.flatMap(w => (standings.get(w.id) ?? []).map(s => ({ ...s, welderId: w.id, welderName: w.name, welderStamp: w.stamp })))
    .sort((a, b) => a.lapsesOn.localeCompare(b.lapsesOn))
  // Most recently lapsed first: the ones a renewal test can still catch up with soonest
  const lapsed = rows.filter(r => r.daysLeft <= 0).reverse()
  const upcoming = rows.filter(r => r.daysLeft > 0 && r.daysLeft <= 90)
  return {
    today,
    lapsed: lapsed.slice(0, listLimit).map(r => ({ ...r, renewal: renewalOf[r.code] })),
    lapsedCount: lapsed.length,
    upcoming: upcoming.slice(0, listLimit),
    upcomingCounts: { 30: upcoming.filter(r => r.daysLeft <= 30).length, 60: upcoming.filter(r => r.daysLeft <= 60).length, 90: upcoming.length },
    currentCount: rows.filter(r => r.daysLeft > 30).length,
    timeline: lapseWeeks(rows, today),
    awaitingCertification: waiting?.n ?? 0,
    awaiting,
  }
})
