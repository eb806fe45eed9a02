import { updateFillerMetal } from '../../../database/catalogue'
import { fillerMetalPatchSchema } from '#shared/schemas/catalogue'
import { idParamSchema } from '#shared/schemas/list'

/** PATCH /api/catalogue/filler-metals/:id: correct a filler metal (supervisor); 409 once a signed PQR relies on it */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const patch = await validBody(event, fillerMetalPatchSchema)
  return orThrow(await updateFillerMetal(await useDb(), id, patch, user.id))
})
