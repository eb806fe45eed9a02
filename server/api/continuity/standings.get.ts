import { and, asc, eq, ilike, or, type SQL } from 'drizzle-orm'
import { z } from 'zod'
import { welders } from '../../database/schema'
import { processSchema } from '#shared/schemas/list'
import { renewalOf } from '#shared/qualification/renewal'

const querySchema = z.object({
  process: processSchema.optional(),
  standing: z.enum(['current', 'lapsing', 'lapsed']).optional(),
  q: z.string().trim().max(100, 'At most 100 characters').optional(),
  limit: z.coerce.number().int().min(1).max(2000).default(300),
})

/** GET /api/continuity/standings: each active welder × process, soonest lapse first (the first `limit`, with the total): last use, lapse date, days left, how to renew (staff) */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  const query = await validQuery(event, querySchema)
  const db = await useDb()
  const filters: SQL[] = [eq(welders.status, 'active')]
  if (query.q) filters.push(or(ilike(welders.name, containsPattern(query.q)), ilike(welders.stamp, containsPattern(query.q)))!)
  const roster = await db.select({ id: welders.id, name: welders.name, stamp: welders.stamp }).from(welders).where(and(...filters)).orderBy(asc(welders.stamp))
  const today = todayIso()
  const standings = await standingsOfWelders(db, roster.map(w => w.id), today)
  const rows = roster.flatMap(w => (standings.get(w.id) ?? []).map(s => ({
    ...s, welderId: w.id, welderName: w.name, welderStamp: w.stamp, renewal: s.standing === 'lapsed' ? renewalOf[s.code] : null,
  })))
    .filter(r => (!query.process || r.process === query.process) && (!query.standing || r.standing === query.standing))
    .sort((a, b) => a.lapsesOn.localeCompare(b.lapsesOn) || a.welderStamp.localeCompare(b.welderStamp))
  return { today, rows: rows.slice(0, query.limit), total: rows.length }
})
