import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'

// ISO 15614-1 as a procedure code of its own: which code a WPS, a WPQR and a welder test may name (400 with field
// messages otherwise), and the ISO 15609-1 WPS checked against its ISO 15614-1 WPQR variable by variable. The expected
// ranges are those of ISO 15614-1:2017 clause 8 as remembered ("from memory"): t = 15 mm multi-run → 7.5 to 30 mm (Table 6).
let server: TestServer
let supervisor: Client
let inspector: Client

beforeAll(async () => {
  server = await startServer({ port: 3431 })
  supervisor = await signedIn(server.url, 'supervisor')
  inspector = await signedIn(server.url, 'inspector')
})
afterAll(async () => server?.stop())

type Json = Record<string, unknown> & { data?: { fieldErrors: Record<string, string[]> } }
const send = (client: Client, path: string, body: unknown, method = 'POST') =>
  client.json<Json>(path, { method, body: JSON.stringify(body), headers: { 'content-type': 'application/json' } })

interface Finding { met: boolean, clause: string, text: string, byHand?: boolean }
interface Detail { procedure: { id: number, code: string }, support: { supported: boolean, findings: Finding[], violations: Finding[], caution: string | null } }

const layer = (extra: Record<string, unknown> = {}) => ({
  name: 'all passes', passes: null, process: '135', transfer: 'spray', fillerAdded: null, depositMax: null, current: 'DCEP',
  fillers: [{ fillerMetalId: null, specification: 'ISO 14341-A', classification: 'G 42 4 M21 3Si1', fNumber: 'FM1', aNumber: null, size: 1.2 }],
  amps: { min: 240, max: 285, setPoint: 265 }, volts: { min: 27, max: 30, setPoint: 28.5 }, wireFeed: { min: null, max: null, setPoint: null },
  travelSpeed: { min: 280, max: 360, setPoint: 320 }, heatInputMax: 1700, ctwd: { min: null, max: null, setPoint: null },
  gas: { composition: 'M21', flow: { min: 14, max: 18, setPoint: 16 } }, bead: 'stringer', pulsing: false, oscillation: null, electrodes: 'single',
  passesPerSide: null, backGouging: false, tungsten: { type: null, size: null }, backingGas: { composition: null, flow: { min: null, max: null, setPoint: null } },
  consumableInsert: null, flux: { name: null, classification: null }, ...extra,
})
let wpqrId: number
const wps = (extra: Record<string, unknown> = {}) => ({
  number: `ISO-T-${Math.random().toString(36).slice(2, 8)}`, title: 'ISO test WPS', code: 'iso-15614-1', edition: '2017', unit: 'mm', supportingPqrIds: [wpqrId],
  baseMetals: { a: { baseMetalId: null, pNumber: '1.2', groupNumber: null }, b: { baseMetalId: null, pNumber: '1.2', groupNumber: null } },
  thickness: { groove: { min: 8, max: 30 }, fillet: { min: null, max: null } }, diameter: { min: null, max: null },
  joints: { type: 'butt', groove: null, grooveAngle: null, rootOpening: { min: null, max: null }, rootFace: { min: null, max: null }, backing: null, designation: null },
  prequalified: false, positions: ['PA', 'PF'], progression: null, toughnessRequired: true, preheatMin: 20, interpassMax: 200,
  pwht: { required: false, temperature: { min: null, max: null }, holdHours: null, note: null }, cleaning: null, layers: [layer()], ...extra,
})

describe('which code a record may name', () => {
  beforeAll(async () => {
    const list = await supervisor.json<{ items: { id: number, number: string }[] }>('/api/pqrs?q=WPQR-ISO-07')
    wpqrId = list.body.items.find(p => p.number === 'WPQR-ISO-07')!.id
  })
  it('a WPS naming ISO 9606-1 is refused: 400 with the field message naming ISO 15614-1', async () => {
    const r = await send(supervisor, '/api/procedures', wps({ code: 'iso-9606-1' }))
    expect(r.status).toBe(400)
    expect(r.body.data?.fieldErrors.code?.[0]).toContain('a WPS or WPQR names ISO 15614-1')
  })
  it('a WPQR naming ISO 9606-1 is refused the same way', async () => {
    const r = await send(supervisor, '/api/pqrs', { number: 'WPQR-X', testDate: '2026-06-01', code: 'iso-9606-1', edition: '2017', unit: 'mm', couponThickness: 10, baseMetalId: 1, layers: [{ name: 'all', process: '135', fillerMetalId: 1 }] })
    expect(r.status).toBe(400)
    expect(r.body.data?.fieldErrors.code?.[0]).toContain('ISO 9606-1 qualifies welders')
  })
  it('a welder test naming ISO 15614-1 is refused: it qualifies procedures, not welders', async () => {
    const r = await send(inspector, '/api/tests', { welderId: 1, testDate: '2026-06-01', code: 'iso-15614-1', edition: '2017', unit: 'mm', processes: [{ process: '135' }], form: 'plate', weld: 'groove', couponThickness: 10, positions: ['PA'] })
    expect(r.status).toBe(400)
    expect(JSON.stringify(r.body.data?.fieldErrors.code)).toContain('ISO 15614-1 qualifies procedures')
  })
  it('an ISO 15614-1 WPS must use ISO 4063 numbers, ISO 6947 positions and mm (400 naming each field)', async () => {
    const r = await send(supervisor, '/api/procedures', wps({ unit: 'in', positions: ['F', 'V'], progression: 'uphill', layers: [layer({ process: 'GMAW' })] }))
    expect(r.status).toBe(400)
    const fields = r.body.data!.fieldErrors
    expect(fields.positions?.join(' ')).toContain('ISO 6947')
    expect(fields.layers?.join(' ')).toContain('ISO 4063') // zod's flatten keys by the first path segment
    expect(fields.unit?.[0]).toContain('millimetres')
  })
  it('an ASME WPS may not use ISO 4063 numbers or ISO 6947 positions', async () => {
    const r = await send(supervisor, '/api/procedures', wps({ code: 'asme-ix', edition: '2023', positions: ['PA'] }))
    expect(r.status).toBe(400)
    expect(r.body.data!.fieldErrors.positions?.join(' ')).toContain('ISO 15614-1 records')
    expect(r.body.data!.fieldErrors.layers?.join(' ')).toContain('pick the process by name')
  })
})

