import { PDFDocument, StandardFonts, rgb } from 'pdf-lib'
import sharp from 'sharp'
import type { Appendix } from '../database/sheet-records'
import { readStoredFile } from '../utils/storage'

// The files themselves are listed by appendicesOf (server/database/sheet-records.ts).

const A4: [number, number] = [595.28, 841.89]
// The standard PDF fonts cover Latin-1 only; a separator page prints names in that range (the sheet lists them exactly).
const latin1 = (text: string) => text.normalize('NFKD').replace(/[^\x20-\x7E\xA0-\xFF]/g, '?')

/**
 * Appends each attached file after the sheets: a separator page naming it (name, record, SHA-256), then its pages
 * (a PDF) or the picture (an image). A file that cannot be read is named on its separator page, never dropped silently.
 */
export async function appendFiles(pdf: Uint8Array, files: Appendix[]): Promise<{ pdf: Uint8Array, pageCount: number }> {
  const doc = await PDFDocument.load(pdf)
  const font = await doc.embedFont(StandardFonts.Helvetica)
  const bold = await doc.embedFont(StandardFonts.HelveticaBold)
  for (const [i, file] of files.entries()) {
    const bytes = await readStoredFile(file.storageKey)
    const separator = doc.addPage(A4)
    separator.drawText(`Appendix ${i + 1}`, { x: 56, y: 760, size: 18, font: bold })
    const lines = [`File: ${latin1(file.fileName)}`, `Attached to: ${file.owner}`, `Type: ${file.contentType}`, `SHA-256: ${file.sha256}`]
    let problem: string | null = bytes ? null : 'The stored file could not be read.'
    try {
      if (bytes && file.contentType === 'application/pdf') {
        const source = await PDFDocument.load(bytes, { ignoreEncryption: true })
        for (const page of await doc.copyPages(source, source.getPageIndices())) doc.addPage(page)
      }
      else if (bytes) {
        const png = file.contentType === 'image/jpeg' ? null : await sharp(bytes).png().toBuffer()
        const image = png ? await doc.embedPng(png) : await doc.embedJpg(bytes)
        const page = doc.addPage(A4)
        const scale = Math.min((A4[0] - 112) / image.width, (A4[1] - 140) / image.height, 4)
        page.drawImage(image, { x: 56, y: A4[1] - 84 - image.height * scale, width: image.width * scale, height: image.height * scale })
        page.drawText(latin1(file.fileName), { x: 56, y: A4[1] - 60, size: 10, font })
      }
    }
    catch {
      problem = 'The file could not be placed in this packet; it is kept with its record.'
    }
    if (problem) lines.push(problem)
    lines.forEach((line, n) => separator.drawText(line, { x: 56, y: 720 - n * 18, size: 10, font, color: rgb(0.11, 0.14, 0.15) }))
  }
  return { pdf: await doc.save(), pageCount: doc.getPageCount() }
}
