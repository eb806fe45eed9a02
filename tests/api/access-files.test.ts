import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { type Client, demo, signedIn, startServer, type TestServer } from './harness'
import { samplePdf, samplePng, upload } from './support/files'

// One access rule per record (issue 14, finding 5): who may read a welder test's sheet may read its files and their
// thumbnails, and nobody else. An auditor reads the certified tests of welders on a project granted to them; a test
// still recorded, or certified as failed, stays in the shop (the packet carries certified qualifications only). A
// record someone may not read is a 404 (project rule, DEVELOPERS.md).
let server: TestServer
let supervisor: Client
let inspector: Client
let auditor: Client
let welder: Client

const json = (body: unknown, method = 'POST') => ({ method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })
async function made(client: Client, path: string, body: unknown) {
  const res = await client.json<{ id: number, version: number }>(path, json(body))
  expect(res.status, `${path} ${JSON.stringify(res.body)}`).toBe(201)
  return res.body
}

/** A 10 mm SMAW plate groove coupon in 3G, recorded in mm; bend indications decide pass or fail (ASME BPVC IX-2023, QW-163: 3 mm). */
const coupon = (welderId: number, indications: number[]) => ({
  welderId, testDate: '2026-11-20', code: 'asme-ix', edition: '2023', unit: 'mm', processes: [{ process: 'SMAW', transfer: null, depositThickness: 10 }],
  form: 'plate', weld: 'groove', couponThickness: 10, layers: 3, pNumber: '1', fNumber: '4', backing: true, positions: ['3G'], progression: 'uphill',
  visualAccepted: true, examination: 'bend', bends: indications.map((largestIndication, i) => ({ type: i % 2 ? 'root' : 'face', largestIndication })),
})

interface Files { pdf: number, png: number, testId: number }
const on = {} as Record<'certified' | 'recorded' | 'failed' | 'ungranted' | 'own', Files>

async function testWithFiles(welderId: number, indications: number[], certify: boolean): Promise<Files> {
  const test = await made(inspector, '/api/tests', coupon(welderId, indications))
  if (certify) expect((await inspector.json(`/api/tests/${test.id}/certify`, json({ version: test.version }))).status).toBe(200)
  const pdf = await upload(inspector, { recordType: 'welder-test', recordId: test.id, kind: 'radiography-report' }, { name: `rt-${test.id}.pdf`, type: 'application/pdf', bytes: samplePdf })
  const png = await upload(inspector, { recordType: 'welder-test', recordId: test.id, kind: 'coupon-photo' }, { name: `coupon-${test.id}.png`, type: 'image/png', bytes: samplePng })
  expect([pdf.status, png.status]).toEqual([201, 201])
  return { pdf: pdf.body.id, png: png.body.id, testId: test.id }
}

beforeAll(async () => {
  server = await startServer()
  supervisor = await signedIn(server.url, 'supervisor')
  inspector = await signedIn(server.url, 'inspector')
  auditor = await signedIn(server.url, 'auditor')
  welder = await signedIn(server.url, 'welder')
  const auditors = (await supervisor.json<{ items: { id: number, email: string }[] }>('/api/accounts?role=auditor')).body.items
  const auditorId = auditors.find(a => a.email === demo.auditor)!.id
  const customer = await made(supervisor, '/api/customers', { name: 'Access test customer', contact: '' })
  const granted = await made(supervisor, '/api/projects', { customerId: customer.id, number: 'ACC-1', name: 'Granted', startsOn: '2026-01-01', endsOn: null })
  const other = await made(supervisor, '/api/projects', { customerId: customer.id, number: 'ACC-2', name: 'Not granted', startsOn: '2026-01-01', endsOn: null })
  const onGranted = await made(supervisor, '/api/welders', { stamp: 'ACC-01', name: 'Access One' })
  const onOther = await made(supervisor, '/api/welders', { stamp: 'ACC-02', name: 'Access Two' })
  expect((await supervisor.fetch(`/api/projects/${granted.id}/welders`, json({ welderId: onGranted.id }))).status).toBe(200)
  expect((await supervisor.fetch(`/api/projects/${other.id}/welders`, json({ welderId: onOther.id }))).status).toBe(200)
  expect((await supervisor.fetch(`/api/projects/${granted.id}/auditors`, json({ accountId: auditorId }))).status).toBe(200)

  on.certified = await testWithFiles(onGranted.id, [1, 3], true) // 1 mm and 3 mm pass (QW-163, SI: ≤ 3 mm)
  on.recorded = await testWithFiles(onGranted.id, [1, 2], false) // results in, not yet certified
  on.failed = await testWithFiles(onGranted.id, [1, 4], true) // 4 mm > 3 mm fails (QW-163)
  on.ungranted = await testWithFiles(onOther.id, [0, 0], true)
  // The demo welder's own roster entry, which also welds on the demo auditor's granted project (the case of the finding)
  const ownWelderId = (await welder.json<{ welder: { id: number } }>('/api/me/qualifications')).body.welder.id
  on.own = await testWithFiles(ownWelderId, [1, 2], false)
})
afterAll(async () => server?.stop())

