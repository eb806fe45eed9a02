import dayjs from 'dayjs'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'

// An ISO 9606-1 test end to end: recorded in ISO terms, certified, confirmed (9.2), its expiry by the 9.3 route.
// Expected dates are computed with dayjs from the dates sent (ISO 9606-1 9.2: six months; 9.3 b): two years).
let server: TestServer
let supervisor: Client
let inspector: Client
let welder: Client
let welderId: number
let welderStamp: string

beforeAll(async () => {
  server = await startServer({ port: 3421 })
  supervisor = await signedIn(server.url, 'supervisor')
  inspector = await signedIn(server.url, 'inspector')
  welder = await signedIn(server.url, 'welder')
  const me = (await welder.json<{ welder: { id: number, stamp: string } }>('/api/me/qualifications')).body.welder
  welderId = me.id
  welderStamp = me.stamp
})
afterAll(async () => server?.stop())

type Json = Record<string, unknown> & { data?: { fieldErrors: Record<string, string[]> } }
const send = (client: Client, path: string, body: unknown, method = 'POST') =>
  client.json<Json>(path, { method, body: JSON.stringify(body), headers: { 'content-type': 'application/json' } })
const today = dayjs().format('YYYY-MM-DD')
const testDate = dayjs().subtract(3, 'month').format('YYYY-MM-DD')
const isoBlock = { fillerType: 'S', details: 'ss nb', examiner: 'R. Examiner', examiningBody: 'Test body', testMethods: ['VT', 'BT'], route: 'b' }
const coupon = (extra: Record<string, unknown> = {}) => ({
  welderId, testDate, code: 'iso-9606-1', edition: '2017', unit: 'mm', processes: [{ process: '135', transfer: 'short-circuit' }],
  form: 'plate', weld: 'groove', couponThickness: 10, fNumber: '1', positions: ['PF'], visualAccepted: true, examination: 'bend',
  bends: [{ type: 'face', largestIndication: 0 }, { type: 'root', largestIndication: 1 }], iso: isoBlock, ...extra,
})
interface Test { id: number, version: number, status: string, designation: string, evaluation: { outcome: string, ranges: { thickness: unknown, positions: { groove: string[] }, fillerGroups: string[] } | null }, signatures: { verifyCode: string }[] }
interface Validity { designation: string, route: string, validity: { lapsesOn: string, confirmationDue: string, expiresOn: string, lapsedBy: string } | null, records: { kind: string, on: string, signerName: string, sha256: string }[] }

