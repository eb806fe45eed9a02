import { and, count, desc, eq, type SQL } from 'drizzle-orm'
import { z } from 'zod'
import { accounts, auditEvents } from '../../database/schema'

const querySchema = z.object({
  recordType: z.string().trim().min(1).max(40).regex(/^[a-z-]+$/, 'Lower-case letters and dashes').optional(),
  recordId: z.coerce.number().int().positive().max(2_147_483_647).optional(),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
})

/** GET /api/audit: the audit trail, newest first, optionally of one record (supervisor) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  const query = await validQuery(event, querySchema)
  const db = await useDb()
  const filters: SQL[] = []
  if (query.recordType) filters.push(eq(auditEvents.recordType, query.recordType))
  if (query.recordId) filters.push(eq(auditEvents.recordId, query.recordId))
  const where = filters.length ? and(...filters) : undefined
  const window = pageWindow(query)
  const [items, [totals]] = await Promise.all([
    db.select({
      id: auditEvents.id, at: auditEvents.at, action: auditEvents.action, recordType: auditEvents.recordType, recordId: auditEvents.recordId,
      before: auditEvents.before, after: auditEvents.after, who: accounts.name,
    }).from(auditEvents).leftJoin(accounts, eq(accounts.id, auditEvents.accountId))
      .where(where).orderBy(desc(auditEvents.at), desc(auditEvents.id)).limit(window.limit).offset(window.offset),
    db.select({ total: count() }).from(auditEvents).where(where),
  ])
  return { items, total: totals?.total ?? 0, page: query.page, pageSize: query.pageSize }
})
