import { idParamSchema } from '#shared/schemas/list'
import { pqrPatchSchema } from '#shared/schemas/pqr'
import { updatePqr } from '../../database/pqr-writes'

/** PATCH /api/pqrs/:id: correct a PQR before it is certified (supervisor); 409 when frozen or stale */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const { version, pqr } = await validBody(event, pqrPatchSchema)
  const row = orThrow(await updatePqr(await useDb(), id, version, pqr, user))
  return { id: row.id, number: row.number, status: row.status, version: row.version }
})
