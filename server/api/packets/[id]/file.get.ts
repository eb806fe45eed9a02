import { idParamSchema } from '#shared/schemas/list'
import { packetDownload } from '../../../database/packets'
import { sendPdf } from '../../../sheets/sheets'

/** GET /api/packets/:id/file: the finished packet PDF; every download goes into the audit trail */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'auditor'])
  const { id } = await validParams(event, idParamSchema)
  const { content, fileName } = orThrow(await packetDownload(await useDb(), user, id))
  return sendPdf(event, content, fileName)
})
