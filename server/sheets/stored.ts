import { createHash } from 'node:crypto'
import { canonicalJson } from '../database/signing'
import { putStoredFile, readStoredFile } from '../utils/storage'
import type { SheetModel } from './model'
import { renderSheetInWorker } from './packet-render'
import { renderSheet } from './sheets'

/**
 * A signed sheet never changes, so its PDF is rendered once and kept in file storage under the SHA-256 of everything that
 * goes into it: the sheet model (content, its hash, signatures, verification code and address, shop name, attachment list)
 * and this layout version. Anything that would change the PDF changes the key, so a stored file is never stale; raise the
 * version when the layout code changes. Unsigned drafts (and sheets whose content no longer matches the signatures) are
 * rendered on demand and not kept.
 */
export const storedSheetLayoutVersion = 1

export const isSignedSheet = (sheet: SheetModel) => sheet.signatures.length > 0 && sheet.hash.matchesSigned === true

export function storedSheetKey(sheet: SheetModel) {
  const sha = createHash('sha256').update(canonicalJson({ layout: storedSheetLayoutVersion, sheet })).digest('hex')
  return `sheets:${sha}.pdf`
}

/** Pages of a PDF as pdfmake writes it (one uncompressed /Type /Page object per page). */
export const pageCountOf = (pdf: Buffer) => (pdf.toString('latin1').match(/\/Type\s*\/Page[^s]/g) ?? []).length

export interface SheetPdf { pdf: Buffer, pageCount: number, source: 'stored' | 'rendered' }

/** The PDF of a signed sheet: from storage when it was rendered before, else rendered now (here or in the worker) and kept. */
export async function signedSheetPdf(sheet: SheetModel, where: 'here' | 'worker' = 'here'): Promise<SheetPdf> {
  const key = storedSheetKey(sheet)
  const stored = await readStoredFile(key)
  if (stored) return { pdf: stored, pageCount: pageCountOf(stored), source: 'stored' }
  const { pdf, pageCount } = where === 'worker' ? await renderSheetInWorker(sheet) : await renderSheet(sheet)
  await putStoredFile(key, pdf, 'application/pdf')
  return { pdf, pageCount, source: 'rendered' }
}

/** A sheet's PDF for a download: a signed sheet through storage, a draft rendered on demand. */
export async function sheetPdf(sheet: SheetModel): Promise<SheetPdf> {
  if (isSignedSheet(sheet)) return signedSheetPdf(sheet)
  const { pdf, pageCount } = await renderSheet(sheet)
  return { pdf, pageCount, source: 'rendered' }
}
