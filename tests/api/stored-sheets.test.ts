import { existsSync, readdirSync } from 'node:fs'
import { join } from 'node:path'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { type Client, signedIn, startServer, type TestServer } from './harness'
import { samplePdf, upload } from './support/files'

// A signed sheet is rendered once: at signing (in the render worker) into file storage, keyed by the SHA-256 of all that
// goes into it; downloads then come from storage, byte for byte the same, and its verification code still says unchanged.
// A draft is rendered on demand and never kept; a signed sheet whose printed content changes (a file attached) gets a new file.
let server: TestServer
let inspector: Client
let supervisor: Client

const json = (body: unknown) => ({ method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })
/** A 10 mm SMAW plate groove coupon in 3G with two passing bends (ASME BPVC IX-2023, QW-163: indications up to 3 mm pass). */
const coupon = (welderId: number) => ({
  welderId, testDate: '2026-11-20', code: 'asme-ix', edition: '2023', unit: 'mm', processes: [{ process: 'SMAW', transfer: null, depositThickness: 10 }],
  form: 'plate', weld: 'groove', couponThickness: 10, layers: 3, pNumber: '1', fNumber: '4', backing: true, positions: ['3G'], progression: 'uphill',
  visualAccepted: true, examination: 'bend', bends: [{ type: 'face', largestIndication: 1 }, { type: 'root', largestIndication: 0 }],
})
const storedFiles = () => {
  const dir = join(server.dataDir, 'files', 'sheets')
  return existsSync(dir) ? readdirSync(dir).sort() : []
}
async function download(path: string) {
  const res = await supervisor.fetch(path)
  expect(res.status, path).toBe(200)
  return { source: res.headers.get('x-sheet-source'), bytes: Buffer.from(await res.arrayBuffer()) }
}

beforeAll(async () => {
  server = await startServer()
  inspector = await signedIn(server.url, 'inspector')
  supervisor = await signedIn(server.url, 'supervisor')
})
afterAll(async () => server?.stop())

describe('signed sheets rendered once', () => {
  it('a test certified is rendered at signing; downloads come from storage and still verify unchanged', async () => {
    const welder = (await supervisor.json<{ id: number }>('/api/welders', json({ stamp: 'SHT-01', name: 'Sheet Once' }))).body
    const test = (await inspector.json<{ id: number, version: number }>('/api/tests', json(coupon(welder.id)))).body
    const before = storedFiles()
    // Recorded, not signed: rendered on demand, never kept.
    expect((await download(`/api/sheets/tests/${test.id}`)).source).toBe('rendered')
    expect((await download(`/api/sheets/tests/${test.id}`)).source).toBe('rendered')
    expect(storedFiles()).toEqual(before)

    expect((await inspector.json(`/api/tests/${test.id}/certify`, json({ version: test.version }))).status).toBe(200)
    for (let i = 0; i < 150 && storedFiles().length === before.length; i++) await new Promise(r => setTimeout(r, 100))
    expect(storedFiles().length).toBe(before.length + 1)

    const first = await download(`/api/sheets/tests/${test.id}`)
    const second = await download(`/api/sheets/tests/${test.id}`)
    expect([first.source, second.source]).toEqual(['stored', 'stored'])
    expect(second.bytes.equals(first.bytes)).toBe(true)
    expect(first.bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-')

    const model = await supervisor.json<{ verify: { code: string }, hash: { value: string } }>(`/api/sheets/tests/${test.id}?format=json`)
    const verified = await (await fetch(`${server.url}/api/verify/${model.body.verify.code}`)).json() as { state: string, signedSha256: string }
    expect(verified).toMatchObject({ state: 'unchanged', signedSha256: model.body.hash.value })

    // A file attached after signing is listed on the sheet: a new PDF, rendered once, then stored in turn.
    const attached = await upload(inspector, { recordType: 'welder-test', recordId: test.id, kind: 'radiography-report' }, { name: 'rt.pdf', type: 'application/pdf', bytes: samplePdf })
    expect(attached.status).toBe(201)
    const changed = await download(`/api/sheets/tests/${test.id}`)
    expect(changed.source).toBe('rendered')
    expect(changed.bytes.equals(first.bytes)).toBe(false)
    expect((await download(`/api/sheets/tests/${test.id}`)).source).toBe('stored')
    expect(storedFiles().length).toBe(before.length + 2)
  })

  it('a signed demo WPS: the second download is served from storage', async () => {
    const first = await download('/api/sheets/procedures/3')
    const started = performance.now()
    const second = await download('/api/sheets/procedures/3')
    const ms = performance.now() - started
    expect(second.source).toBe('stored')
    expect(second.bytes.equals(first.bytes)).toBe(true)
    // Served from storage, not laid out again (pdfmake takes hundreds of ms for a sheet): generous on a busy machine.
    expect(ms).toBeLessThan(1000)
  })
})
