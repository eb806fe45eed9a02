import { parentPort, workerData } from 'node:worker_threads'
import { installFonts, renderDefinition, type FontBuffers } from './fonts'
import { packetDefinition, type PacketDocumentInput } from './packet-document'

// Entry of the packet render worker (bundled to sheet-worker.cjs at build time): data in, PDF bytes out.
const { input, fonts } = workerData as { input: PacketDocumentInput, fonts: FontBuffers }

async function main() {
  installFonts(fonts)
  const { definition, tracker } = packetDefinition(input)
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
