import { idParamSchema } from '#shared/schemas/list'
import { welderRejectRate } from '../../../database/joints'

/** GET /api/welders/:id/rejects: the welder's reject rate by joints and RT length, with its trend; a welder only their own */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await welderRejectRate(await useDb(), user, id, todayIso()))
})
