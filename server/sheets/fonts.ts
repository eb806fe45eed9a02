import pdfmake from 'pdfmake'

// Source Sans 3 (OFL), bundled with the server as assets: no font is fetched at run time.
export const fontFiles = ['SourceSans3-Regular.ttf', 'SourceSans3-Bold.ttf', 'SourceSans3-Semibold.ttf', 'SourceSans3-It.ttf'] as const
export type FontBuffers = Record<(typeof fontFiles)[number], Uint8Array>

/** Puts the fonts into pdfmake's virtual file system and shuts every outside access (URLs, local files). */
export function installFonts(fonts: FontBuffers) {
  for (const file of fontFiles) pdfmake.virtualfs.writeFileSync(file, Buffer.from(fonts[file]))
  pdfmake.addFonts({
    SourceSans: { normal: 'SourceSans3-Regular.ttf', bold: 'SourceSans3-Semibold.ttf', italics: 'SourceSans3-It.ttf', bolditalics: 'SourceSans3-Bold.ttf' },
  })
  pdfmake.setUrlAccessPolicy(() => false)
  pdfmake.setLocalAccessPolicy(() => false)
}

/** Lays out and renders one document definition; `onProgress` gets 0..1 while pages are written. */
export async function renderDefinition(definition: Record<string, unknown>, onProgress?: (fraction: number) => void): Promise<Buffer> {
  // createPdf reads the callback once, synchronously: concurrent renders keep their own.
  pdfmake.setProgressCallback(onProgress)
  const document = pdfmake.createPdf(definition)
  pdfmake.setProgressCallback(undefined)
  return document.getBuffer()
}
