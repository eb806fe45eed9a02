import { z } from 'zod'
import { detach } from '../../../../database/projects'

const paramsSchema = z.object({ id: z.coerce.number().int().positive().max(2_147_483_647), welderId: z.coerce.number().int().positive().max(2_147_483_647) })

/** DELETE /api/projects/:id/welders/:welderId: detach a welder (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const params = await validParams(event, paramsSchema)
  return orThrow(await detach(await useDb(), params.id, 'welder', params.welderId, user.id))
})
