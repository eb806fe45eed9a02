import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'

let server: TestServer
let supervisor: Client
let inspector: Client
let welder: Client
let ownWelderId: number
let otherWelderId: number

beforeAll(async () => {
  server = await startServer()
  supervisor = await signedIn(server.url, 'supervisor')
  inspector = await signedIn(server.url, 'inspector')
  welder = await signedIn(server.url, 'welder')
  ownWelderId = (await welder.json<{ welder: { id: number } }>('/api/me/qualifications')).body.welder.id
  otherWelderId = (await supervisor.json<{ items: { id: number }[] }>('/api/welders?q=KB-01')).body.items[0]!.id
})
afterAll(async () => server?.stop())

type Json = Record<string, unknown> & { data?: { fieldErrors: Record<string, string[]> } }
const send = (client: Client, path: string, body: unknown, method = 'POST') =>
  client.json<Json>(path, { method, body: JSON.stringify(body), headers: { 'content-type': 'application/json' } })

/** A 10 mm SMAW plate groove coupon welded in 3G, recorded in mm. */
const coupon = (welderId: number, extra: Record<string, unknown> = {}) => ({
  welderId, testDate: '2026-11-20', code: 'asme-ix', edition: '2023', unit: 'mm', processes: [{ process: 'SMAW', depositThickness: 10 }], form: 'plate', weld: 'groove',
  couponThickness: 10, layers: 3, pNumber: '1', fNumber: '4', backing: true, positions: ['3G'], progression: 'uphill',
  visualAccepted: null, examination: 'bend', bends: [], ...extra,
})

interface Test { id: number, version: number, status: string, evaluation: { outcome: string, steps: { step: string, state: string, text: string }[], ranges: { positions: { groove: string[] }, depositMax: number, reasons: { clause: string }[] } | null }, bends: { accepted: boolean }[], signatures: { meaning: string, sha256: string, verifyCode: string }[] }