describe('an ISO 15609-1 WPS against the ISO 15614-1 WPQR (clause 8, from memory)', () => {
  it('the demo WPS KB-ISO-135-01 is supported by WPQR-ISO-07 on every variable, each with its clause', async () => {
    const list = await supervisor.json<{ items: { id: number, number: string }[] }>('/api/procedures?q=KB-ISO-135-01')
    const id = list.body.items.find(p => p.number === 'KB-ISO-135-01')!.id
    const { body } = await supervisor.json<Detail>(`/api/procedures/${id}`)
    expect(body.procedure.code).toBe('iso-15614-1')
    expect(body.support.violations).toEqual([])
    expect(body.support.supported).toBe(true)
    const clauses = body.support.findings.map(f => f.clause)
    for (const c of ['8.4.1', '8.3.2.1, Table 6', '8.4.2', '8.3.1.1, Table 3', '8.4.8', '8.4.6', '8.4.7', '8.4.9', '8.4.4']) expect(clauses).toContain(`ISO 15614-1:2017, ${c}`)
    expect(body.support.caution).toContain('from memory')
  })
  it('a draft thicker than 2t is not supported: the Table 6 finding says so (t = 15 → 7.5 to 30 mm, from memory)', async () => {
    const created = await send(supervisor, '/api/procedures', wps({ thickness: { groove: { min: 8, max: 31 }, fillet: { min: null, max: null } } }))
    expect(created.status).toBe(201)
    const { body } = await supervisor.json<Detail>(`/api/procedures/${created.body.id}`)
    expect(body.support.supported).toBe(false)
    const t = body.support.violations.find(f => f.clause === 'ISO 15614-1:2017, 8.3.2.1, Table 6')
    expect(t?.text).toContain('qualified 7.5 to 30 mm')
  })
  it('a draft without interpass is "cannot tell: record …", never supported', async () => {
    const created = await send(supervisor, '/api/procedures', wps({ interpassMax: null }))
    const { body } = await supervisor.json<Detail>(`/api/procedures/${created.body.id}`)
    expect(body.support.supported).toBe(false)
    expect(body.support.violations.map(v => v.text)).toContain('Cannot tell: record the interpass temperature on the WPS.')
  })
  it('a draft in another parent metal group is "check by hand" (Table 3 cross-qualification not carried)', async () => {
    const created = await send(supervisor, '/api/procedures', wps({ baseMetals: { a: { baseMetalId: null, pNumber: '1.1', groupNumber: null }, b: { baseMetalId: null, pNumber: '1.1', groupNumber: null } } }))
    const { body } = await supervisor.json<Detail>(`/api/procedures/${created.body.id}`)
    expect(body.support.supported).toBe(false)
    expect(body.support.violations).toHaveLength(1)
    expect(body.support.violations[0]).toMatchObject({ byHand: true, clause: 'ISO 15614-1:2017, 8.3.1.1, Table 3' })
  })
  it('a new WPQR records its ISO test piece and answers what it qualifies (Table 6: t = 10 → 3 to 20 mm, from memory)', async () => {
    const metals = await supervisor.json<{ id: number }[]>('/api/catalogue/base-metals')
    const fillers = await supervisor.json<{ id: number }[]>('/api/catalogue/filler-metals')
    const created = await send(supervisor, '/api/pqrs', {
      number: `WPQR-T-${Date.now() % 100000}`, testDate: '2026-06-01', code: 'iso-15614-1', edition: '2017', unit: 'mm', couponThickness: 10, baseMetalId: metals.body[0]!.id, toughnessRequired: false,
      actuals: { preheat: 20, interpass: 180, pwht: 'none', iso: { positions: ['PF'], form: 'plate', runs: 'multi', materialGroup: '1.2', fillerDesignation: 'ISO 14341-A G 42 4 M21 3Si1', fillerGroup: '1' } },
      layers: [{ name: 'all passes', process: '135', transfer: 'short-circuit', fillerMetalId: fillers.body[0]!.id, heatInput: 1200 }],
    })
    expect(created.status).toBe(201)
    const { body } = await supervisor.json<{ draft: { actuals: { iso: { positions: string[] } } }, qualifies: { baseMetal: { min: number, max: number }, reasons: { clause: string }[] } }>(`/api/pqrs/${created.body.id}`)
    expect(body.draft.actuals.iso.positions).toEqual(['PF'])
    expect(body.qualifies.baseMetal).toEqual({ min: 3, max: 20 })
    expect(body.qualifies.reasons.map(r => r.clause)).toContain('ISO 15614-1:2017, 8.4.2')
  })
  it('an ISO 15614-1 WPQR without its test piece is refused (400 on actuals)', async () => {
    const r = await send(supervisor, '/api/pqrs', { number: 'WPQR-NOPIECE', testDate: '2026-06-01', code: 'iso-15614-1', edition: '2017', unit: 'mm', couponThickness: 10, baseMetalId: 1, layers: [{ name: 'all', process: '135', fillerMetalId: 1 }] })
    expect(r.status).toBe(400)
    expect(r.body.data?.fieldErrors.actuals?.join(' ')).toContain('give the test piece')
  })
})
