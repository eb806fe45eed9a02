import { and, count, eq, ilike, or, type SQL } from 'drizzle-orm'
import { accounts, welders } from '../../database/schema'
import { accountListQuerySchema } from '#shared/schemas/account'

/** GET /api/accounts: every account with its role, state and linked roster entry (supervisor) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  const query = await validQuery(event, accountListQuerySchema)
  const db = await useDb()
  const filters: SQL[] = []
  if (query.q) {
    const pattern = containsPattern(query.q)
    filters.push(or(ilike(accounts.name, pattern), ilike(accounts.email, pattern), ilike(welders.stamp, pattern))!)
  }
  if (query.role) filters.push(eq(accounts.role, query.role))
  if (query.active) filters.push(eq(accounts.active, query.active === 'true'))
  const where = filters.length ? and(...filters) : undefined
  const [items, [totals]] = await Promise.all([
    db.select(accountViewColumns).from(accounts).leftJoin(welders, eq(welders.id, accounts.welderId)).where(where)
      .orderBy(orderOf(accounts[query.sort], query.dir), accounts.id).limit(pageWindow(query).limit).offset(pageWindow(query).offset),
    db.select({ total: count() }).from(accounts).leftJoin(welders, eq(welders.id, accounts.welderId)).where(where),
  ])
  return { items: items.map(a => ({ ...a, state: accountState(a) })), total: totals?.total ?? 0, page: query.page, pageSize: query.pageSize }
})
