import { idParamSchema } from '#shared/schemas/list'
import { pqrDetail } from '../../database/pqrs'

/** GET /api/pqrs/:id: one PQR with its values, results, signatures and the ranges it qualifies (staff) */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await pqrDetail(await useDb(), id))
})
