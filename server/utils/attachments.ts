import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm'
import type { Db } from '../database/client'
import {
  accounts, attachments, auditorGrants, baseMetals, pqrs, procedurePqrs, procedures, projectProcedures, projectWelders, signatures, welderTests,
} from '../database/schema'
import type { AttachmentRecordType } from '#shared/schemas/attachment'

// Who may see and change the files of a record follows the record itself: staff see every record; a welder only
// their own tests; an auditor only records of projects granted to them. A record someone may not see is a 404.

/** Roles that may add files to each kind of record. */
export const uploaders: Record<AttachmentRecordType, readonly Role[]> = {
  'pqr': ['supervisor', 'inspector'],
  'welder-test': ['supervisor', 'inspector'],
  'procedure': ['supervisor'],
  'base-metal': ['supervisor'],
}

async function recordExists(db: Db, type: AttachmentRecordType, id: number) {
  const table = { 'pqr': pqrs, 'welder-test': welderTests, 'procedure': procedures, 'base-metal': baseMetals }[type]
  const [row] = await db.select({ id: table.id }).from(table).where(eq(table.id, id)).limit(1)
  return !!row
}

function grantedProjects(accountId: number) {
  return sql`(select ${auditorGrants.projectId} from ${auditorGrants} where ${auditorGrants.accountId} = ${accountId})`
}

/** Whether the user may see the record (and so its files). False also when the record does not exist. */
export async function maySeeRecord(db: Db, user: SessionUser, type: AttachmentRecordType, id: number): Promise<boolean> {
  if (user.role === 'supervisor' || user.role === 'inspector') return recordExists(db, type, id)
  if (user.role === 'welder') {
    if (type !== 'welder-test' || !user.welderId) return false
    const [row] = await db.select({ id: welderTests.id }).from(welderTests)
      .where(and(eq(welderTests.id, id), eq(welderTests.welderId, user.welderId))).limit(1)
    return !!row
  }
  // auditor: the WPSs of granted projects, the PQRs that support them, the tests of the welders on them
  const granted = grantedProjects(user.id)
  if (type === 'procedure') {
    const [row] = await db.select({ id: projectProcedures.procedureId }).from(projectProcedures)
      .where(and(eq(projectProcedures.procedureId, id), inArray(projectProcedures.projectId, granted))).limit(1)
    return !!row
  }
  if (type === 'pqr') {
    const [row] = await db.select({ id: procedurePqrs.pqrId }).from(procedurePqrs)
      .innerJoin(projectProcedures, eq(projectProcedures.procedureId, procedurePqrs.procedureId))
      .where(and(eq(procedurePqrs.pqrId, id), inArray(projectProcedures.projectId, granted))).limit(1)
    return !!row
  }
  if (type === 'welder-test') {
    const [row] = await db.select({ id: welderTests.id }).from(welderTests)
      .innerJoin(projectWelders, eq(projectWelders.welderId, welderTests.welderId))
      .where(and(eq(welderTests.id, id), inArray(projectWelders.projectId, granted))).limit(1)
    return !!row
  }
  return false
}

/** The time of the record's latest signature, or null while it is unsigned (base metals are never signed). */
export async function lastSignedAt(db: Db, type: AttachmentRecordType, id: number): Promise<Date | null> {
  if (type === 'base-metal') return null
  const [row] = await db.select({ at: signatures.signedAt }).from(signatures)
    .where(and(eq(signatures.recordType, type), eq(signatures.recordId, id))).orderBy(desc(signatures.signedAt)).limit(1)
  return row?.at ?? null
}

export const attachmentColumns = {
  id: attachments.id, recordType: attachments.recordType, recordId: attachments.recordId, kind: attachments.kind,
  fileName: attachments.fileName, contentType: attachments.contentType, size: attachments.size, sha256: attachments.sha256,
  createdAt: attachments.createdAt, uploadedBy: accounts.name,
}

/** The files of one record, oldest first: name, type, size and checksum (what a sheet lists by reference). */
export async function attachmentsOf(db: Db, type: AttachmentRecordType, id: number) {
  return db.select(attachmentColumns).from(attachments).leftJoin(accounts, eq(accounts.id, attachments.uploadedBy))
    .where(and(eq(attachments.recordType, type), eq(attachments.recordId, id))).orderBy(asc(attachments.createdAt), asc(attachments.id))
}

export async function attachmentById(db: Db, id: number) {
  const [row] = await db.select().from(attachments).where(eq(attachments.id, id)).limit(1)
  return row
}

/** Content-Disposition with an ASCII fallback and the exact name in RFC 5987 form. */
export function contentDisposition(kind: 'attachment' | 'inline', fileName: string) {
  const fallback = fileName.normalize('NFKD').replace(/[^\x20-\x7E]/g, '').replace(/["\\]/g, '') || 'file'
  return `${kind}; filename="${fallback}"; filename*=UTF-8''${encodeURIComponent(fileName).replace(/['()*]/g, c => `%${c.charCodeAt(0).toString(16).toUpperCase()}`)}`
}

/** Where the thumbnail of an image attachment is kept, beside the file itself. */
export const thumbnailKey = (storageKey: string) => `${storageKey}.thumbnail`

/**
 * A small WebP of an image for the record view: turned upright from its EXIF orientation, at most 320 px, without
 * the original's metadata. Throws when the bytes cannot be decoded as the image they claim to be.
 */
export async function makeThumbnail(image: Buffer): Promise<Buffer> {
  const { default: sharp } = await import('sharp')
  return sharp(image, { failOn: 'error', limitInputPixels: 120_000_000 })
    .rotate().resize(320, 320, { fit: 'inside', withoutEnlargement: true }).webp({ quality: 72 }).toBuffer()
}
