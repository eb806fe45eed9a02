import { startingPointSchema } from '#shared/schemas/trials'
import { addStartingPoint } from '../../../database/trials'

/** POST /api/trials/starting-points: a row of starting settings, with where it comes from (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const input = await validBody(event, startingPointSchema)
  setResponseStatus(event, 201)
  return addStartingPoint(await useDb(), user, input)
})
