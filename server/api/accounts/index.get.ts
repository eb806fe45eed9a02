import { listAccounts } from '../../database/accounts'
import { accountListQuerySchema } from '#shared/schemas/account'

/** GET /api/accounts: every account with its role, state and linked roster entry (supervisor) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  const query = await validQuery(event, accountListQuerySchema)
  return listAccounts(await useDb(), query)
})
