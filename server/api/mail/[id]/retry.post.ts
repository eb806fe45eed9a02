import { idParamSchema } from '#shared/schemas/list'

/** POST /api/mail/:id/retry: queue a message that failed every attempt once more, and send it (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  const requeued = await db.transaction(async (tx) => {
    const done = await requeueMail(tx, id)
    if (done) await recordAudit(tx, { accountId: user.id, action: 'requeue', recordType: 'mail', recordId: id })
    return done
  })
  if (!requeued) throw httpError(missing('Failed message'))
  return sendQueuedMail(db)
})
