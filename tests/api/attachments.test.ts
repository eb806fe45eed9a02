import { createHash } from 'node:crypto'
import { existsSync, readdirSync } from 'node:fs'
import { join } from 'node:path'
import sharp from 'sharp'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { Client, signedIn, startServer, type TestServer } from './harness'
import { samplePdf, samplePng, upload } from './support/files'

// Issue 7: uploads checked by content (PDF, PNG, JPEG, WebP), at most 20 MB, SHA-256 stored, the name kept only as
// display text; downloads through an authorized route as attachments; who sees a file follows its record.
interface TestRow { id: number, welderStamp: string, status: string }
const sha = (b: Buffer) => createHash('sha256').update(b).digest('hex')

let server: TestServer
const as = {} as Record<'supervisor' | 'inspector' | 'welder' | 'auditor', Client>
let tests: TestRow[]
const testOf = (stamp: string, status = 'certified') => tests.find(t => t.welderStamp === stamp && t.status === status)!

// 1600 × 1200 stored with EXIF orientation 6 (rotate 90° clockwise to view): shown upright it is 1200 wide, 1600 high.
let photoBytes: Buffer

beforeAll(async () => {
  photoBytes = await sharp({ create: { width: 1600, height: 1200, channels: 3, background: '#7a8a90' } }).jpeg().withMetadata({ orientation: 6 }).toBuffer()
  server = await startServer()
  for (const role of ['supervisor', 'inspector', 'welder', 'auditor'] as const) as[role] = await signedIn(server.url, role)
  tests = (await as.supervisor.json<{ items: TestRow[] }>('/api/tests?pageSize=200')).body.items
})
afterAll(async () => server?.stop())

