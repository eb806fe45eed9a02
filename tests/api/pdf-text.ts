import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs'

/** The text of every page of a PDF, as pdf.js extracts it (the way a reader's search or copy sees it). */
export async function pdfPages(pdf: ArrayBuffer | Uint8Array): Promise<string[]> {
  const data = pdf instanceof Uint8Array ? new Uint8Array(pdf) : new Uint8Array(pdf)
  const doc = await getDocument({ data, disableFontFace: true, useSystemFonts: false, verbosity: 0 }).promise
  const pages: string[] = []
  for (let i = 1; i <= doc.numPages; i++) {
    const content = await (await doc.getPage(i)).getTextContent()
    pages.push(content.items.map(item => ('str' in item ? item.str + (item.hasEOL ? '\n' : '') : '')).join(''))
  }
  await doc.destroy()
  return pages
}

/** Text compared without spacing: a PDF places words and lines where it likes. */
export const squeeze = (text: string) => text.replace(/\s+/g, '')
