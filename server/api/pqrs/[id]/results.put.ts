import { idParamSchema } from '#shared/schemas/list'
import { pqrResultsSchema } from '#shared/schemas/pqr'
import { recordResults } from '../../../database/pqr-writes'

/** PUT /api/pqrs/:id/results: tensile, bend and toughness results, judged by the rules (inspector); 409 once certified */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['inspector'])
  const { id } = await validParams(event, idParamSchema)
  const results = await validBody(event, pqrResultsSchema)
  const row = orThrow(await recordResults(await useDb(), id, results, user))
  return { id: row.id, number: row.number, status: row.status, version: row.version }
})
