import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'
import { pdfPages, squeeze } from './pdf-text'
import { samplePdf, samplePng, upload } from './support/files'

// Issue 7: attachments are included by reference (name, checksum) in the sheets of their record.
let server: TestServer
let supervisor: Client

beforeAll(async () => {
  server = await startServer()
  supervisor = await signedIn(server.url, 'supervisor')
})
afterAll(async () => server?.stop())

describe('attached files on a sheet', () => {
  it('a WPS sheet lists its joint sketch by name, kind and SHA-256', async () => {
    const draft = await supervisor.json<{ items: { id: number, number: string, status: string }[] }>('/api/procedures?status=draft&pageSize=1')
    const wps = draft.body.items[0]!
    const before = (await pdfPages(await (await supervisor.fetch(`/api/sheets/procedures/${wps.id}`)).arrayBuffer())).join('\n')
    expect(squeeze(before)).not.toContain('Attachedfiles')
    const file = await upload(supervisor, { recordType: 'procedure', recordId: wps.id, kind: 'joint-sketch' }, { name: 'Joint <b>B-7</b>.pdf', type: 'application/pdf', bytes: samplePdf })
    expect(file.status).toBe(201)
    const res = await supervisor.fetch(`/api/sheets/procedures/${wps.id}`)
    expect(res.status).toBe(200)
    const text = squeeze((await pdfPages(await res.arrayBuffer())).join('\n'))
    expect(text).toContain(squeeze('Attached files (by reference)'))
    expect(text).toContain(squeeze(file.body.fileName)) // the display name as the upload kept it
    expect(text).toContain(file.body.sha256)
  })
})

describe('attached files as packet appendices', () => {
  async function packetPages(client: Client, projectId: number) {
    const started = await client.json<{ id: number }>('/api/packets', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ projectId }) })
    expect(started.status).toBe(202)
    for (let i = 0; i < 600; i++) {
      const state = await client.json<{ status: string, error: string | null }>(`/api/packets/${started.body.id}`)
      if (state.body.status === 'ready') break
      expect(state.body.status, state.body.error ?? '').not.toBe('failed')
      await new Promise(r => setTimeout(r, 100))
    }
    return pdfPages(await (await client.fetch(`/api/packets/${started.body.id}/file`)).arrayBuffer())
  }

  it('a lab report on a PQR of the project follows the sheets, after a page naming it with its SHA-256', async () => {
    // Demo seed: project 1 is KB-2611, whose KB-W02 rev. 1 rests on PQR 2 (PQR-K102).
    const before = await packetPages(supervisor, 1)
    const inspector = await signedIn(server.url, 'inspector')
    const file = await upload(inspector, { recordType: 'pqr', recordId: 2, kind: 'lab-report' }, { name: 'tensile report.png', type: 'image/png', bytes: samplePng })
    expect(file.status).toBe(201)
    const after = await packetPages(supervisor, 1)
    // The PQR sheet now lists the file by reference (it may take a page more); the separator page and the picture
    // come last, after every sheet.
    expect(after.length).toBeGreaterThanOrEqual(before.length + 2)
    const at = after.findIndex(page => squeeze(page).includes('Appendix1'))
    expect(at).toBe(after.length - 2)
    const separator = squeeze(after[at]!)
    expect(separator).toContain('Appendix1')
    expect(separator).toContain(file.body.sha256)
    expect(separator).toContain(squeeze('tensile report.png'))
  })
})
