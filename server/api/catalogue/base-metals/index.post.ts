import { addBaseMetal } from '../../../database/catalogue'
import { baseMetalSchema } from '#shared/schemas/catalogue'

/** POST /api/catalogue/base-metals: add a base metal (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const input = await validBody(event, baseMetalSchema)
  const row = orThrow(await addBaseMetal(await useDb(), input, user.id))
  setResponseStatus(event, 201)
  return row
})
