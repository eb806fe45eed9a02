import { existsSync } from 'node:fs'
import { dirname, join } from 'node:path'
import { Worker } from 'node:worker_threads'
import { renderDefinition } from './fonts'
import { packetDefinition, packetFrontDefinition, type PacketDocumentInput } from './packet-document'
import { fontBuffers } from './pdf'
import type { SheetModel } from './model'
import { sheetDefinition } from './sheet-document'

/** The render worker, bundled beside the built server entry (see nuxt.config.ts); absent in `nuxt dev`. */
function workerFile() {
  const entry = process.argv[1]
  const file = entry ? join(dirname(entry), 'sheet-worker.cjs') : ''
  return file && existsSync(file) ? file : null
}

export interface RenderedPacket { pdf: Buffer, pageCount: number }

/**
 * Lays out and renders a packet. pdfmake's layout is one synchronous run (seconds for a hundred sheets), so it runs
 * in a worker thread: the server keeps answering, the progress polling included.
 */
export async function renderPacket(input: PacketDocumentInput, progress: (fraction: number) => void | Promise<void>): Promise<RenderedPacket> {
  return inWorker({ input }, () => packetDefinition(input), progress)
}

/** One sheet, laid out and rendered off the request thread (a signed sheet at signing, before anyone asks for it). */
export async function renderSheetInWorker(sheet: SheetModel): Promise<RenderedPacket> {
  return inWorker({ sheet }, () => sheetDefinition(sheet), () => {})
}

/**
 * Renders, off the request thread, each sheet as its own PDF and then (when given) the packet's front alone; one worker
 * for the whole batch. The last element is the front when one was asked.
 */
export async function renderBatch(sheets: SheetModel[], front: PacketDocumentInput | null, progress: (fraction: number) => void | Promise<void> = () => {}): Promise<RenderedPacket[]> {
  const fonts = await fontBuffers()
  const file = workerFile()
  if (!file) {
    const out: RenderedPacket[] = []
    for (const [i, sheet] of sheets.entries()) {
      const { definition, tracker } = sheetDefinition(sheet)
      out.push({ pdf: await renderDefinition(definition, () => {}), pageCount: tracker.total })
      await progress((i + 1) / sheets.length)
    }
    if (front) {
      const { definition, tracker } = packetFrontDefinition(front)
      out.push({ pdf: await renderDefinition(definition, () => {}), pageCount: tracker.total })
    }
    return out
  }
  return new Promise((resolve, reject) => {
    const worker = new Worker(file, { workerData: { sheets, front: front ?? undefined, fonts } })
    worker.on('message', (message: { progress?: number, batch?: { pdf: Uint8Array, pageCount: number }[], error?: string }) => {
      if (message.progress !== undefined) void progress(message.progress)
      else if (message.error) reject(new Error(message.error))
      else if (message.batch) resolve(message.batch.map(b => ({ pdf: Buffer.from(b.pdf.buffer, b.pdf.byteOffset, b.pdf.byteLength), pageCount: b.pageCount })))
    })
    worker.once('error', reject)
    worker.once('exit', (code) => {
      if (code !== 0) reject(new Error(`the packet renderer stopped (exit ${code})`))
    })
  })
}

async function inWorker(data: { input?: PacketDocumentInput, sheet?: SheetModel }, here: () => { definition: Record<string, unknown>, tracker: { total: number } }, progress: (fraction: number) => void | Promise<void>): Promise<RenderedPacket> {
  const fonts = await fontBuffers()
  const file = workerFile()
  if (!file) {
    const { definition, tracker } = here()
    const pdf = await renderDefinition(definition, f => void progress(f))
    return { pdf, pageCount: tracker.total }
  }
  return new Promise((resolve, reject) => {
    const worker = new Worker(file, { workerData: { ...data, fonts } })
    worker.on('message', (message: { progress?: number, pdf?: Uint8Array, pageCount?: number, error?: string }) => {
      if (message.progress !== undefined) void progress(message.progress)
      else if (message.error) reject(new Error(message.error))
      else if (message.pdf) resolve({ pdf: Buffer.from(message.pdf), pageCount: message.pageCount ?? 0 })
    })
    worker.once('error', reject)
    worker.once('exit', (code) => {
      if (code !== 0) reject(new Error(`the packet renderer stopped (exit ${code})`))
    })
  })
}
