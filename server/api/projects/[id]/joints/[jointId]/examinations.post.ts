import { jointExaminationSchema, jointParamsSchema } from '#shared/schemas/joints'
import { addExamination } from '../../../../../database/joints'

/** POST /api/projects/:id/joints/:jointId/examinations: an examination result of the weld or a repair (inspector, quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector'])
  const { id, jointId } = await validParams(event, jointParamsSchema)
  const input = await validBody(event, jointExaminationSchema)
  const row = orThrow(await addExamination(await useDb(), user, id, jointId, input, todayIso()))
  setResponseStatus(event, 201)
  return row
})
