import { readThumbnail } from '../../../database/attachments'
import { idParamSchema } from '#shared/schemas/list'

/** GET /api/attachments/:id/thumbnail: a small WebP of an image attachment for the record view (images only; 404 otherwise) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, everyone)
  const { id } = await validParams(event, idParamSchema)
  const { file, data } = orThrow(await readThumbnail(await useDb(), user, id))
  const etag = `"${file.sha256}-thumbnail"`
  if (getRequestHeader(event, 'if-none-match') === etag) {
    setResponseStatus(event, 304)
    return null
  }
  const bytes = orThrow(await data() ?? missing('Image'))
  setResponseHeaders(event, {
    'content-type': 'image/webp',
    'content-disposition': contentDisposition('inline', file.fileName.replace(/\.[^.]+$/, '-thumbnail.webp')),
    'x-content-type-options': 'nosniff',
    'content-security-policy': 'default-src \'none\'',
    // An attachment never changes; the browser may keep its thumbnail for the signed-in user.
    'cache-control': 'private, max-age=86400',
    'etag': etag,
  })
  return bytes
})
