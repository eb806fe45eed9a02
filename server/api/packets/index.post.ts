import { z } from 'zod'
import { requestPacket } from '../../database/packets'
import { publicOrigin } from '../../sheets/sheets'

const bodySchema = z.object({ projectId: z.number({ required_error: 'projectId is required', invalid_type_error: 'projectId must be a number' }).int().positive().max(2_147_483_647) }).strict()

/** POST /api/packets: start building a project's packet; answers 202 with the job to poll (quality manager, granted auditor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'auditor'])
  const { projectId } = await validBody(event, bodySchema)
  const packet = orThrow(await requestPacket(await useDb(), user, projectId, publicOrigin(event)))
  setResponseStatus(event, 202)
  return packet
})
