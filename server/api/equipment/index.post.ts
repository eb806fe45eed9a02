import { equipmentSchema } from '#shared/schemas/equipment'
import { createEquipment } from '../../database/equipment'

/** POST /api/equipment: a machine or meter into the register (staff) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const input = await validBody(event, equipmentSchema)
  const row = orThrow(await createEquipment(await useDb(), input, user))
  setResponseStatus(event, 201)
  return row
})
