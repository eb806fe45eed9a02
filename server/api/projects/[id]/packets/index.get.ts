import { idParamSchema } from '#shared/schemas/list'
import { projectPackets } from '../../../../database/packets'

/** GET /api/projects/:id/packets: the packets built for a project, newest first (quality manager, granted auditor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'auditor'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await projectPackets(await useDb(), user, id))
})
