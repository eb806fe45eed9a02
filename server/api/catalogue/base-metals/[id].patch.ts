import { updateBaseMetal } from '../../../database/catalogue'
import { baseMetalPatchSchema } from '#shared/schemas/catalogue'
import { idParamSchema } from '#shared/schemas/list'

/** PATCH /api/catalogue/base-metals/:id: correct a base metal (supervisor); 409 once a signed PQR relies on it */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const patch = await validBody(event, baseMetalPatchSchema)
  return orThrow(await updateBaseMetal(await useDb(), id, patch, user.id))
})
