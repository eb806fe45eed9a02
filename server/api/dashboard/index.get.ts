import { asc, count, eq } from 'drizzle-orm'
import { welders, welderTests } from '../../database/schema'

/** GET /api/dashboard: who lapses in the next 30/60/90 days, who has lapsed, tests awaiting certification */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  const db = await useDb()
  const today = todayIso()
  const roster = await db.select({ id: welders.id, name: welders.name, stamp: welders.stamp }).from(welders)
    .where(eq(welders.status, 'active')).orderBy(asc(welders.name))
  const standings = await standingsOfWelders(db, roster.map(w => w.id), today)
  const rows = roster.flatMap(w => (standings.get(w.id) ?? []).map(s => ({ ...s, welderId: w.id, welderName: w.name, welderStamp: w.stamp })))
    .sort((a, b) => a.lapsesOn.localeCompare(b.lapsesOn))
  const [awaiting] = await db.select({ n: count() }).from(welderTests).where(eq(welderTests.status, 'recorded'))
  return {
    today,
    lapsed: rows.filter(r => r.daysLeft <= 0),
    upcoming: rows.filter(r => r.daysLeft > 0 && r.daysLeft <= 90),
    currentCount: rows.filter(r => r.daysLeft > 30).length,
    awaitingCertification: awaiting?.n ?? 0,
  }
})
