import { signOutEverywhere } from '../../database/accounts'
import { endSessionsSchema } from '#shared/schemas/sessions'

/** POST /api/me/sign-out-everywhere {confirm: true}: ends every session of one's own account, this one included (any role) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, everyone)
  await validBody(event, endSessionsSchema)
  return orThrow(await signOutEverywhere(await useDb(), user, user.id))
})
