import { asc, count, eq } from 'drizzle-orm'
import { procedures, welders, welderTests } from '../../database/schema'
import { renewalOf } from '#shared/qualification/renewal'

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
  return {
    today,
    lapsed: rows.filter(r => r.daysLeft <= 0).map(r => ({ ...r, renewal: renewalOf[r.code] })),
    upcoming: rows.filter(r => r.daysLeft > 0 && r.daysLeft <= 90),
    currentCount: rows.filter(r => r.daysLeft > 30).length,
    timeline: rows.map(r => ({ welderId: r.welderId, welderStamp: r.welderStamp, welderName: r.welderName, process: r.process, lapsesOn: r.lapsesOn, daysLeft: r.daysLeft, standing: r.standing })),
    awaitingCertification: waiting?.n ?? 0,
    awaiting,
  }
})
