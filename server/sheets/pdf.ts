import { fontFiles, installFonts, renderDefinition, type FontBuffers } from './fonts'

let fonts: Promise<FontBuffers> | undefined

/** The font files from the server assets, read once. */
export function fontBuffers(): Promise<FontBuffers> {
  fonts ??= (async () => {
    const storage = useStorage('assets:sheet-fonts')
    const entries = await Promise.all(fontFiles.map(async (file) => {
      const raw = await storage.getItemRaw<Uint8Array>(file)
      if (!raw) throw new Error(`sheet font ${file} is missing from the server assets`)
      return [file, new Uint8Array(raw)] as const
    }))
    const buffers = Object.fromEntries(entries) as FontBuffers
    installFonts(buffers)
    return buffers
  })().catch((error) => {
    fonts = undefined
    throw error
  })
  return fonts
}

/** Renders in this thread: for single sheets, which take a few hundred milliseconds. */
export async function renderPdf(definition: Record<string, unknown>, onProgress?: (fraction: number) => void): Promise<Buffer> {
  await fontBuffers()
  return renderDefinition(definition, onProgress)
}
