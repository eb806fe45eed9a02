import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'
import { pdfPages, squeeze } from './pdf-text'
import { samplePdf, upload } from './support/files'

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
