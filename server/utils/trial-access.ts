import type { H3Event } from 'h3'
import type { Role } from '#shared/utils/roles'
import { mayUseTrials } from '../database/trials'

/** requireRole, then the shop's choice whether welders record trials (403 while it does not). */
export async function requireTrialUser(event: H3Event, roles: readonly Role[] = ['supervisor', 'inspector', 'welder']) {
  const user = await requireRole(event, roles)
  orThrow(await mayUseTrials(await useDb(), user))
  return user
}
