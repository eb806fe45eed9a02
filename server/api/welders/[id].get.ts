import { desc, eq } from 'drizzle-orm'
import { welders, welderTests } from '../../database/schema'
import { idParamSchema } from '#shared/schemas/list'

/** GET /api/welders/:id: one welder with tests and standings; a welder may read only their own (404 otherwise) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  if (user.role === 'welder' && user.welderId !== id) throw createError({ statusCode: 404, statusMessage: 'Welder not found' })
  const db = await useDb()
  const [welder] = await db.select().from(welders).where(eq(welders.id, id)).limit(1)
  if (!welder) throw createError({ statusCode: 404, statusMessage: 'Welder not found' })
  const tests = await db.select().from(welderTests).where(eq(welderTests.welderId, id)).orderBy(desc(welderTests.testDate))
  const standings = (await standingsOfWelders(db, [id])).get(id) ?? []
  return { welder, tests, standings }
})
