import { listFiles } from '../../database/attachments'
import { attachmentOwnerSchema } from '#shared/schemas/attachment'

/** GET /api/attachments?recordType=&recordId=: the files of a record the caller may read (404 otherwise) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, everyone)
  const owner = await validQuery(event, attachmentOwnerSchema)
  return orThrow(await listFiles(await useDb(), user, owner))
})
