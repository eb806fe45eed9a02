import { equipmentListQuerySchema } from '#shared/schemas/equipment'
import { listEquipment } from '../../database/equipment'

/** GET /api/equipment: the register of welding machines and meters with where each calibration stands today */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const query = await validQuery(event, equipmentListQuerySchema)
  return listEquipment(await useDb(), query, todayIso())
})
