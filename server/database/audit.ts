import type { Db } from './client'
import { count, desc, eq } from 'drizzle-orm'
import { accounts, auditEvents } from './schema'
import { allOf, pageOf } from '../utils/list'
import type { AuditQuery } from '../../shared/schemas/list-queries'

/** Every change records who, what, when, before and after. Pass the transaction the change runs in. */
export async function recordAudit(db: Db, event: { accountId: number | null, action: string, recordType: string, recordId?: number | null, before?: unknown, after?: unknown }) {
  await db.insert(auditEvents).values({
    accountId: event.accountId, action: event.action, recordType: event.recordType, recordId: event.recordId ?? null,
    before: event.before ?? null, after: event.after ?? null,
  })
}

/** The audit trail, newest first, optionally of one record. */
export async function listAudit(db: Db, query: AuditQuery) {
  const where = allOf([
    query.recordType && eq(auditEvents.recordType, query.recordType),
    query.recordId && eq(auditEvents.recordId, query.recordId),
  ])
  return pageOf(query, ({ limit, offset }) => db.select({
    id: auditEvents.id, at: auditEvents.at, action: auditEvents.action, recordType: auditEvents.recordType, recordId: auditEvents.recordId,
    before: auditEvents.before, after: auditEvents.after, who: accounts.name,
  }).from(auditEvents).leftJoin(accounts, eq(accounts.id, auditEvents.accountId))
    .where(where).orderBy(desc(auditEvents.at), desc(auditEvents.id)).limit(limit).offset(offset),
  () => db.select({ total: count() }).from(auditEvents).where(where))
}
