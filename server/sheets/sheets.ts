import type { H3Event } from 'h3'
import type { Db } from '../database/client'
import { issueContinuityLog, loadPqr, loadProcedure, loadWelderTest, shopName } from '../database/sheet-records'
import type { SessionUser } from '../utils/auth'
import { loadContinuityLog, type Period } from './continuity-log'
import { continuitySheet } from './continuity-sheet'
import { verifyUrl } from './common'
import { labelled } from './layout'
import { sheetDefinition } from './sheet-document'
import { sheetReference, type SheetModel } from './model'
import { renderPdf } from './pdf'
import { pqrSheet } from './pqr'
import { wpqSheet } from './wpq'
import { wpsSheet } from './wps'
import { attachmentsOf, welderPhotoDataUrl } from '../database/attachments'
import type { AttachmentRecordType } from '#shared/schemas/attachment'

export { projectPeriod } from '../database/sheet-records'

/** The public address the QR codes point at: AUTH_ORIGIN in production (required there), else the request's own. */
export function publicOrigin(event: H3Event) {
  const configured = process.env.AUTH_ORIGIN
  if (configured) {
    try {
      return new URL(configured).origin
    }
    catch { /* fall back to the request */ }
  }
  return getRequestURL(event, { xForwardedHost: true, xForwardedProto: true }).origin
}

/** The record's attached files, listed by reference: name, kind, size and SHA-256 (the files themselves are not printed). */
async function withAttachments(db: Db, sheet: SheetModel, type: AttachmentRecordType, id: number): Promise<SheetModel> {
  const files = await attachmentsOf(db, type, id)
  if (!files.length) return sheet
  return {
    ...sheet,
    blocks: [...sheet.blocks, {
      heading: 'Attached files (by reference)',
      table: {
        columns: ['File', 'Kind', 'Size', 'SHA-256'],
        rows: files.map(f => [f.fileName, f.kind.replace(/-/g, ' '), `${Math.max(1, Math.round(f.size / 1024))} KB`, f.sha256]),
        numeric: [2],
        widths: ['*', 'auto', 'auto', 'auto'],
      },
      notes: ['Each file is kept with the record; its SHA-256 identifies the exact file.'],
    }],
  }
}

export async function procedureSheet(db: Db, id: number, origin: string) {
  const record = await loadProcedure(db, id)
  return record ? withAttachments(db, wpsSheet(record, await shopName(db), origin), 'procedure', id) : null
}

export async function pqrSheetOf(db: Db, id: number, origin: string) {
  const record = await loadPqr(db, id)
  return record ? withAttachments(db, pqrSheet(record, await shopName(db), origin), 'pqr', id) : null
}

export async function welderTestSheet(db: Db, id: number, origin: string) {
  const record = await loadWelderTest(db, id)
  if (!record) return null
  const sheet = await withAttachments(db, wpqSheet(record, await shopName(db), origin), 'welder-test', id)
  // ISO 9606-1 asks the certificate to identify the welder: the photograph on the welder record, when there is one.
  if (record.test.code !== 'iso-9606-1') return sheet
  const dataUrl = await welderPhotoDataUrl(db, record.test.welderId)
  return dataUrl ? { ...sheet, photo: { dataUrl, caption: `${record.welder.name}` } } : sheet
}

/**
 * A continuity log is issued, not signed: the same welder, period and content keep one code; a changed log
 * (an entry added, changed or removed) gets a new one, and the old code then verifies as changed.
 */
export async function continuityLogSheet(db: Db, welderId: number, period: Period, user: Pick<SessionUser, 'id' | 'name'>, origin: string) {
  const log = await loadContinuityLog(db, welderId, period)
  if (!log) return null
  const issue = await issueContinuityLog(db, welderId, period, log.sha256, user)
  return continuitySheet(log, await shopName(db), {
    code: issue.verifyCode, url: verifyUrl(origin, issue.verifyCode), issuerName: issue.issuerName, issuedAt: issue.issuedAt.toISOString(),
  })
}

/** The period of a project, closed at today when it is still open. */
export async function renderSheet(sheet: SheetModel) {
  const { definition, tracker } = sheetDefinition(sheet)
  const started = performance.now()
  const pdf = await renderPdf(definition)
  return { pdf, pageCount: tracker.total, ms: Math.round(performance.now() - started) }
}

export function sheetFileName(sheet: SheetModel) {
  return `${labelled(sheet.kind === 'continuity' ? 'CL' : sheet.kind.toUpperCase(), sheetReference(sheet)).replace(/[^\w.-]+/g, '-')}.pdf`
}

/** A PDF download: attachment, never cached by a shared cache, never sniffed. */
export function sendPdf(event: H3Event, pdf: Buffer, fileName: string) {
  setResponseHeaders(event, {
    'content-type': 'application/pdf',
    'content-disposition': `attachment; filename="${fileName.replace(/[^\w.-]/g, '_')}"; filename*=UTF-8''${encodeURIComponent(fileName)}`,
    'cache-control': 'private, no-store',
    'x-content-type-options': 'nosniff',
  })
  return pdf
}
