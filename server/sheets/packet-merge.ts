import { PDFDocument, StandardFonts, rgb } from 'pdf-lib'

// The standard PDF fonts cover Latin-1 only; the running number prints the project's number in that range.
const latin1 = (text: string) => text.normalize('NFKD').replace(/[^\x20-\x7E\xA0-\xFF]/g, '?')

/**
 * The packet's one PDF: the front (cover, index, summary) and then each sheet's own PDF, page after page, with pdf-lib.
 * Every page gets the packet's running number at its foot ("Project LP-0001 · packet page 12 of 230"), so an auditor can cite a
 * page whatever sheet it belongs to. The sheets are read one at a time and dropped once copied; the document is written
 * out a few hundred objects per tick so the server keeps answering.
 */
export async function mergePacket(front: Uint8Array, sheets: Iterable<Uint8Array> | AsyncIterable<Uint8Array>, label: string): Promise<{ pdf: Uint8Array, pageCount: number }> {
  const doc = await PDFDocument.create()
  const append = async (bytes: Uint8Array) => {
    const source = await PDFDocument.load(bytes, { updateMetadata: false })
    for (const page of await doc.copyPages(source, source.getPageIndices())) doc.addPage(page)
  }
  await append(front)
  for await (const sheet of sheets) {
    await append(sheet)
    await new Promise(resolve => setImmediate(resolve))
  }
  const font = await doc.embedFont(StandardFonts.Helvetica)
  const total = doc.getPageCount()
  doc.getPages().forEach((page, i) => {
    const text = `${latin1(label)} · packet page ${i + 1} of ${total}`
    const size = 6.5
    page.drawText(text, { x: page.getWidth() - 40 - font.widthOfTextAtSize(text, size), y: 10, size, font, color: rgb(0.35, 0.37, 0.38) })
  })
  doc.setTitle(label)
  const pdf = await doc.save({ objectsPerTick: 200 })
  return { pdf, pageCount: total }
}
