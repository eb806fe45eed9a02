import { eq } from 'drizzle-orm'
import { accounts, welders } from '../../database/schema'
import { idParamSchema } from '#shared/schemas/list'

/** GET /api/accounts/:id: one account (supervisor) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  const [row] = await db.select(accountViewColumns).from(accounts).leftJoin(welders, eq(welders.id, accounts.welderId)).where(eq(accounts.id, id)).limit(1)
  if (!row) throw notFound('Account')
  return { ...row, state: accountState(row) }
})
