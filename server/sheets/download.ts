import type { H3Event } from 'h3'
import type { Db } from '../database/client'
import type { SessionUser } from '../utils/auth'
import type { SheetModel } from './model'
import { sheetReference } from './model'
import { sendPdf, sheetFileName } from './sheets'
import { sheetPdf } from './stored'
import { recordAudit } from '../database/audit'

/** Hands out a sheet as JSON (the read-only view) or as a PDF download, which goes into the audit trail. */
export async function respondWithSheet(event: H3Event, db: Db, user: SessionUser, sheet: SheetModel, format: 'pdf' | 'json', record: { type: string, id: number }) {
  if (format === 'json') return sheet
  const { pdf, pageCount, source } = await sheetPdf(sheet)
  setResponseHeader(event, 'x-sheet-source', source)
  await recordAudit(db, {
    accountId: user.id, action: 'sheet.download', recordType: record.type, recordId: record.id,
    after: { sheet: `${sheet.kindTitle} ${sheetReference(sheet)}`, pages: pageCount, contentSha256: sheet.hash.value, code: sheet.verify?.code ?? null },
  })
  return sendPdf(event, pdf, sheetFileName(sheet))
}
