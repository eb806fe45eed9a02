import { endSessionsSchema } from '#shared/schemas/sessions'

/** POST /api/me/sign-out-everywhere {confirm: true}: ends every session of one's own account, this one included (any role) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, everyone)
  await validBody(event, endSessionsSchema)
  const db = await useDb()
  await db.transaction(async (tx) => {
    await endSessions(tx, user.id)
    await recordAudit(tx, { accountId: user.id, action: 'sign-out-everywhere', recordType: 'account', recordId: user.id })
  })
  return { signedOut: true }
})
