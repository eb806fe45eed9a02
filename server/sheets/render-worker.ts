import { parentPort, workerData } from 'node:worker_threads'
import { installFonts, renderDefinition, type FontBuffers } from './fonts'
import type { SheetModel } from './model'
import { packetDefinition, type PacketDocumentInput } from './packet-document'
import { sheetDefinition } from './sheet-document'

// Entry of the render worker (bundled to sheet-worker.cjs at build time): a packet or one sheet, data in, PDF bytes out.
const { input, sheet, fonts } = workerData as { input?: PacketDocumentInput, sheet?: SheetModel, fonts: FontBuffers }

async function main() {
  installFonts(fonts)
  const { definition, tracker } = sheet ? sheetDefinition(sheet) : packetDefinition(input!)
  let last = -1
  const pdf = await renderDefinition(definition, (fraction) => {
    const step = Math.floor(fraction * 50)
    if (step !== last) {
      last = step
      parentPort!.postMessage({ progress: fraction })
    }
  })
  const bytes = new Uint8Array(pdf.buffer, pdf.byteOffset, pdf.byteLength)
  parentPort!.postMessage({ pdf: bytes, pageCount: tracker.total }, [bytes.buffer as ArrayBuffer])
}

main().catch((error: unknown) => {
  parentPort!.postMessage({ error: error instanceof Error ? error.message : String(error) })
})
