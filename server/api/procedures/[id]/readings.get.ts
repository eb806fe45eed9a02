import { idParamSchema } from '#shared/schemas/list'
import { readingsPage } from '../../../database/procedure-writes'

/** GET /api/procedures/:id/readings: the readings kept against a WPS (a welder sees their own) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await readingsPage(await useDb(), user, id))
})
