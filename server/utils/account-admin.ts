import { and, eq, gt, isNull, sql } from 'drizzle-orm'
import type { Db } from '../database/client'
import { accountTokens, accounts, welders } from '../database/schema'

/** The columns of an account as the accounts screens show it (never the password hash). */
export const accountViewColumns = {
  id: accounts.id, email: accounts.email, name: accounts.name, role: accounts.role, active: accounts.active, createdAt: accounts.createdAt,
  welderId: accounts.welderId, welderStamp: welders.stamp, welderName: welders.name,
  hasPassword: sql<boolean>`${accounts.passwordHash} is not null`,
  invitationExpiresAt: sql<string | null>`(select max(${accountTokens.expiresAt}) from ${accountTokens} where ${and(
    eq(accountTokens.accountId, accounts.id), eq(accountTokens.purpose, 'invitation'), isNull(accountTokens.usedAt), gt(accountTokens.expiresAt, sql`now()`),
  )})`,
}

export type AccountState = 'active' | 'invited' | 'deactivated'

export function accountState(row: { active: boolean, hasPassword: boolean }): AccountState {
  if (!row.active) return 'deactivated'
  return row.hasPassword ? 'active' : 'invited'
}

/** A 409 that names the field, so the form can show it beside the input. */
export function fieldConflict(field: string, message: string) {
  return createError({ statusCode: 409, statusMessage: 'Conflict', message, data: { formErrors: [], fieldErrors: { [field]: [message] } } })
}

/** The roster entry exists and no other account is linked to it. */
export async function assertLinkableWelder(db: Db, welderId: number, exceptAccountId?: number) {
  const [welder] = await db.select({ id: welders.id }).from(welders).where(eq(welders.id, welderId)).limit(1)
  if (!welder) throw createError({ statusCode: 400, statusMessage: 'Invalid body', message: 'welderId: no such welder on the roster', data: { formErrors: [], fieldErrors: { welderId: ['No such welder on the roster'] } } })
  const [linked] = await db.select({ id: accounts.id, email: accounts.email }).from(accounts).where(eq(accounts.welderId, welderId)).limit(1)
  if (linked && linked.id !== exceptAccountId) throw fieldConflict('welderId', `This welder is already linked to the account ${linked.email}`)
}
