import { attachmentOwnerSchema } from '#shared/schemas/attachment'

/** GET /api/attachments?recordType=&recordId=: the files of a record the caller may see (404 otherwise) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, everyone)
  const owner = await validQuery(event, attachmentOwnerSchema)
  const db = await useDb()
  if (!await maySeeRecord(db, user, owner.recordType, owner.recordId)) throw notFound('Record')
  const [items, signedAt] = await Promise.all([attachmentsOf(db, owner.recordType, owner.recordId), lastSignedAt(db, owner.recordType, owner.recordId)])
  const mayChange = uploaders[owner.recordType].includes(user.role)
  return {
    items: items.map(a => ({ ...a, addedAfterSigning: !!signedAt && a.createdAt > signedAt })),
    signedAt,
    mayUpload: mayChange,
    // Files of a signed record stay: they are part of what was signed off.
    mayDelete: mayChange && !signedAt,
  }
})
