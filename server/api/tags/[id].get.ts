import { idParamSchema } from '#shared/schemas/list'
import { jointTag } from '../../database/joints'

/** GET /api/tags/:id: a joint's tag as opened from its QR code: the joint, its WPS and whether the reader may weld it today */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder', 'auditor'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await jointTag(await useDb(), user, id, todayIso()))
})
