import { z } from 'zod'
import { calendarDay } from '#shared/schemas/continuity-entry'
import { jointParamsSchema } from '#shared/schemas/joints'
import { checkJointOn } from '../../../../../database/joints'

const querySchema = z.object({ on: calendarDay.optional() })

/** GET /api/projects/:id/joints/:jointId/check?on=YYYY-MM-DD: the joint's WPS and welders checked on a day (today by default) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector'])
  const { id, jointId } = await validParams(event, jointParamsSchema)
  const { on } = await validQuery(event, querySchema)
  return orThrow(await checkJointOn(await useDb(), user, id, jointId, on ?? todayIso()))
})
