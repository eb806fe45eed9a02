import { idParamSchema } from '#shared/schemas/list'
import { equipmentPatchSchema } from '#shared/schemas/equipment'
import { updateEquipment } from '../../database/equipment'

/** PATCH /api/equipment/:id: change an entry or record a new calibration (staff); a stale version is a 409 */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const { id } = await validParams(event, idParamSchema)
  const input = await validBody(event, equipmentPatchSchema)
  return orThrow(await updateEquipment(await useDb(), id, input, user))
})