describe('welder tests', () => {
  it('visual examination is the gate: bends before an accepted visual are refused', async () => {
    const res = await send(inspector, '/api/tests', coupon(ownWelderId, { bends: [{ type: 'face', largestIndication: 0 }] }))
    expect(res.status).toBe(400)
    expect(res.body.data?.fieldErrors.visualAccepted?.[0]).toMatch(/visual/)
  })

  it('records a 3G plate test in mm; a 4 mm open discontinuity fails the bend (ASME BPVC IX-2023, QW-163: 3 mm in SI units)', async () => {
    const created = await send(inspector, '/api/tests', coupon(ownWelderId, {
      visualAccepted: true, bends: [{ type: 'face', largestIndication: 2 }, { type: 'root', largestIndication: 4 }],
    }))
    expect(created.status).toBe(201)
    const test = (await inspector.json<Test>(`/api/tests/${created.body.id}`)).body
    expect(test.evaluation.outcome).toBe('failed')
    expect(test.bends.map(b => b.accepted)).toEqual([true, false]) // 2 mm ≤ 3 mm passes, 4 mm > 3 mm fails (QW-163)
    // The ranges are still computed and explained: 3G plate groove qualifies F and V groove (ASME BPVC IX-2023, Table QW-461.9)
    expect(test.evaluation.ranges?.positions.groove).toEqual(['F', 'V'])
    // Deposit 10 mm qualifies up to 2t = 20 mm (ASME BPVC IX-2023, Table QW-452.1(b))
    expect(test.evaluation.ranges?.depositMax).toBe(20)
    expect(test.evaluation.ranges?.reasons.map(r => r.clause)).toContain('QW-452.1(b)')

    const certified = await send(inspector, `/api/tests/${test.id}/certify`, { version: test.version })
    expect(certified.status).toBe(200)
    const after = (await inspector.json<Test>(`/api/tests/${test.id}`)).body
    expect(after.status).toBe('failed') // a failed test stays on the record
    expect(after.signatures).toHaveLength(1)
    expect(after.signatures[0]).toMatchObject({ meaning: 'certified' })
    expect(after.signatures[0]!.sha256).toMatch(/^[0-9a-f]{64}$/)
  })

  it('a passing test certifies, is signed over its content hash and is frozen (409 on any change)', async () => {
    const created = await send(inspector, '/api/tests', coupon(ownWelderId, { visualAccepted: true, bends: [{ type: 'face', largestIndication: 1 }] }))
    const id = created.body.id as number
    // 10 mm needs 2 bends (ASME BPVC IX-2023, Table QW-452.1(a)): one recorded is still pending
    const pending = (await inspector.json<Test>(`/api/tests/${id}`)).body
    expect(pending.evaluation.outcome).toBe('pending')
    expect((await send(inspector, `/api/tests/${id}/certify`, { version: pending.version })).status).toBe(409)

    const edited = await send(inspector, `/api/tests/${id}`, { ...coupon(ownWelderId, { visualAccepted: true, bends: [{ type: 'face', largestIndication: 1 }, { type: 'root', largestIndication: 3 }] }), version: pending.version }, 'PATCH')
    expect(edited.status).toBe(200)
    expect(edited.body.version).toBe(pending.version + 1)
    // A stale version is refused
    expect((await send(inspector, `/api/tests/${id}`, { ...coupon(ownWelderId), version: pending.version }, 'PATCH')).status).toBe(409)

    const ready = (await inspector.json<Test>(`/api/tests/${id}`)).body
    expect(ready.evaluation.outcome).toBe('passed') // exactly 3 mm passes in SI (ASME BPVC IX-2023, QW-163)
    expect((await send(inspector, `/api/tests/${id}/certify`, { version: ready.version - 1 })).status).toBe(409)
    const signed = await send(inspector, `/api/tests/${id}/certify`, { version: ready.version })
    expect(signed.status).toBe(200)
    const frozen = (await inspector.json<Test>(`/api/tests/${id}`)).body
    expect(frozen.status).toBe('certified')
    expect((await send(inspector, `/api/tests/${id}`, { ...coupon(ownWelderId, { visualAccepted: true }), version: frozen.version }, 'PATCH')).status).toBe(409)
    expect((await send(inspector, `/api/tests/${id}/certify`, { version: frozen.version })).status).toBe(409)

    // The welder now stands current for SMAW from this test
    const me = await welder.json<{ standings: { process: string, testDate: string }[] }>('/api/me/qualifications')
    expect(me.body.standings.find(s => s.process === 'SMAW')?.testDate).toBe('2026-11-20')
  })

  it('a welder reads their own test and gets 404 for another welder\'s; the quality manager only reads', async () => {
    const mine = await send(inspector, '/api/tests', coupon(ownWelderId))
    const theirs = await send(inspector, '/api/tests', coupon(otherWelderId))
    expect((await welder.fetch(`/api/tests/${mine.body.id}`)).status).toBe(200)
    expect((await welder.fetch(`/api/tests/${theirs.body.id}`)).status).toBe(404)
    expect((await welder.fetch('/api/tests/999999')).status).toBe(404)
    expect((await supervisor.fetch(`/api/tests/${theirs.body.id}`)).status).toBe(200)
    expect((await send(supervisor, '/api/tests', coupon(ownWelderId))).status).toBe(403)
  })

  it('bad input is a 400 per field, never a 500', async () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ welderId: 999999 }, 'welderId'],
      [{ procedureId: 999999 }, 'procedureId'],
      [{ edition: '1999' }, 'edition'],
      [{ form: 'pipe', outsideDiameter: null }, 'outsideDiameter'],
      [{ positions: ['2F'] }, 'positions'],
      [{ couponThickness: -1 }, 'couponThickness'],
      [{ testDate: '2026-13-01' }, 'testDate'],
    ]
    for (const [extra, field] of cases) {
      const res = await send(inspector, '/api/tests', { ...coupon(ownWelderId), ...extra })
      expect(res.status, field).toBe(400)
      expect(Object.keys(res.body.data?.fieldErrors ?? {}), field).toContain(field)
    }
  })

  it('radiography is judged by the rules (ASME BPVC IX-2023, QW-191.1.2.2(b)(1): any crack rejects)', async () => {
    const created = await send(inspector, '/api/tests', coupon(ownWelderId, { examination: 'radiography', visualAccepted: true, radiography: { indications: [{ kind: 'crack', length: 1 }] } }))
    expect(created.status).toBe(201)
    const test = (await inspector.json<Test>(`/api/tests/${created.body.id}`)).body
    expect(test.evaluation.outcome).toBe('failed')
    expect(test.evaluation.steps.at(-1)?.step).toBe('radiography')
  })
})
