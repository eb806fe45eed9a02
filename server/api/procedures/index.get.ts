import { and, arrayContains, count, eq, ilike, or, sql, type SQL } from 'drizzle-orm'
import { z } from 'zod'
import { procedures } from '../../database/schema'
import { listQuerySchema, processSchema } from '#shared/schemas/list'

const querySchema = listQuerySchema(['number', 'title', 'process', 'status', 'updatedAt']).extend({
  status: z.enum(['draft', 'approved', 'superseded']).optional(),
  process: processSchema.optional(),
  code: z.enum(['asme-ix', 'aws-d1.1', 'aws-d1.3', 'iso-9606-1']).optional(),
  pNumber: z.string().trim().max(8).optional(),
  thickness: z.coerce.number().positive().max(1000).optional(),
})

/** GET /api/procedures: WPS list; welders see approved procedures only */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const query = await validQuery(event, querySchema)
  const db = await useDb()
  const filters: SQL[] = []
  if (user.role === 'welder') filters.push(eq(procedures.status, 'approved'))
  if (query.status) filters.push(eq(procedures.status, query.status))
  // A WPS with a layer of the process (the process column is its first layer's)
  if (query.process) filters.push(or(eq(procedures.process, query.process), arrayContains(procedures.processes, [query.process]))!)
  if (query.code) filters.push(eq(procedures.code, query.code))
  if (query.pNumber) filters.push(or(eq(procedures.pNumberA, query.pNumber), eq(procedures.pNumberB, query.pNumber))!)
  if (query.thickness) filters.push(sql`${procedures.thicknessMin} <= ${query.thickness} and ${procedures.thicknessMax} >= ${query.thickness}`)
  if (query.q) filters.push(or(ilike(procedures.number, containsPattern(query.q)), ilike(procedures.title, containsPattern(query.q)))!)
  const where = filters.length ? and(...filters) : undefined
  // The current revision of a number is its highest approved one. The outer row is named in full: drizzle prints
  // columns of a one-table query unqualified, which inside the subquery would bind to p2.
  const current = sql<boolean>`${procedures.status} = 'approved' and ${procedures.revision} = (
    select max(p2.revision) from procedures p2 where p2.number = "procedures"."number" and p2.status = 'approved')`
  const window = pageWindow(query)
  const [items, [totals]] = await Promise.all([
    db.select({
      id: procedures.id, number: procedures.number, revision: procedures.revision, title: procedures.title, code: procedures.code,
      edition: procedures.edition, status: procedures.status, unit: procedures.unit, process: procedures.process, processes: procedures.processes, transfer: procedures.transfer,
      pNumberA: procedures.pNumberA, pNumberB: procedures.pNumberB, thicknessMin: procedures.thicknessMin, thicknessMax: procedures.thicknessMax,
      positions: procedures.positions, updatedAt: procedures.updatedAt, current,
    }).from(procedures).where(where).orderBy(orderOf(procedures[query.sort], query.dir), procedures.number, procedures.revision)
      .limit(window.limit).offset(window.offset),
    db.select({ total: count() }).from(procedures).where(where),
  ])
  return { items, total: totals?.total ?? 0, page: query.page, pageSize: query.pageSize }
})
