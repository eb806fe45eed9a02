import { and, count, eq, ilike, or, type SQL } from 'drizzle-orm'
import { z } from 'zod'
import { welders } from '../../database/schema'
import { listQuerySchema } from '#shared/schemas/list'

const querySchema = listQuerySchema(['name', 'stamp', 'employeeNumber', 'status']).extend({
  status: z.enum(['active', 'inactive']).optional(),
})

/** GET /api/welders: the roster, paged, sorted and filtered (supervisor, inspector) */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  const query = await validQuery(event, querySchema)
  const db = await useDb()
  const filters: SQL[] = []
  if (query.q) {
    const pattern = containsPattern(query.q)
    filters.push(or(ilike(welders.name, pattern), ilike(welders.stamp, pattern), ilike(welders.employeeNumber, pattern))!)
  }
  if (query.status) filters.push(eq(welders.status, query.status))
  const where = filters.length ? and(...filters) : undefined
  const [items, [totals]] = await Promise.all([
    db.select({
      id: welders.id, name: welders.name, stamp: welders.stamp, employeeNumber: welders.employeeNumber, status: welders.status,
      email: welders.email, version: welders.version, createdAt: welders.createdAt, updatedAt: welders.updatedAt,
    }).from(welders).where(where).orderBy(orderOf(welders[query.sort], query.dir), welders.id)
      .limit(pageWindow(query).limit).offset(pageWindow(query).offset),
    db.select({ total: count() }).from(welders).where(where),
  ])
  const standings = await standingsOfWelders(db, items.map(w => w.id))
  return {
    items: items.map(w => ({ ...w, standings: standings.get(w.id) ?? [] })),
    total: totals?.total ?? 0, page: query.page, pageSize: query.pageSize,
  }
})
