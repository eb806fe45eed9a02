// pdfmake 0.3 ships no types (@types/pdfmake describes 0.2): the part of its server API the sheets use.
declare module 'pdfmake' {
  interface OutputDocument {
    getBuffer: () => Promise<Buffer>
  }
  interface PdfMake {
    virtualfs: { writeFileSync: (name: string, content: Buffer) => void, existsSync: (name: string) => boolean }
    addFonts: (fonts: Record<string, { normal: string, bold: string, italics: string, bolditalics: string }>) => void
    setUrlAccessPolicy: (allow: (url: string) => boolean) => void
    setLocalAccessPolicy: (allow: (path: string) => boolean) => void
    setProgressCallback: (callback: ((fraction: number) => void) | undefined) => void
    createPdf: (definition: Record<string, unknown>) => OutputDocument
  }
  const pdfmake: PdfMake
  export default pdfmake
}
