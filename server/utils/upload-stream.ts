import { createHash, randomUUID } from 'node:crypto'
import { createWriteStream } from 'node:fs'
import { mkdtemp, readFile, rm } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import type { H3Event } from 'h3'
import busboy from 'busboy'

// A multipart upload read as a stream: the file goes to a temporary file on disk chunk by chunk while its SHA-256 is
// computed, so a 20 MB upload never holds the event loop (the other requests keep being answered). The file name
// is kept exactly as the browser sent it (RFC 7578, 4.2: quoted, with '=' or ';' inside it), decoded as UTF-8.

export interface ReceivedFile {
  /** The name as sent (last path segment); display it only through displayFileName. */
  filename: string
  mimeType: string
  size: number
  sha256: string
  /** The first bytes, for the content-type check. */
  head: Buffer
  /** More than the allowed size was sent; the stored part is cut off. */
  tooLarge: boolean
  /** The whole file, read from the temporary copy. */
  read: () => Promise<Buffer>
}

export interface ReceivedUpload {
  fields: Record<string, string>
  file?: ReceivedFile
  /** Removes the temporary copy (done by itself when the answer has gone out). */
  cleanup: () => Promise<void>
}

const HEAD_BYTES = 64

/** Reads a multipart/form-data body; null when the body is not multipart at all or cannot be parsed. */
export async function receiveUpload(event: H3Event, options: { maxFileBytes: number, fileField?: string }): Promise<ReceivedUpload | null> {
  const fileField = options.fileField ?? 'file'
  const headers = event.node.req.headers
  if (!String(headers['content-type'] ?? '').toLowerCase().startsWith('multipart/form-data')) return null
  let parser: busboy.Busboy
  try {
    parser = busboy({ headers, defParamCharset: 'utf8', limits: { fileSize: options.maxFileBytes + 1, files: 4, fields: 20, fieldSize: 16 * 1024, parts: 30 } })
  }
  catch {
    return null
  }
  const dir = await mkdtemp(join(tmpdir(), 'rootface-upload-'))
  const cleanup = () => rm(dir, { recursive: true, force: true })
  const fields: Record<string, string> = {}
  let file: ReceivedFile | undefined
  const writes: Promise<void>[] = []

  const done = new Promise<void>((resolve, reject) => {
    parser.on('field', (name, value) => {
      fields[name] = value
    })
    parser.on('file', (name, stream, info) => {
      if (name !== fileField || file) {
        stream.resume()
        return
      }
      const path = join(dir, randomUUID())
      const hash = createHash('sha256')
      const chunks: Buffer[] = []
      let headLength = 0
      const received: ReceivedFile = {
        filename: info.filename ?? '', mimeType: info.mimeType, size: 0, sha256: '', head: Buffer.alloc(0), tooLarge: false,
        read: () => readFile(path),
      }
      file = received
      const out = createWriteStream(path)
      stream.on('data', (chunk: Buffer) => {
        hash.update(chunk)
        received.size += chunk.length
        if (headLength < HEAD_BYTES) {
          chunks.push(chunk.subarray(0, HEAD_BYTES - headLength))
          headLength += Math.min(chunk.length, HEAD_BYTES - headLength)
        }
      })
      // The limit is one byte over the largest allowed size: reaching it means the file is too large.
      stream.on('limit', () => {
        received.tooLarge = true
      })
      writes.push(new Promise<void>((resolveWrite, rejectWrite) => {
        out.on('finish', () => {
          received.sha256 = hash.digest('hex')
          received.head = Buffer.concat(chunks)
          resolveWrite()
        })
        out.on('error', rejectWrite)
        stream.on('error', rejectWrite)
      }))
      stream.pipe(out)
    })
    parser.on('close', resolve)
    parser.on('error', reject)
    event.node.req.on('error', reject)
  })
  try {
    event.node.req.pipe(parser)
    await done
    await Promise.all(writes)
  }
  catch {
    await cleanup()
    return null
  }
  event.node.res.once('close', () => {
    cleanup().catch(() => {})
  })
  return { fields, file, cleanup }
}
