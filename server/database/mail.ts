import { count, eq, ilike, or } from 'drizzle-orm'
import type { z } from 'zod'
import type { Db } from './client'
import { mailMessages } from './schema'
import { recordAudit } from './audit'
import type { SessionUser } from '../utils/auth'
import { allOf, containsPattern, orderOf, pageOf } from '../utils/list'
import { requeueMail, sendQueuedMail } from '../utils/mail'
import { missing } from '../../shared/types/outcome'
import type { mailListQuerySchema } from '../../shared/schemas/mail'

// The outbox as the quality manager reads it. Queueing and sending live in server/utils/mail.ts (the mail tasks use them).

/**
 * The outbox, newest first, with each message's body and delivery state. A one-time link is a credential: unless
 * `showLinks` (a development or test server), the links in the bodies are hidden.
 */
export async function listOutbox(db: Db, query: z.infer<typeof mailListQuerySchema>, showLinks: boolean) {
  const pattern = query.q ? containsPattern(query.q) : ''
  const where = allOf([
    query.q && or(ilike(mailMessages.to, pattern), ilike(mailMessages.subject, pattern)),
    query.status && eq(mailMessages.status, query.status),
    query.kind && eq(mailMessages.kind, query.kind),
  ])
  const [page, byStatus] = await Promise.all([
    pageOf(query, ({ limit, offset }) => db.select().from(mailMessages).where(where)
      .orderBy(orderOf(mailMessages[query.sort], query.dir), orderOf(mailMessages.id, query.dir)).limit(limit).offset(offset),
    () => db.select({ total: count() }).from(mailMessages).where(where)),
    db.select({ status: mailMessages.status, n: count() }).from(mailMessages).groupBy(mailMessages.status),
  ])
  const hide = (body: string) => body.replace(/(set-password\?token=)[\w-]+/g, '$1hidden')
  return {
    ...page,
    items: showLinks ? page.items : page.items.map(m => ({ ...m, text: hide(m.text), html: hide(m.html) })),
    linksHidden: !showLinks,
    counts: Object.fromEntries(byStatus.map(s => [s.status, s.n])) as Partial<Record<'queued' | 'sent' | 'failed', number>>,
  }
}

/** Queues a message that failed every attempt once more, and sends the queue. */
export async function retryMail(db: Db, user: SessionUser, id: number) {
  const requeued = await db.transaction(async (tx) => {
    const done = await requeueMail(tx, id)
    if (done) await recordAudit(tx, { accountId: user.id, action: 'requeue', recordType: 'mail', recordId: id })
    return done
  })
  if (!requeued) return missing('Failed message')
  return sendQueuedMail(db)
}
