import { pqrDraftSchema } from '#shared/schemas/pqr'
import { createPqr } from '../../database/pqr-writes'

/** POST /api/pqrs: record a PQR coupon as welded (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const draft = await validBody(event, pqrDraftSchema)
  const row = orThrow(await createPqr(await useDb(), draft, user))
  setResponseStatus(event, 201)
  return { id: row.id, number: row.number, status: row.status, version: row.version }
})