describe('upload', () => {
  it('an inspector attaches a radiography report to a welder test; it is stored with its SHA-256 under the data folder', async () => {
    const test = testOf('KB-03')
    const res = await upload(as.inspector, { recordType: 'welder-test', recordId: test.id, kind: 'radiography-report' }, { name: 'RT report 0412.pdf', type: 'application/pdf', bytes: samplePdf })
    expect(res.status).toBe(201)
    expect(res.body).toMatchObject({ fileName: 'RT report 0412.pdf', contentType: 'application/pdf', size: samplePdf.length, sha256: sha(samplePdf), kind: 'radiography-report' })
    expect(res.body).not.toHaveProperty('storageKey')
    const folder = join(server.dataDir, 'files', 'welder-test', String(test.id))
    expect(readdirSync(folder)).toHaveLength(1)

    const list = await as.supervisor.json<{ items: { id: number, fileName: string, sha256: string, addedAfterSigning: boolean }[], mayUpload: boolean, mayDelete: boolean }>(`/api/attachments?recordType=welder-test&recordId=${test.id}`)
    expect(list.body.items.map(a => a.fileName)).toEqual(['RT report 0412.pdf'])
    expect(list.body.items[0]!.addedAfterSigning).toBe(true) // the demo test was certified before the upload
    expect(list.body).toMatchObject({ mayUpload: true, mayDelete: false })

    const again = await upload(as.supervisor, { recordType: 'welder-test', recordId: test.id, kind: 'other' }, { name: 'copy.pdf', type: 'application/pdf', bytes: samplePdf })
    expect(again.status).toBe(409)
  })

  it('refuses a file over 20 MB with 413', async () => {
    const big = Buffer.alloc(20 * 1024 * 1024 + 1, 0x20)
    samplePdf.copy(big)
    const res = await upload(as.supervisor, { recordType: 'welder-test', recordId: testOf('KB-01').id, kind: 'other' }, { name: 'huge.pdf', type: 'application/pdf', bytes: big })
    expect(res.status).toBe(413)
    expect(res.body.data!.fieldErrors.file![0]).toContain('20 MB')
  })

  it('refuses content that does not match its claimed type, and content of no allowed type (415)', async () => {
    const recordId = testOf('KB-01').id
    const claimedPdf = await upload(as.supervisor, { recordType: 'welder-test', recordId, kind: 'other' }, { name: 'report.pdf', type: 'application/pdf', bytes: samplePng })
    expect(claimedPdf.status).toBe(415)
    expect(claimedPdf.body.message).toContain('claims to be PDF but its content is PNG image')
    const renamed = await upload(as.supervisor, { recordType: 'welder-test', recordId, kind: 'other' }, { name: 'photo.jpg', type: 'application/octet-stream', bytes: samplePng })
    expect(renamed.status).toBe(415)
    const broken = await upload(as.supervisor, { recordType: 'welder-test', recordId, kind: 'other' }, { name: 'broken.png', type: 'image/png', bytes: Buffer.concat([samplePng.subarray(0, 8), Buffer.from('not really an image at all')]) })
    expect(broken.status).toBe(415)
    expect(broken.body.message).toContain('cannot be read')
    const script = await upload(as.supervisor, { recordType: 'welder-test', recordId, kind: 'other' }, { name: 'notes.pdf', type: 'application/pdf', bytes: Buffer.from('<script>alert(1)</script>') })
    expect(script.status).toBe(415)
    expect(script.body.message).toContain('Only PDF, PNG, JPEG or WebP')
  })

  it('keeps a name with path characters only as display text', async () => {
    const recordId = testOf('KB-04').id
    const res = await upload(as.supervisor, { recordType: 'welder-test', recordId, kind: 'coupon-photo' }, { name: '../../../etc/passwd.png', type: 'image/png', bytes: samplePng })
    expect(res.status).toBe(201)
    expect(res.body.fileName).toBe('passwd.png')
    const windows = await upload(as.supervisor, { recordType: 'welder-test', recordId, kind: 'other' }, { name: '..\\..\\boot\u202Efdp.exe', type: 'application/pdf', bytes: samplePdf })
    expect(windows.status).toBe(201)
    expect(windows.body.fileName).toBe('bootfdp.exe.pdf')
    expect(existsSync(join(server.dataDir, 'etc'))).toBe(false)
    expect(readdirSync(join(server.dataDir, 'files', 'welder-test', String(recordId))).length, 'a check over an empty list proves nothing').toBeGreaterThan(0)
    expect(readdirSync(join(server.dataDir, 'files', 'welder-test', String(recordId))).every(n => /^[\da-f-]{36}(\.thumbnail)?$/.test(n))).toBe(true)
  })

  it('checks the form fields and the roles', async () => {
    const recordId = testOf('KB-03').id
    const noFile = await upload(as.supervisor, { recordType: 'welder-test', recordId, kind: 'other' })
    expect(noFile.status).toBe(400)
    const badKind = await upload(as.supervisor, { recordType: 'welder-test', recordId, kind: 'mill-test-report' }, { name: 'a.pdf', type: 'application/pdf', bytes: samplePdf })
    expect(badKind.status).toBe(400)
    expect(badKind.body.data!.fieldErrors.kind).toBeTruthy()
    expect((await upload(as.supervisor, { recordType: 'welder-test', recordId: 999999, kind: 'other' }, { name: 'a.pdf', type: 'application/pdf', bytes: samplePdf })).status).toBe(404)
    expect((await upload(as.welder, { recordType: 'welder-test', recordId, kind: 'other' }, { name: 'a.pdf', type: 'application/pdf', bytes: samplePdf })).status).toBe(403)
    const procedures = (await as.supervisor.json<{ items: { id: number }[] }>('/api/procedures')).body.items
    expect((await upload(as.inspector, { recordType: 'procedure', recordId: procedures[0]!.id, kind: 'joint-sketch' }, { name: 'sketch.png', type: 'image/png', bytes: samplePng })).status).toBe(403)
    expect((await upload(as.supervisor, { recordType: 'procedure', recordId: procedures[0]!.id, kind: 'joint-sketch' }, { name: 'sketch.png', type: 'image/png', bytes: samplePng })).status).toBe(201)
  })
})

