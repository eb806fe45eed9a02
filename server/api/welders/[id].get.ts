import { welderPage } from '../../database/welders'
import { idParamSchema } from '#shared/schemas/list'

/** GET /api/welders/:id: one welder with linked account, tests, continuity and standings; a welder may read only their own (404 otherwise) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await welderPage(await useDb(), user, id))
})
