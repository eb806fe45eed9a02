import { updateAccount } from '../../database/accounts'
import { accountPatchSchema } from '#shared/schemas/account'
import { idParamSchema } from '#shared/schemas/list'

/** PATCH /api/accounts/:id {name?, welderId?, active?}: rename, link a welder account to its roster entry, deactivate or reactivate (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const patch = await validBody(event, accountPatchSchema)
  return orThrow(await updateAccount(await useDb(), user, id, patch))
})
