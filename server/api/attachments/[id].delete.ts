import { removeFile } from '../../database/attachments'
import { idParamSchema } from '#shared/schemas/list'

/** DELETE /api/attachments/:id: remove a file from an unsigned record (its uploaders; 409 once the record is signed) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const { id } = await validParams(event, idParamSchema)
  orThrow(await removeFile(await useDb(), user, id))
  setResponseStatus(event, 204)
  return null
})
