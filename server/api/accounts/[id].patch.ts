import { and, count, eq, isNull, ne } from 'drizzle-orm'
import { accountTokens, accounts } from '../../database/schema'
import { accountPatchSchema } from '#shared/schemas/account'
import { idParamSchema } from '#shared/schemas/list'

/** PATCH /api/accounts/:id {name?, welderId?, active?}: rename, link a welder account to its roster entry, deactivate or reactivate (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const patch = await validBody(event, accountPatchSchema)
  const db = await useDb()
  const [before] = await db.select({ id: accounts.id, name: accounts.name, role: accounts.role, welderId: accounts.welderId, active: accounts.active })
    .from(accounts).where(eq(accounts.id, id)).limit(1)
  if (!before) throw notFound('Account')

  if (patch.welderId !== undefined) {
    if (before.role !== 'welder') {
      throw createError({ statusCode: 400, statusMessage: 'Invalid body', message: 'welderId: only a welder account links to the roster', data: { formErrors: [], fieldErrors: { welderId: ['Only a welder account links to the roster'] } } })
    }
    await assertLinkableWelder(db, patch.welderId, id)
  }
  if (patch.active === false && before.active) {
    if (id === user.id) throw fieldConflict('active', 'You cannot deactivate your own account')
    if (before.role === 'supervisor') {
      const [others] = await db.select({ n: count() }).from(accounts)
        .where(and(eq(accounts.role, 'supervisor'), eq(accounts.active, true), ne(accounts.id, id)))
      if (!others?.n) throw fieldConflict('active', 'This is the last active quality manager account')
    }
  }

  const after = await db.transaction(async (tx) => {
    const [row] = await tx.update(accounts).set({
      ...(patch.name !== undefined ? { name: patch.name } : {}),
      ...(patch.welderId !== undefined ? { welderId: patch.welderId } : {}),
      ...(patch.active !== undefined ? { active: patch.active } : {}),
    }).where(eq(accounts.id, id)).returning({ id: accounts.id, name: accounts.name, role: accounts.role, welderId: accounts.welderId, active: accounts.active })
    // A deactivated account's open links stop working at once.
    if (patch.active === false) await tx.delete(accountTokens).where(and(eq(accountTokens.accountId, id), isNull(accountTokens.usedAt)))
    // Deactivation, reactivation and a new welder link end the account's sessions (a reactivated account signs in afresh).
    if ((patch.active !== undefined && patch.active !== before.active) || (patch.welderId !== undefined && patch.welderId !== before.welderId)) await endSessions(tx, id)
    await recordAudit(tx, { accountId: user.id, action: patch.active === false ? 'deactivate' : patch.active === true && !before.active ? 'reactivate' : 'update', recordType: 'account', recordId: id, before, after: row })
    return row!
  })
  return after
})
