import { signOutEverywhere } from '../../../database/accounts'
import { endSessionsSchema } from '#shared/schemas/sessions'
import { idParamSchema } from '#shared/schemas/list'

/** POST /api/accounts/:id/sign-out {confirm: true}: ends every session of an account on every device (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  await validBody(event, endSessionsSchema)
  return orThrow(await signOutEverywhere(await useDb(), user, id))
})
