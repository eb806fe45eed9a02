import { and, arrayContains, count, eq, ilike, or, type SQL } from 'drizzle-orm'
import { z } from 'zod'
import { procedures, welders, welderTests } from '../../database/schema'
import { listQuerySchema, processSchema } from '#shared/schemas/list'

const querySchema = listQuerySchema(['testDate', 'welder', 'process', 'status']).extend({
  status: z.enum(['recorded', 'certified', 'failed']).optional(),
  process: processSchema.optional(),
  welderId: z.coerce.number().int().positive().max(2_147_483_647).optional(),
})

const sortColumns = { testDate: welderTests.testDate, welder: welders.name, process: welderTests.process, status: welderTests.status }

/** GET /api/tests: welder tests (WPQ); a welder sees only their own */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const query = await validQuery(event, querySchema)
  const db = await useDb()
  const filters: SQL[] = []
  if (user.role === 'welder') filters.push(eq(welderTests.welderId, user.welderId ?? -1))
  if (query.welderId) filters.push(eq(welderTests.welderId, query.welderId))
  if (query.status) filters.push(eq(welderTests.status, query.status))
  // A combination coupon is listed under each of its processes
  if (query.process) filters.push(or(eq(welderTests.process, query.process), arrayContains(welderTests.processes, [query.process]))!)
  if (query.q) filters.push(or(ilike(welders.name, containsPattern(query.q)), ilike(welders.stamp, containsPattern(query.q)))!)
  const where = filters.length ? and(...filters) : undefined
  const window = pageWindow(query)
  const [items, [totals]] = await Promise.all([
    db.select({
      id: welderTests.id, testDate: welderTests.testDate, status: welderTests.status, process: welderTests.process, processes: welderTests.processes,
      transfer: welderTests.transfer, form: welderTests.form, weld: welderTests.weld, positions: welderTests.positions,
      couponThickness: welderTests.couponThickness, outsideDiameter: welderTests.outsideDiameter, unit: welderTests.unit,
      code: welderTests.code, welderId: welders.id, welderName: welders.name, welderStamp: welders.stamp,
      procedureNumber: procedures.number, procedureRevision: procedures.revision,
    }).from(welderTests)
      .innerJoin(welders, eq(welders.id, welderTests.welderId))
      .leftJoin(procedures, eq(procedures.id, welderTests.procedureId))
      .where(where).orderBy(orderOf(sortColumns[query.sort], query.dir), welderTests.id)
      .limit(window.limit).offset(window.offset),
    db.select({ total: count() }).from(welderTests).innerJoin(welders, eq(welders.id, welderTests.welderId)).where(where),
  ])
  return { items, total: totals?.total ?? 0, page: query.page, pageSize: query.pageSize }
})
