import { and, arrayContains, asc, count, eq, ilike, or, type SQL } from 'drizzle-orm'
import { z } from 'zod'
import { baseMetals, fillerMetals, pqrs } from '../../database/schema'
import { supportPqrs } from '../../database/pqrs'
import { listQuerySchema, processSchema } from '#shared/schemas/list'
import { pqrStatuses } from '#shared/schemas/pqr'

const querySchema = listQuerySchema(['number', 'testDate', 'process', 'status', 'couponThickness']).extend({
  status: z.enum(pqrStatuses).optional(),
  process: processSchema.optional(),
  code: z.enum(['asme-ix', 'aws-d1.1', 'aws-d1.3', 'iso-9606-1']).optional(),
  pNumber: z.string().trim().max(8).optional(),
})

/** GET /api/pqrs: PQR list with what the support check needs of each (staff) */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  const query = await validQuery(event, querySchema)
  const db = await useDb()
  const filters: SQL[] = []
  if (query.status) filters.push(eq(pqrs.status, query.status))
  if (query.process) filters.push(or(eq(pqrs.process, query.process), arrayContains(pqrs.processes, [query.process]))!)
  if (query.code) filters.push(eq(pqrs.code, query.code))
  if (query.pNumber) filters.push(eq(baseMetals.pNumber, query.pNumber))
  if (query.q) filters.push(or(ilike(pqrs.number, containsPattern(query.q)), ilike(pqrs.labReportNumber, containsPattern(query.q)))!)
  const where = filters.length ? and(...filters) : undefined
  const window = pageWindow(query)
  const [rows, [totals]] = await Promise.all([
    db.select({
      id: pqrs.id, number: pqrs.number, testDate: pqrs.testDate, code: pqrs.code, edition: pqrs.edition, unit: pqrs.unit, process: pqrs.process,
      transfer: pqrs.transfer, processes: pqrs.processes, couponThickness: pqrs.couponThickness, status: pqrs.status, labReportNumber: pqrs.labReportNumber,
      baseMetalId: pqrs.baseMetalId, baseMetal: baseMetals.specification, baseGrade: baseMetals.grade, pNumber: baseMetals.pNumber, groupNumber: baseMetals.groupNumber,
      fillerMetalId: pqrs.fillerMetalId, fillerSpecification: fillerMetals.specification, filler: fillerMetals.classification, fNumber: fillerMetals.fNumber, aNumber: fillerMetals.aNumber,
    }).from(pqrs).leftJoin(baseMetals, eq(baseMetals.id, pqrs.baseMetalId)).leftJoin(fillerMetals, eq(fillerMetals.id, pqrs.fillerMetalId))
      .where(where).orderBy(orderOf(pqrs[query.sort], query.dir), asc(pqrs.number)).limit(window.limit).offset(window.offset),
    db.select({ total: count() }).from(pqrs).leftJoin(baseMetals, eq(baseMetals.id, pqrs.baseMetalId)).where(where),
  ])
  const support = await supportPqrs(db, rows.map(r => r.id))
  // One support entry per process of the coupon (a combination PQR has several)
  const items = rows.map(r => ({ ...r, support: support.find(s => s.id === r.id)!, supports: support.filter(s => s.id === r.id) }))
  return { items, total: totals?.total ?? 0, page: query.page, pageSize: query.pageSize }
})
