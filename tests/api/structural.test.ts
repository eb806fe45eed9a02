import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'
import { blankLayer, blankProcedureDraft, type ProcedureDraft } from '#shared/schemas/procedure'

interface Item { limit: string, table: string, state: 'pass' | 'fail' | 'by-hand', text: string, required?: string }
interface Detail {
  procedure: { id: number, status: string, version: number, handCheck: string | null }
  pqrs: unknown[]
  prequalified: { edition: string, clause: string, items: Item[], failures: number, byHand: number } | null
}
type Answer = { id: number, version: number, status: string, message?: string, data?: { fieldErrors?: Record<string, string[]>, failures?: Item[] } }

let server: TestServer
let supervisor: Client
let inspector: Client
let welderId: number
const send = (client: Client, method: string, path: string, body?: unknown) =>
  client.json<Answer>(path, { method, headers: { 'content-type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) })

beforeAll(async () => {
  server = await startServer()
  supervisor = await signedIn(server.url, 'supervisor')
  inspector = await signedIn(server.url, 'inspector')
  welderId = (await supervisor.json<{ items: { id: number }[] }>('/api/welders?q=KB-02')).body.items[0]!.id
})
afterAll(async () => server?.stop())

/** A prequalified FCAW T-joint on A36 to A572 Gr 50, up to 1 in, written for this test. */
async function prequalifiedDraft(number: string, preheatMin: number | null): Promise<ProcedureDraft> {
  const add = async (specification: string, grade: string) => {
    const made = await send(supervisor, 'POST', '/api/catalogue/base-metals', { specification, grade, pNumber: '1', groupNumber: 1, minTensilePsi: 58000 })
    if (made.status === 201) return made.body.id
    const list = await supervisor.json<{ id: number, specification: string, grade: string }[]>('/api/catalogue/base-metals')
    return list.body.find(b => b.specification === specification && b.grade === grade)!.id
  }
  const a = await add('ASTM A36', '—')
  const b = await add('ASTM A572', 'Grade 50')
  const layer = { ...blankLayer('FCAW', 'all passes'), fillers: [{ fillerMetalId: null, specification: 'SFA-5.20', classification: 'E71T-1C', fNumber: '6', aNumber: '1', size: 0.045 }] }
  return {
    ...blankProcedureDraft(), number, title: 'Prequalified FCAW tee, test', code: 'aws-d1.1', edition: '2020', unit: 'in', prequalified: true,
    baseMetals: { a: { baseMetalId: a, pNumber: '1', groupNumber: 1 }, b: { baseMetalId: b, pNumber: '1', groupNumber: 2 } },
    thickness: { groove: { min: 0.25, max: 1 }, fillet: { min: null, max: null } },
    joints: { type: 'tee', groove: 'single bevel with backing', grooveAngle: 30, rootOpening: { min: 0.1875, max: 0.25 }, rootFace: { min: null, max: null }, backing: 'steel bar', designation: 'TC-U4a-GF' },
    positions: ['F', 'H', 'V'], progression: 'uphill', preheatMin, layers: [layer],
  }
}

describe('a prequalified AWS D1.1 WPS', () => {
  it('is refused on a preheat below Table 5.8, shows what is required, then is approved without a PQR on the signed hand-check statement', async () => {
    const made = await send(supervisor, 'POST', '/api/procedures', await prequalifiedDraft('ST-PQ-1', 40))
    expect(made.status).toBe(201)
    const id = made.body.id
    const d1 = await supervisor.json<Detail>(`/api/procedures/${id}`)
    expect(d1.body.pqrs).toHaveLength(0)
    expect(d1.body.prequalified).toMatchObject({ edition: '2020', clause: 'clause 5' })
    // D1.1:2015 Table 3.3 (read): category B, over 3/4 thru 1-1/2 in: 50 °F; the 2020 table taken as the same.
    const preheat = d1.body.prequalified!.items.find(i => i.limit === 'preheat')!
    expect(preheat).toMatchObject({ state: 'fail', table: 'Table 5.8', required: '50 °F or more' })

    const low = await send(supervisor, 'POST', `/api/procedures/${id}/approve`, { version: d1.body.procedure.version, handCheck: 'Pass sizes checked against the requirements table.' })
    expect(low.status).toBe(422)
    expect(low.body.message).toContain('50 °F')

    // The quality manager fixes the preheat.
    const fixed = await send(supervisor, 'PATCH', `/api/procedures/${id}`, { version: d1.body.procedure.version, draft: await prequalifiedDraft('ST-PQ-1', 50) })
    expect(fixed.status).toBe(200)
    const d2 = await supervisor.json<Detail>(`/api/procedures/${id}`)
    expect(d2.body.prequalified!.failures).toBe(0)
    expect(d2.body.prequalified!.byHand).toBeGreaterThan(0)

    // Limits not carried: the signed statement is required.
    const bare = await send(supervisor, 'POST', `/api/procedures/${id}/approve`, { version: d2.body.procedure.version })
    expect(bare.status).toBe(400)
    expect(bare.body.data?.fieldErrors?.handCheck?.[0]).toContain('by hand')

    const ok = await send(supervisor, 'POST', `/api/procedures/${id}/approve`, { version: d2.body.procedure.version, handCheck: 'Root and fill pass sizes and current checked against the requirements table.' })
    expect(ok.status).toBe(200)
    const d3 = await supervisor.json<Detail>(`/api/procedures/${id}`)
    expect(d3.body.procedure.status).toBe('approved')
    expect(d3.body.procedure.handCheck).toContain('Root and fill')

    const sheet = await supervisor.json<{ blocks: { heading: string, table?: { rows: string[][] }, notes?: string[] }[], caution: string }>(`/api/sheets/procedures/${id}?format=json`)
    expect(sheet.status).toBe(200)
    const block = sheet.body.blocks.find(b => b.heading === 'Prequalified (AWS D1.1:2020 clause 5)')
    expect(block).toBeDefined()
    expect(block!.table!.rows.some(r => r[1] === 'Table 5.8' && r[3] === 'within')).toBe(true)
    expect(block!.notes!.join(' ')).toContain('final word')
  })

  it('a WPS marked prequalified under another code is a 400 on the field', async () => {
    const draft = { ...await prequalifiedDraft('ST-PQ-2', 50), code: 'asme-ix', edition: '2023' }
    const res = await send(supervisor, 'POST', '/api/procedures', draft)
    expect(res.status).toBe(400)
    expect(res.body.data?.fieldErrors?.prequalified).toBeDefined()
  })

  it('GMAW short-circuit is outside the prequalified processes (3.2.1) and cannot be approved', async () => {
    const draft = await prequalifiedDraft('ST-PQ-3', 50)
    draft.layers = [{ ...blankLayer('GMAW', 'all passes'), transfer: 'short-circuit', fillers: [{ fillerMetalId: null, specification: 'SFA-5.18', classification: 'ER70S-6', fNumber: '6', aNumber: '1', size: 0.035 }] }]
    const made = await send(supervisor, 'POST', '/api/procedures', draft)
    expect(made.status).toBe(201)
    const res = await send(supervisor, 'POST', `/api/procedures/${made.body.id}/approve`, { version: made.body.version, handCheck: 'Checked by hand against the clause.' })
    expect(res.status).toBe(422)
    expect(res.body.message).toContain('short-circuit')
  })
})

interface TestView { id: number, version: number, status: string, jointType: string | null, evaluation: { outcome: string, steps: { step: string, state: string, text: string }[], ranges: { thickness?: { min: number, max: number | null }, positions: { groove: string[], fillet: string[] } } | null } }
const testOf = async (id: number) => (await inspector.json<TestView>(`/api/tests/${id}`)).body

describe('structural welder tests', () => {
  it('a D1.3 fillet test on 14 gauge sheet saves with its joint type and certifies', async () => {
    // 14 ga = 0.0747 in (Manufacturers' Standard Gauge, docs/sources.md D); GMAW-S is allowed under D1.3 (sources B).
    const created = await send(inspector, 'POST', '/api/tests', {
      welderId, testDate: '2026-11-25', code: 'aws-d1.3', edition: '2018', unit: 'in', processes: [{ process: 'GMAW', transfer: 'short-circuit', depositThickness: null }],
      form: 'plate', weld: 'fillet', jointType: 'fillet', couponThickness: 0.0747, backing: false, positions: ['2F'],
      visualAccepted: true, examination: 'macro-fracture', macro: { accepted: true, notes: 'two assemblies, macro-etch sound' },
    })
    expect(created.status).toBe(201)
    const test = await testOf(created.body.id)
    expect(test.jointType).toBe('fillet')
    expect(test.evaluation.outcome).toBe('passed')
    // D1.3 4.7.2 (2008; sources B, read): a fillet test is made on the thinnest production sheet, up to the 3/16 in scope limit.
    expect(test.evaluation.ranges?.thickness).toEqual({ min: 0.0747, max: 0.1875 })
    // D1.3 Table 4.4 (read): 2F qualifies F and H.
    expect(test.evaluation.ranges?.positions.fillet).toEqual(['F', 'H'])
    const certified = await send(inspector, 'POST', `/api/tests/${test.id}/certify`, { version: test.version })
    expect(certified.status).toBe(200)
    expect((await testOf(test.id)).status).toBe('certified')
  })

  it('D1.3 refuses a groove test without its joint type and sends sheet over 3/16 in to D1.1 (400 on the fields)', async () => {
    const base = {
      welderId, testDate: '2026-11-25', code: 'aws-d1.3', edition: '2018', unit: 'in', processes: [{ process: 'GMAW', transfer: 'short-circuit', depositThickness: null }],
      form: 'plate', weld: 'groove', couponThickness: 0.0747, backing: false, positions: ['1G'], visualAccepted: null, examination: 'bend',
    }
    const noJoint = await send(inspector, 'POST', '/api/tests', base)
    expect(noJoint.status).toBe(400)
    expect(noJoint.body.data?.fieldErrors?.jointType).toBeDefined()
    // D1.3 scope: 3/16 in (4.8 mm) or less (sources B, read).
    const thick = await send(inspector, 'POST', '/api/tests', { ...base, jointType: 'square-groove', couponThickness: 0.25 })
    expect(thick.status).toBe(400)
    expect(thick.body.data?.fieldErrors?.couponThickness?.[0]).toContain('D1.1')
  })

  it('a D1.1 3G plate test judged by radiography certifies', async () => {
    const created = await send(inspector, 'POST', '/api/tests', {
      welderId, testDate: '2026-11-26', code: 'aws-d1.1', edition: '2020', unit: 'in', processes: [{ process: 'FCAW', transfer: null, depositThickness: 0.375 }],
      form: 'plate', weld: 'groove', couponThickness: 0.375, backing: true, positions: ['3G'], progression: 'uphill',
      visualAccepted: true, examination: 'radiography', radiography: { indications: [], reportNumber: 'RT-0426' },
    })
    expect(created.status).toBe(201)
    const test = await testOf(created.body.id)
    expect(test.evaluation.outcome).toBe('passed')
    // D1.1:2020 Table 6.10 (read): 3G qualifies groove F, H, V.
    expect(test.evaluation.ranges?.positions.groove).toEqual(['F', 'H', 'V'])
    const certified = await send(inspector, 'POST', `/api/tests/${test.id}/certify`, { version: test.version })
    expect(certified.status).toBe(200)
    expect((await testOf(test.id)).status).toBe('certified')
  })

  it('a D1.1 film with porosity stays open for the inspector to judge by hand (never accepted by the program)', async () => {
    const created = await send(inspector, 'POST', '/api/tests', {
      welderId, testDate: '2026-11-26', code: 'aws-d1.1', edition: '2020', unit: 'in', processes: [{ process: 'SMAW', transfer: null, depositThickness: 0.375 }],
      form: 'plate', weld: 'groove', couponThickness: 0.375, fNumber: '4', backing: true, positions: ['1G'],
      visualAccepted: true, examination: 'radiography', radiography: { indications: [{ kind: 'rounded', length: 0.03 }], reportNumber: null },
    })
    expect(created.status).toBe(201)
    const test = await testOf(created.body.id)
    expect(test.evaluation.outcome).toBe('pending')
    expect((await send(inspector, 'POST', `/api/tests/${test.id}/certify`, { version: test.version })).status).toBe(409)
  })
})
