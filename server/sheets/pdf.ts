/// <reference path="./pdfmake.d.ts" />
import pdfmake from 'pdfmake'

// Source Sans 3 (OFL), bundled with the server as assets: no font is fetched at run time.
const fontFiles = {
  normal: 'SourceSans3-Regular.ttf',
  bold: 'SourceSans3-Bold.ttf',
  semibold: 'SourceSans3-Semibold.ttf',
  italics: 'SourceSans3-It.ttf',
} as const

let ready: Promise<void> | undefined

async function loadFonts() {
  const storage = useStorage('assets:sheet-fonts')
  for (const file of Object.values(fontFiles)) {
    const raw = await storage.getItemRaw<Uint8Array>(file)
    if (!raw) throw new Error(`sheet font ${file} is missing from the server assets`)
    pdfmake.virtualfs.writeFileSync(file, Buffer.from(raw))
  }
  pdfmake.addFonts({
    SourceSans: { normal: fontFiles.normal, bold: fontFiles.semibold, italics: fontFiles.italics, bolditalics: fontFiles.bold },
  })
  // Sheets never load images or files by address: everything they draw is in the definition.
  pdfmake.setUrlAccessPolicy(() => false)
  pdfmake.setLocalAccessPolicy(() => false)
}

function fontsReady() {
  ready ??= loadFonts().catch((error) => {
    ready = undefined
    throw error
  })
  return ready
}

/** Lays out and renders one document definition; `onProgress` gets 0..1 while pages are written. */
export async function renderPdf(definition: Record<string, unknown>, onProgress?: (fraction: number) => void): Promise<Buffer> {
  await fontsReady()
  // createPdf reads the callback once, synchronously: concurrent renders keep their own.
  pdfmake.setProgressCallback(onProgress)
  const document = pdfmake.createPdf(definition)
  pdfmake.setProgressCallback(undefined)
  return document.getBuffer()
}
