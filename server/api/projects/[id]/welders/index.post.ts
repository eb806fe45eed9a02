import { idParamSchema } from '#shared/schemas/list'
import { attachWelderSchema } from '#shared/schemas/project'
import { attach } from '../../../../database/projects'

/** POST /api/projects/:id/welders: attach a welder to the project (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const { welderId } = await validBody(event, attachWelderSchema)
  return orThrow(await attach(await useDb(), id, 'welder', welderId, user.id))
})
