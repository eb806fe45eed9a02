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
  // A one-time link is a credential: a supervisor reading the outbox must not be able to take over the account
  // it was sent for. Only a development or test server (NUXT_MAIL_SHOW_LINKS=true) shows them.
  const showLinks = String(useRuntimeConfig().mailShowLinks) === 'true'
  const hide = (body: string) => body.replace(/(set-password\?token=)[\w-]+/g, '$1hidden')
  return {
    items: showLinks ? items : items.map(m => ({ ...m, text: hide(m.text), html: hide(m.html) })),
    linksHidden: !showLinks,
    total: totals?.total ?? 0, page: query.page, pageSize: query.pageSize,
    counts: Object.fromEntries(byStatus.map(s => [s.status, s.n])) as Partial<Record<'queued' | 'sent' | 'failed', number>>,
    smtpConfigured: !!mailSettings().url,
    from: mailSettings().from,
    testClock: useRuntimeConfig().mailTestClock === true || String(useRuntimeConfig().mailTestClock) === 'true',
  }
})
