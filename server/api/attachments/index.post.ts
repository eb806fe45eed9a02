import { storeFile } from '../../database/attachments'
import { attachmentUploadSchema } from '#shared/schemas/attachment'
import {
  claimedContentType, contentTypeWords, detectContentType, maxAttachmentBytes, type AttachmentContentType,
} from '#shared/attachments/file-rules'

// Room for the multipart boundaries and the form fields around the file.
const envelopeBytes = 64 * 1024

const refuse = (statusCode: 400 | 413 | 415, message: string) => httpError(fieldFailure('file', message, statusCode === 400 ? undefined : statusCode))

/** POST /api/attachments (multipart: recordType, recordId, kind, file): add a PDF or image to a record (staff; see uploaders) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const length = Number(getRequestHeader(event, 'content-length') ?? Number.NaN)
  if (!Number.isFinite(length)) throw createError({ statusCode: 411, statusMessage: 'Length required', message: 'Send the upload with a Content-Length' })
  if (length > maxAttachmentBytes + envelopeBytes) throw refuse(413, `Files may be at most ${maxAttachmentBytes / 1024 / 1024} MB`)

  let parts: Awaited<ReturnType<typeof readMultipartFormData>>
  try {
    parts = await readMultipartFormData(event)
  }
  catch {
    parts = undefined
  }
  if (!parts?.length) throw refuse(400, 'Send the file as multipart/form-data with the fields recordType, recordId, kind and file')
  const fields = Object.fromEntries(parts.filter(p => !p.filename && p.name).map(p => [p.name!, p.data.toString('utf8')]))
  const result = attachmentUploadSchema.safeParse(fields)
  if (!result.success) {
    const { formErrors, fieldErrors } = result.error.flatten()
    throw httpError(invalid('upload', formErrors, fieldErrors as Record<string, string[]>))
  }
  const owner = result.data
  const file = parts.find(p => p.name === 'file' && p.filename !== undefined)
  if (!file) throw refuse(400, 'Choose a file')
  if (!file.data.length) throw refuse(400, 'The file is empty')
  if (file.data.length > maxAttachmentBytes) throw refuse(413, `Files may be at most ${maxAttachmentBytes / 1024 / 1024} MB; this one is ${(file.data.length / 1024 / 1024).toFixed(1)} MB`)

  const detected = detectContentType(file.data)
  if (!detected) throw refuse(415, 'Only PDF, PNG, JPEG or WebP files are accepted, checked from the file\'s content')
  const claimed = claimedContentType(file.type)
  const byName = claimedByName(file.filename ?? '')
  for (const claim of [claimed, byName]) {
    if (claim && claim !== 'application/octet-stream' && claim !== detected) {
      const words = contentTypeWords[claim as AttachmentContentType] ?? claim
      throw refuse(415, `The file claims to be ${words} but its content is ${contentTypeWords[detected]}`)
    }
  }

  const stored = orThrow(await storeFile(await useDb(), user, owner, { fileName: file.filename, bytes: file.data, contentType: detected }))
  setResponseStatus(event, 201)
  return stored
})

function claimedByName(name: string): string | undefined {
  const extension = name.split(/[/\\]/).pop()?.split('.').pop()?.toLowerCase()
  return ({ pdf: 'application/pdf', png: 'image/png', jpg: 'image/jpeg', jpeg: 'image/jpeg', webp: 'image/webp' } as Record<string, string>)[extension ?? '']
}
