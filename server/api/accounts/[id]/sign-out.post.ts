import { endSessionsSchema } from '#shared/schemas/sessions'
import { idParamSchema } from '#shared/schemas/list'

/** POST /api/accounts/:id/sign-out {confirm: true}: ends every session of an account on every device (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  await validBody(event, endSessionsSchema)
  const db = await useDb()
  const done = await db.transaction(async (tx) => {
    if (!await accountExists(tx, id)) return false
    await endSessions(tx, id)
    await recordAudit(tx, { accountId: user.id, action: 'sign-out-everywhere', recordType: 'account', recordId: id })
    return true
  })
  if (!done) throw notFound('Account')
  return { signedOut: true }
})
