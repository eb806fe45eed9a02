import type { Db } from '../database/client'
import { auditEvents } from '../database/schema'

/** Every change records who, what, when, before and after. Pass the transaction the change runs in. */
export async function recordAudit(db: Db, event: { accountId: number | null, action: string, recordType: string, recordId?: number | null, before?: unknown, after?: unknown }) {
  await db.insert(auditEvents).values({
    accountId: event.accountId, action: event.action, recordType: event.recordType, recordId: event.recordId ?? null,
    before: event.before ?? null, after: event.after ?? null,
  })
}
