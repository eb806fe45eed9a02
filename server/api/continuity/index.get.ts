import { and, count, eq, gte, ilike, lte, or, type SQL } from 'drizzle-orm'
import { z } from 'zod'
import { accounts, continuityEntries, welders } from '../../database/schema'
import { calendarDate } from '#shared/schemas/fields'
import { listQuerySchema, processSchema } from '#shared/schemas/list'

const isoDate = calendarDate('Date', { format: 'Use YYYY-MM-DD' })
const querySchema = listQuerySchema(['weldedOn', 'welder', 'process']).extend({
  process: processSchema.optional(),
  welderId: z.coerce.number().int().positive().max(2_147_483_647).optional(),
  from: isoDate.optional(),
  to: isoDate.optional(),
})

const sortColumns = { weldedOn: continuityEntries.weldedOn, welder: welders.name, process: continuityEntries.process }

/** GET /api/continuity: the continuity log; a welder sees only their own entries */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const query = await validQuery(event, querySchema)
  const db = await useDb()
  const filters: SQL[] = []
  if (user.role === 'welder') filters.push(eq(continuityEntries.welderId, user.welderId ?? -1))
  if (query.welderId) filters.push(eq(continuityEntries.welderId, query.welderId))
  if (query.process) filters.push(eq(continuityEntries.process, query.process))
  if (query.from) filters.push(gte(continuityEntries.weldedOn, query.from))
  if (query.to) filters.push(lte(continuityEntries.weldedOn, query.to))
  if (query.q) filters.push(or(ilike(welders.name, containsPattern(query.q)), ilike(continuityEntries.reference, containsPattern(query.q)))!)
  const where = filters.length ? and(...filters) : undefined
  const window = pageWindow(query)
  const [items, [totals]] = await Promise.all([
    db.select({
      id: continuityEntries.id, weldedOn: continuityEntries.weldedOn, process: continuityEntries.process, reference: continuityEntries.reference,
      welderId: welders.id, welderName: welders.name, welderStamp: welders.stamp, recordedBy: accounts.name,
    }).from(continuityEntries)
      .innerJoin(welders, eq(welders.id, continuityEntries.welderId))
      .leftJoin(accounts, eq(accounts.id, continuityEntries.recordedBy))
      .where(where).orderBy(orderOf(sortColumns[query.sort], query.dir), continuityEntries.id)
      .limit(window.limit).offset(window.offset),
    db.select({ total: count() }).from(continuityEntries).innerJoin(welders, eq(welders.id, continuityEntries.welderId)).where(where),
  ])
  return { items, total: totals?.total ?? 0, page: query.page, pageSize: query.pageSize }
})
