import { idParamSchema } from '#shared/schemas/list'
import { readingSchema } from '#shared/schemas/reading'
import { recordReading } from '../../../database/procedure-writes'

/** POST /api/procedures/:id/readings: production readings checked against the window of an approved WPS */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  const input = await validBody(event, readingSchema)
  const saved = orThrow(await recordReading(await useDb(), id, input, user))
  setResponseStatus(event, 201)
  return saved
})
