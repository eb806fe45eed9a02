import { parentPort, workerData } from 'node:worker_threads'
import { installFonts, renderDefinition, type FontBuffers } from './fonts'
import type { SheetModel } from './model'
import { packetDefinition, packetFrontDefinition, type PacketDocumentInput } from './packet-document'
import { sheetDefinition } from './sheet-document'

// Entry of the render worker (bundled to sheet-worker.cjs at build time): a packet or one sheet, data in, PDF bytes out.
const { input, sheet, sheets, front, fonts } = workerData as { input?: PacketDocumentInput, sheet?: SheetModel, sheets?: SheetModel[], front?: PacketDocumentInput, fonts: FontBuffers }

async function main() {
  installFonts(fonts)
  if (sheets || front) {
    // A batch: each sheet its own PDF (a packet's sheets not yet in storage), or the packet's front alone.
    const out: { pdf: Uint8Array, pageCount: number }[] = []
    for (const one of sheets ?? []) {
      const { definition, tracker } = sheetDefinition(one)
      const pdf = await renderDefinition(definition, () => {})
      out.push({ pdf: new Uint8Array(pdf.buffer, pdf.byteOffset, pdf.byteLength), pageCount: tracker.total })
      parentPort!.postMessage({ progress: out.length / sheets!.length })
    }
    if (front) {
      const { definition, tracker } = packetFrontDefinition(front)
      const pdf = await renderDefinition(definition, () => {})
      out.push({ pdf: new Uint8Array(pdf.buffer, pdf.byteOffset, pdf.byteLength), pageCount: tracker.total })
    }
    parentPort!.postMessage({ batch: out }, out.map(o => o.pdf.buffer as ArrayBuffer))
    return
  }
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