describe('ISO 9606-1 welder tests', () => {
  it('refuses ASME words on an ISO test and ISO words on an ASME test (400 with field messages)', async () => {
    const asmePositions = await send(inspector, '/api/tests', coupon({ positions: ['3G'] }))
    expect(asmePositions.status).toBe(400)
    expect(asmePositions.body.data?.fieldErrors.positions).toBeDefined()
    const noIso = await send(inspector, '/api/tests', coupon({ iso: null }))
    expect(noIso.status).toBe(400)
    expect(noIso.body.data?.fieldErrors.iso).toBeDefined()
  })

  let id: number
  it('records 135 P BW FM1 S t10 PF ss nb, with the clause 5 ranges and the designation written the standard\'s way', async () => {
    const created = await send(inspector, '/api/tests', coupon())
    expect(created.status).toBe(201)
    id = created.body.id as number
    const test = (await inspector.json<Test>(`/api/tests/${id}`)).body
    expect(test.designation).toBe('ISO 9606-1 135 P BW FM1 S t10 PF ss nb') // ISO 9606-1 clause 10 (issue 19 example)
    expect(test.evaluation.ranges?.thickness).toEqual({ min: 3, max: 20 }) // Table 6, 3 mm to 2t (summary sheet)
    expect(test.evaluation.ranges?.positions.groove).toEqual(['PA', 'PF']) // Table 9, PF → PA, PF (summary sheet S1)
    expect(test.evaluation.ranges?.fillerGroups).toEqual(['FM1', 'FM2']) // 5.5, FM1 → FM1, FM2 (summary sheet S2)
    expect(test.evaluation.outcome).toBe('passed') // clause 7 bend: 1 mm ≤ 3 mm (from memory)
  })

  it('a confirmation before certification is refused (409); certifying signs format 3 and verifies unchanged', async () => {
    const early = await send(supervisor, `/api/tests/${id}/iso-validity`, { kind: 'confirmation', on: today, confirmer: 'coordinator', statement: 'Worked within the range of qualification.' })
    expect(early.status).toBe(409)
    const test = (await inspector.json<Test>(`/api/tests/${id}`)).body
    expect((await send(inspector, `/api/tests/${id}/certify`, { version: test.version })).status).toBe(200)
    const after = (await inspector.json<Test>(`/api/tests/${id}`)).body
    expect(after.status).toBe('certified')
    const verify = await supervisor.json<{ state: string }>(`/api/verify/${after.signatures[0]!.verifyCode}`)
    expect(verify.body.state).toBe('unchanged')
  })

  it('route b: lapses six months after the test without a 9.2 confirmation; valid two years by 9.3 b)', async () => {
    const v = (await welder.json<Validity>(`/api/tests/${id}/iso-validity`)).body
    expect(v.validity?.confirmationDue).toBe(dayjs(testDate).add(6, 'month').format('YYYY-MM-DD'))
    expect(v.validity?.expiresOn).toBe(dayjs(testDate).add(2, 'year').format('YYYY-MM-DD'))
    expect(v.validity?.lapsesOn).toBe(v.validity?.confirmationDue)
  })

  it('a welder cannot sign (403); a date before the test or a production-weld record without its welds is a 400', async () => {
    const body = { kind: 'confirmation', on: today, confirmer: 'coordinator', statement: 'Worked within the range of qualification.' }
    expect((await send(welder, `/api/tests/${id}/iso-validity`, body)).status).toBe(403)
    const before = await send(supervisor, `/api/tests/${id}/iso-validity`, { ...body, on: dayjs(testDate).subtract(1, 'day').format('YYYY-MM-DD') })
    expect(before.status).toBe(400)
    expect(before.body.data?.fieldErrors.on).toBeDefined()
    const welds = await send(inspector, `/api/tests/${id}/iso-validity`, { ...body, kind: 'production-welds', confirmer: 'examiner' })
    expect(welds.status).toBe(400)
    expect(welds.body.data?.fieldErrors.reference).toBeDefined()
  })

  it('the coordinator confirms today: the next confirmation is due six months on, and the standing follows it', async () => {
    const signed = await send(supervisor, `/api/tests/${id}/iso-validity`, { kind: 'confirmation', on: today, confirmer: 'coordinator', statement: 'Worked within the range of qualification.' })
    expect(signed.status).toBe(200)
    expect(String(signed.body.sha256)).toMatch(/^[0-9a-f]{64}$/)
    const v = (await inspector.json<Validity>(`/api/tests/${id}/iso-validity`)).body
    const due = dayjs(today).add(6, 'month').format('YYYY-MM-DD')
    expect(v.validity?.confirmationDue).toBe(due)
    expect(v.records).toHaveLength(1)
    // The ISO standing is kept under the ISO 4063 number, apart from the ASME processes of the same welder
    type Board = { rows: { welderStamp: string, process: string, code: string, lapsesOn: string }[] }
    const iso = (await supervisor.json<Board>(`/api/continuity/standings?q=${welderStamp}&process=135&limit=50`)).body.rows
    expect(iso).toHaveLength(1)
    expect(iso[0]).toMatchObject({ welderStamp, code: 'iso-9606-1', lapsesOn: due })
    const all = (await supervisor.json<Board>(`/api/continuity/standings?q=${welderStamp}&limit=50`)).body.rows.filter(r => r.welderStamp === welderStamp)
    expect(all.length, 'the welder also holds ASME standings').toBeGreaterThan(1)
    expect(all.filter(r => r.process !== '135').every(r => r.code !== 'iso-9606-1')).toBe(true)
  })

  it('the certificate sheet speaks the standard\'s terms: designation, examiner, 9.2 record, 9.3 route, caution', async () => {
    const sheet = (await inspector.json<{ kindTitle: string, blocks: { heading: string, fields?: { label: string, value: string }[], table?: { rows: string[][] } }[], caution: string }>(`/api/sheets/tests/${id}?format=json`)).body
    expect(sheet.kindTitle).toContain('ISO 9606-1')
    const cert = sheet.blocks.find(b => b.heading === 'ISO 9606-1 certificate')!
    expect(cert.fields?.find(f => f.label === 'Designation')?.value).toBe('ISO 9606-1 135 P BW FM1 S t10 PF ss nb')
    expect(cert.fields?.find(f => f.label === 'Examiner')?.value).toBe('R. Examiner')
    expect(cert.fields?.find(f => f.label === 'Revalidation')?.value).toMatch(/^9\.3 b\)/)
    expect(sheet.blocks.find(b => b.heading.startsWith('Validity'))?.table?.rows).toHaveLength(1)
    expect(sheet.caution).toMatch(/final word/)
  })

  it('the demo ISO certificate (route b) is extended by its production-weld record and kept by its confirmations (9.2, 9.3 b)', async () => {
    const list = (await supervisor.json<{ items: { id: number, code: string, welderStamp: string }[] }>('/api/tests?process=135&pageSize=50')).body.items
    const demo = list.find(t => t.code === 'iso-9606-1' && t.welderStamp !== welderStamp)!
    const v = (await supervisor.json<Validity & { testDate: string }>(`/api/tests/${demo.id}/iso-validity`)).body
    expect(v.route).toBe('b')
    const end = dayjs(v.testDate).add(2, 'year')
    const welds = v.records.filter(r => r.kind === 'production-welds' && !dayjs(r.on).isBefore(end.subtract(6, 'month')) && dayjs(r.on).isBefore(end))
    expect(welds.length, 'a production-weld record in the last six months').toBeGreaterThan(0)
    expect(v.validity?.expiresOn).toBe(end.add(2, 'year').format('YYYY-MM-DD'))
    const last = v.records.filter(r => r.kind === 'confirmation').map(r => r.on).sort().at(-1)!
    expect(v.validity?.confirmationDue).toBe(dayjs(last).add(6, 'month').format('YYYY-MM-DD'))
  })

  it('an ASME test is not an ISO certificate: its iso-validity is a 404', async () => {
    const list = (await supervisor.json<{ items: { id: number, code: string }[] }>('/api/tests?pageSize=50')).body.items
    const asme = list.find(t => t.code === 'asme-ix')!
    expect((await supervisor.fetch(`/api/tests/${asme.id}/iso-validity`)).status).toBe(404)
  })
})
