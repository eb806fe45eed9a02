import { idParamSchema } from '#shared/schemas/list'
import { packetStatus } from '../../database/packets'

/** GET /api/packets/:id: where a packet build stands (status, progress, pages); for polling */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'auditor'])
  const { id } = await validParams(event, idParamSchema)
  const row = orThrow(await packetStatus(await useDb(), user, id))
  setResponseHeader(event, 'cache-control', 'no-store')
  return row
})
