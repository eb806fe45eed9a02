import { desc, eq } from 'drizzle-orm'
import { welders, welderTests } from '../../database/schema'

/** GET /api/me/qualifications: the signed-in welder's own tests and where each process stands */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['welder'])
  const db = await useDb()
  const [welder] = await db.select().from(welders).where(eq(welders.id, user.welderId ?? -1)).limit(1)
  if (!welder) throw createError({ statusCode: 404, statusMessage: 'No roster entry is linked to this account' })
  const tests = await db.select().from(welderTests).where(eq(welderTests.welderId, welder.id)).orderBy(desc(welderTests.testDate))
  const standings = (await standingsOfWelders(db, [welder.id])).get(welder.id) ?? []
  return { welder, tests, standings, today: todayIso() }
})
