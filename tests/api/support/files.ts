import type { Client } from '../harness'

// Small real files for upload tests: a 1×1 PNG and a one-page PDF.
export const samplePng = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==', 'base64')
export const samplePdf = Buffer.from('%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[3 0 R]/Count 1>>endobj\n3 0 obj<</Type/Page/Parent 2 0 R/MediaBox[0 0 612 792]>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n', 'latin1')

export interface Uploaded { id: number, fileName: string, contentType: string, size: number, sha256: string, kind: string }

export async function upload(client: Client, fields: Record<string, string | number>, file?: { name: string, type: string, bytes: Buffer }) {
  const form = new FormData()
  for (const [k, v] of Object.entries(fields)) form.set(k, String(v))
  if (file) form.set('file', new Blob([new Uint8Array(file.bytes)], { type: file.type }), file.name)
  return client.json<Uploaded & { message?: string, data?: { fieldErrors: Record<string, string[]> } }>('/api/attachments', { method: 'POST', body: form })
}
