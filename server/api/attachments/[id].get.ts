import { readFile } from '../../database/attachments'
import { idParamSchema } from '#shared/schemas/list'

/** GET /api/attachments/:id: download the file, as an attachment, if the caller may read its record (404 otherwise) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, everyone)
  const { id } = await validParams(event, idParamSchema)
  const { file, data } = orThrow(await readFile(await useDb(), user, id))
  setResponseHeaders(event, {
    'content-type': file.contentType,
    'content-disposition': contentDisposition('attachment', file.fileName),
    'x-content-type-options': 'nosniff',
    'cache-control': 'private, no-store',
    'etag': `"${file.sha256}"`,
  })
  return data
})
