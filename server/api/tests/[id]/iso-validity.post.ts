import { addIsoValidityRecord } from '../../../database/iso-validity'
import { idParamSchema } from '#shared/schemas/list'
import { isoValidityRecordSchema } from '#shared/schemas/iso-validity'

/** POST /api/tests/:id/iso-validity: sign a 9.2 confirmation or a 9.3 b) production-weld record (welding coordinator or examiner) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector'])
  const { id } = await validParams(event, idParamSchema)
  const body = await validBody(event, isoValidityRecordSchema)
  return orThrow(await addIsoValidityRecord(await useDb(), id, body, user, todayIso()))
})
