import { idParamSchema } from '#shared/schemas/list'
import { equipmentPage } from '../../database/equipment'

/** GET /api/equipment/:id: one machine or meter, its calibration today and the readings taken with it */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await equipmentPage(await useDb(), id, todayIso()))
})
