import type { H3Event } from 'h3'
import { eq } from 'drizzle-orm'
import { getServerSession } from '#auth'
import { accounts } from '../database/schema'

export interface SessionUser {
  id: number
  name: string
  email: string
  role: Role
  welderId: number | null
}

/**
 * The first line of every API route: 401 when signed out, 403 when the role may not use it.
 * The role is read from the account row, so a changed or deactivated account takes effect at once.
 */
export async function requireRole(event: H3Event, allowed: readonly Role[]): Promise<SessionUser> {
  const session = await getServerSession(event)
  const id = session?.user?.id
  if (!id) throw createError({ statusCode: 401, statusMessage: 'Sign in first' })
  const cached = event.context.rootfaceUser as SessionUser | undefined
  const user = cached ?? await loadUser(id)
  if (!user) throw createError({ statusCode: 401, statusMessage: 'Sign in first' })
  event.context.rootfaceUser = user
  if (!allowed.includes(user.role)) throw createError({ statusCode: 403, statusMessage: 'Your role may not do this' })
  return user
}

async function loadUser(id: number): Promise<SessionUser | null> {
  const db = await useDb()
  const [row] = await db.select({
    id: accounts.id, name: accounts.name, email: accounts.email, role: accounts.role, welderId: accounts.welderId, active: accounts.active,
  }).from(accounts).where(eq(accounts.id, id)).limit(1)
  if (!row?.active || !isRole(row.role)) return null
  return { id: row.id, name: row.name, email: row.email, role: row.role, welderId: row.welderId }
}

export const everyone = roles
export const staff = ['supervisor', 'inspector'] as const