describe('download', () => {
  let own: number
  let other: number
  let photo: number
  beforeAll(async () => {
    own = (await upload(as.supervisor, { recordType: 'welder-test', recordId: testOf('KB-03').id, kind: 'coupon-photo' }, { name: 'coupon ß.png', type: 'image/png', bytes: samplePng })).body.id
    photo = own
    // KB-02 is neither the demo welder account's roster entry nor on the auditor's granted project.
    other = (await upload(as.supervisor, { recordType: 'welder-test', recordId: testOf('KB-02').id, kind: 'radiography-report' }, { name: 'kb02.pdf', type: 'application/pdf', bytes: samplePdf })).body.id
  })

  it('comes as an attachment with its checksum, byte for byte', async () => {
    const res = await as.inspector.fetch(`/api/attachments/${own}`)
    expect(res.status).toBe(200)
    expect(res.headers.get('content-disposition')).toBe('attachment; filename="coupon .png"; filename*=UTF-8\'\'coupon%20%C3%9F.png')
    expect(res.headers.get('content-type')).toBe('image/png')
    expect(res.headers.get('x-content-type-options')).toBe('nosniff')
    const bytes = Buffer.from(await res.arrayBuffer())
    expect(sha(bytes)).toBe(sha(samplePng))
  })

  it('a welder gets the files of their own tests and a 404 for anyone else\'s', async () => {
    expect((await as.welder.fetch(`/api/attachments/${own}`)).status).toBe(200)
    expect((await as.welder.fetch(`/api/attachments/${other}`)).status).toBe(404)
    expect((await as.welder.fetch(`/api/attachments?recordType=welder-test&recordId=${testOf('KB-02').id}`)).status).toBe(404)
  })

  it('an auditor gets files only of records on granted projects', async () => {
    expect((await as.auditor.fetch(`/api/attachments/${own}`)).status).toBe(200) // KB-03 welds on KB-2611
    expect((await as.auditor.fetch(`/api/attachments/${other}`)).status).toBe(404)
    expect((await as.auditor.fetch('/api/attachments/999999')).status).toBe(404)
  })

  it('signed out is a 401', async () => {
    expect((await new Client(server.url).fetch(`/api/attachments/${own}`)).status).toBe(401)
  })

  it('images have a thumbnail, inline; PDFs do not', async () => {
    const res = await as.supervisor.fetch(`/api/attachments/${photo}/thumbnail`)
    expect(res.status).toBe(200)
    expect(res.headers.get('content-type')).toBe('image/webp')
    expect(res.headers.get('content-disposition')).toMatch(/^inline;/)
    expect((await as.supervisor.fetch(`/api/attachments/${other}/thumbnail`)).status).toBe(404)
    expect((await as.welder.fetch(`/api/attachments/${other}/thumbnail`)).status).toBe(404)
  })

  it('a large photo gets a small upright thumbnail; the download stays the original', async () => {
    const up = await upload(as.inspector, { recordType: 'welder-test', recordId: testOf('KB-07').id, kind: 'coupon-photo' }, { name: 'IMG_2231.JPG', type: 'image/jpeg', bytes: photoBytes })
    expect(up.status).toBe(201)
    const thumb = Buffer.from(await (await as.inspector.fetch(`/api/attachments/${up.body.id}/thumbnail`)).arrayBuffer())
    const meta = await sharp(thumb).metadata()
    expect(meta).toMatchObject({ format: 'webp', width: 240, height: 320 })
    expect(thumb.length).toBeLessThan(photoBytes.length / 4)
    const original = Buffer.from(await (await as.inspector.fetch(`/api/attachments/${up.body.id}`)).arrayBuffer())
    expect(sha(original)).toBe(sha(photoBytes))
  })
})

describe('removal', () => {
  it('a file of an unsigned record can be removed; one of a signed record stays (409)', async () => {
    const recorded = testOf('KB-11', 'recorded')
    const added = await upload(as.inspector, { recordType: 'welder-test', recordId: recorded.id, kind: 'other' }, { name: 'draft.pdf', type: 'application/pdf', bytes: samplePdf })
    expect(added.status).toBe(201)
    expect((await as.inspector.fetch(`/api/attachments/${added.body.id}`, { method: 'DELETE' })).status).toBe(204)
    expect((await as.inspector.fetch(`/api/attachments/${added.body.id}`)).status).toBe(404)
    expect(readdirSync(join(server.dataDir, 'files', 'welder-test', String(recorded.id)))).toHaveLength(0)

    const signed = (await as.supervisor.json<{ items: { id: number }[] }>(`/api/attachments?recordType=welder-test&recordId=${testOf('KB-03').id}`)).body.items[0]!
    expect((await as.supervisor.fetch(`/api/attachments/${signed.id}`, { method: 'DELETE' })).status).toBe(409)
  })
})
