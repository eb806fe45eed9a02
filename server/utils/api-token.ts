import type { H3Event } from 'h3'
import { checkApiToken } from '../database/api-tokens'
import type { TokenScope } from '../../shared/vocabulary/joints'
import type { SessionUser } from './auth'

/**
 * The first line of a route for other shop systems: the bearer token checked for its scope and rate (401/403/429).
 * Answers the token and the account the writes are recorded under (the supervisor who created it, acting as the token).
 */
export async function requireToken(event: H3Event, scope: TokenScope) {
  const header = getRequestHeader(event, 'authorization') ?? ''
  const token = /^Bearer\s+(\S+)$/i.exec(header)?.[1] ?? null
  const checked = await checkApiToken(await useDb(), token, scope)
  if (!checked.ok) {
    if (checked.status === 429) setResponseHeader(event, 'retry-after', 60)
    throw createError({ statusCode: checked.status, statusMessage: checked.message })
  }
  const user: SessionUser = { id: checked.token.createdBy, name: `API token “${checked.token.name}”`, email: '', role: 'inspector', welderId: null }
  return { token: checked.token, user }
}
