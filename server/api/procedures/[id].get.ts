import { idParamSchema } from '#shared/schemas/list'
import { procedurePage } from '../../database/procedures'

/** GET /api/procedures/:id: one WPS with supporting PQRs, signatures, revisions and the live support check; welders read approved ones only */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await procedurePage(await useDb(), user, id))
})
