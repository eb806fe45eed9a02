import { and, count, eq, ilike, or, type SQL } from 'drizzle-orm'
import { mailMessages } from '../../database/schema'
import { mailListQuerySchema } from '#shared/schemas/mail'

/** GET /api/mail: the outbox, newest first, with each message's body and delivery state (supervisor) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  const query = await validQuery(event, mailListQuerySchema)
  const db = await useDb()
  const filters: SQL[] = []
  if (query.q) {
    const pattern = containsPattern(query.q)
    filters.push(or(ilike(mailMessages.to, pattern), ilike(mailMessages.subject, pattern))!)
  }
  if (query.status) filters.push(eq(mailMessages.status, query.status))
  if (query.kind) filters.push(eq(mailMessages.kind, query.kind))
  const where = filters.length ? and(...filters) : undefined
  const [items, [totals], byStatus] = await Promise.all([
    db.select().from(mailMessages).where(where).orderBy(orderOf(mailMessages[query.sort], query.dir), orderOf(mailMessages.id, query.dir))
      .limit(pageWindow(query).limit).offset(pageWindow(query).offset),
    db.select({ total: count() }).from(mailMessages).where(where),
    db.select({ status: mailMessages.status, n: count() }).from(mailMessages).groupBy(mailMessages.status),
  ])
  return {
    items, total: totals?.total ?? 0, page: query.page, pageSize: query.pageSize,
    counts: Object.fromEntries(byStatus.map(s => [s.status, s.n])) as Partial<Record<'queued' | 'sent' | 'failed', number>>,
    smtpConfigured: !!mailSettings().url,
    from: mailSettings().from,
    testClock: useRuntimeConfig().mailTestClock === true || String(useRuntimeConfig().mailTestClock) === 'true',
  }
})