const statusOf = async (client: Client, path: string) => (await client.fetch(path)).status

describe('an auditor reads a welder test and its files by one rule', () => {
  it('the setup holds: the tests stand as named', async () => {
    for (const [status, files] of [['certified', on.certified], ['recorded', on.recorded], ['failed', on.failed], ['certified', on.ungranted]] as const) {
      expect((await inspector.json<{ status: string }>(`/api/tests/${files.testId}`)).body.status).toBe(status)
    }
  })

  it('certified test on a granted project: sheet, files, thumbnail and list are 200', async () => {
    const { testId, pdf, png } = on.certified
    expect(await statusOf(auditor, `/api/sheets/tests/${testId}`)).toBe(200)
    expect(await statusOf(auditor, `/api/attachments/${pdf}`)).toBe(200)
    expect(await statusOf(auditor, `/api/attachments/${png}`)).toBe(200)
    expect(await statusOf(auditor, `/api/attachments/${png}/thumbnail`)).toBe(200)
    const list = await auditor.json<{ items: { id: number }[] }>(`/api/attachments?recordType=welder-test&recordId=${testId}`)
    expect(list.status).toBe(200)
    expect(list.body.items.map(i => i.id).sort()).toEqual([pdf, png].sort())
  })

  for (const which of ['recorded', 'failed', 'ungranted'] as const) {
    it(`${which === 'ungranted' ? 'certified test on a project not granted' : `${which} test on a granted project`}: sheet, files, thumbnail and list are 404`, async () => {
      const { testId, pdf, png } = on[which]
      expect(await statusOf(auditor, `/api/sheets/tests/${testId}`)).toBe(404)
      expect(await statusOf(auditor, `/api/attachments/${pdf}`)).toBe(404)
      expect(await statusOf(auditor, `/api/attachments/${png}`)).toBe(404)
      expect(await statusOf(auditor, `/api/attachments/${png}/thumbnail`)).toBe(404)
      expect(await statusOf(auditor, `/api/attachments?recordType=welder-test&recordId=${testId}`)).toBe(404)
    })
  }

  it('a recorded test of a welder on the auditor\'s granted project: its welder reads the files, the auditor gets 404', async () => {
    const { testId, pdf, png } = on.own
    expect(await statusOf(welder, `/api/attachments/${pdf}`)).toBe(200)
    expect(await statusOf(welder, `/api/attachments/${png}/thumbnail`)).toBe(200)
    expect(await statusOf(auditor, `/api/sheets/tests/${testId}`)).toBe(404)
    expect(await statusOf(auditor, `/api/attachments/${pdf}`)).toBe(404)
    expect(await statusOf(auditor, `/api/attachments/${png}/thumbnail`)).toBe(404)
  })

  it('staff read every one of them; a welder none of another welder\'s', async () => {
    for (const [which, files] of Object.entries(on)) {
      expect(await statusOf(supervisor, `/api/attachments/${files.pdf}`)).toBe(200)
      expect(await statusOf(inspector, `/api/attachments/${files.png}/thumbnail`)).toBe(200)
      if (which === 'own') continue
      expect(await statusOf(welder, `/api/attachments/${files.pdf}`)).toBe(404)
      expect(await statusOf(welder, `/api/sheets/tests/${files.testId}`)).toBe(404)
    }
  })
})
