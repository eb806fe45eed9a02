import { addFillerMetal } from '../../../database/catalogue'
import { fillerMetalSchema } from '#shared/schemas/catalogue'

/** POST /api/catalogue/filler-metals: add a filler metal (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const input = await validBody(event, fillerMetalSchema)
  const row = orThrow(await addFillerMetal(await useDb(), input, user.id))
  setResponseStatus(event, 201)
  return row
})
