import { eq } from 'drizzle-orm'
import { continuityEntries } from '../../database/schema'
import type { Db } from '../../database/client'
import { idParamSchema } from '#shared/schemas/list'

/** DELETE /api/continuity/:id: the quality manager removes an entry logged by mistake (kept in the audit trail) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  const removed = await db.transaction(async (tx) => {
    const [row] = await tx.delete(continuityEntries).where(eq(continuityEntries.id, id)).returning()
    if (row) await recordAudit(tx as unknown as Db, { accountId: user.id, action: 'delete', recordType: 'continuity', recordId: id, before: row })
    return row
  })
  if (!removed) throw httpError(missing('Entry'))
  setResponseStatus(event, 204)
  return null
})
