import { z } from 'zod'
import { detach } from '../../../../database/projects'

const paramsSchema = z.object({ id: z.coerce.number().int().positive().max(2_147_483_647), procedureId: z.coerce.number().int().positive().max(2_147_483_647) })

/** DELETE /api/projects/:id/procedures/:procedureId: detach a procedure (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const params = await validParams(event, paramsSchema)
  return orThrow(await detach(await useDb(), params.id, 'procedure', params.procedureId, user.id))
})
