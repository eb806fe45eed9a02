import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'
import { samplePng, upload } from './support/files'

// The trial runs at the machine through their routes: roles and the shop's welder setting, beads and their heat
// input, the plot data, and the way from accepted beads to a draft PQR and, once it is certified, to a draft WPS
// that the support check judges. Expected values are worked by hand from the formulas named beside them.

interface Bead { id: number, number: number, verdict: string, heat: { kind: string, heatInput?: number, method?: string }, flags: { field: string, basis: string }[] }
interface Detail {
  series: { id: number, version: number, title: string }
  beads: Bead[]
  plots: { wireFeed: { marks: { verdict: string }[], region: { x: number, y: number }[] }, ctwd: { leftOff: number[] }, svg: { wireFeed: string } }
  start: { row: { volts: number, wireFeed: number }, firstBead: { volts: number } } | null
  pqr: { id: number, number: string, status: string } | null
  counts: { accepted: number, rejected: number, notJudged: number }
}
type Errors = { data?: { fieldErrors: Record<string, string[]> } }

let server: TestServer
let supervisor: Client
let inspector: Client
let welder: Client
let auditor: Client
let baseMetalId: number
let fillerMetalId: number

const send = <T = Record<string, unknown>>(client: Client, method: string, path: string, body?: unknown) =>
  client.json<T>(path, { method, headers: { 'content-type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) })

// An invented series (not the demo's): 14 ga sheet, 0.035 in wire.
const header = (over: Record<string, unknown> = {}) => ({
  title: 'Test series 14 ga', unit: 'in', process: 'GMAW', transfer: 'short-circuit', wireClass: 'ER70S-6', wireDiameter: 0.035,
  fillerMetalId, gas: '90Ar/10CO2', gasFlow: 30, baseMetal: 'test sheet', baseMetalId, thickness: 0.0747, gauge: '14 ga',
  joint: 'butt', rootGap: null, position: '1G', progression: null, notes: null, ...over,
})
const judged = { wetting: 'good', spatter: 'good', arcSound: 'good', backPenetration: 'full' }

beforeAll(async () => {
  server = await startServer()
  ;[supervisor, inspector, welder, auditor] = await Promise.all([signedIn(server.url, 'supervisor'), signedIn(server.url, 'inspector'), signedIn(server.url, 'welder'), signedIn(server.url, 'auditor')])
  const bases = await supervisor.json<{ id: number, specification: string, grade: string }[]>('/api/catalogue/base-metals')
  baseMetalId = bases.body.find(b => b.specification === 'SA-1011')!.id
  const fillers = await supervisor.json<{ id: number, classification: string }[]>('/api/catalogue/filler-metals')
  fillerMetalId = fillers.body.find(f => f.classification === 'ER70S-6')!.id
}, 90_000)
afterAll(async () => server?.stop())

describe('who may record trials', () => {
  it('staff list series; a welder only once the shop allows it; an auditor never', async () => {
    expect((await supervisor.json('/api/trials')).status).toBe(200)
    expect((await inspector.json('/api/trials')).status).toBe(200)
    expect((await auditor.json('/api/trials')).status).toBe(403)
    expect((await welder.json('/api/trials')).status).toBe(403)
    expect((await welder.json<{ welderRecordsTrials: boolean }>('/api/trials/settings')).body).toEqual({ welderRecordsTrials: false })
    expect((await send(inspector, 'PATCH', '/api/trials/settings', { welderRecordsTrials: true })).status).toBe(403)
    expect((await send(supervisor, 'PATCH', '/api/trials/settings', { welderRecordsTrials: true })).status).toBe(200)
    expect((await welder.json('/api/trials')).status).toBe(200)
    // Then the welder records a series of their own
    const made = await send<{ id: number }>(welder, 'POST', '/api/trials', header({ title: 'Welder series' }))
    expect(made.status).toBe(201)
    // but proposals stay the supervisor's
    expect((await send(welder, 'POST', `/api/trials/${made.body.id}/propose-pqr`, { number: 'X', testDate: '2026-01-01', code: 'asme-ix', edition: '2023' })).status).toBe(403)
    expect((await send(supervisor, 'PATCH', '/api/trials/settings', { welderRecordsTrials: false })).status).toBe(200)
    expect((await welder.json(`/api/trials/${made.body.id}`)).status).toBe(403)
  })
})

describe('a series and its beads', () => {
  let id: number
  it('bad input is a 400 with field messages; an unknown series is a 404', async () => {
    const bad = await send<Errors>(supervisor, 'POST', '/api/trials', header({ wireDiameter: -1, joint: 'scarf' }))
    expect(bad.status).toBe(400)
    expect(Object.keys(bad.body.data!.fieldErrors).sort()).toEqual(['joint', 'wireDiameter'])
    const noTransfer = await send<Errors>(supervisor, 'POST', '/api/trials', header({ transfer: null }))
    expect(Object.keys(noTransfer.body.data!.fieldErrors)).toEqual(['transfer'])
    expect((await supervisor.json('/api/trials/999999')).status).toBe(404)
    expect((await send(supervisor, 'POST', '/api/trials/999999/beads', { volts: 17, wireFeed: 200 })).status).toBe(404)
  })

  it('the nearest starting row is offered as the first bead (the demo table has a 0.035 in, 14 ga GMAW row)', async () => {
    const made = await send<{ id: number }>(inspector, 'POST', '/api/trials', header())
    expect(made.status).toBe(201)
    id = made.body.id
    const detail = (await inspector.json<Detail>(`/api/trials/${id}`)).body
    expect(detail.start).not.toBeNull()
    expect(detail.start!.firstBead.volts).toBe(detail.start!.row.volts)
    expect(detail.beads).toEqual([])
  })

  it('beads are numbered in turn, judged, and their heat input computed (QW-409.1)', async () => {
    // Four accepted corners and a middle bead, then a rejected bead with too much wire.
    const beads = [
      { volts: 17.5, wireFeed: 200, amps: 90, ctwd: 0.375, travelSpeed: 15, ...judged },
      { volts: 18.5, wireFeed: 200, amps: 92, ctwd: 0.375, travelSpeed: 15, ...judged },
      { volts: 18.5, wireFeed: 260, amps: 110, ctwd: 0.5, travelSpeed: 15, ...judged },
      { volts: 17.5, wireFeed: 260, amps: 108, ctwd: 0.5, travelSpeed: 15, ...judged },
      { volts: 18, wireFeed: 230, amps: 100, ctwd: 0.375, travelSpeed: 15, ...judged },
      { volts: 18, wireFeed: 330, amps: 200, ctwd: 0.375, travelSpeed: 15, ...judged, spatter: 'poor', meltThrough: true },
      { volts: 18, wireFeed: 230, energy: 43200, beadLength: 6 },
    ]
    for (const [i, b] of beads.entries()) {
      const r = await send<{ number: number }>(inspector, 'POST', `/api/trials/${id}/beads`, b)
      expect(r.status).toBe(201)
      expect(r.body.number).toBe(i + 1)
    }
    const bad = await send<Errors>(inspector, 'POST', `/api/trials/${id}/beads`, { volts: 0, wireFeed: 'fast', wetting: 'great' })
    expect(bad.status).toBe(400)
    expect(Object.keys(bad.body.data!.fieldErrors).sort()).toEqual(['volts', 'wetting', 'wireFeed'])

    const detail = (await inspector.json<Detail>(`/api/trials/${id}`)).body
    expect(detail.counts).toEqual({ accepted: 5, rejected: 1, notJudged: 1 })
    // bead 5: 18 V × 100 A × 60 / 15 in/min = 7,200 J/in (QW-409.1(a), by hand)
    expect(detail.beads[4]!.heat).toMatchObject({ kind: 'value', heatInput: 7200, method: 'volts-amps' })
    // bead 7: 43,200 J / 6 in = 7,200 J/in (QW-409.1(c), energy method, by hand)
    expect(detail.beads[6]!.heat).toMatchObject({ kind: 'value', heatInput: 7200, method: 'energy' })
    // bead 6: 200 A on 0.0747 in is far above about 1 A per 0.001 in (≈ 75 A) (common practice)
    expect(detail.beads[5]!.flags).toContainEqual(expect.objectContaining({ field: 'amps', basis: 'common practice' }))
    // The accepted region: the four corners (the middle bead is inside)
    expect(detail.plots.wireFeed.region).toHaveLength(4)
    expect(detail.plots.wireFeed.marks.map(m => m.verdict)).toEqual(['accepted', 'accepted', 'accepted', 'accepted', 'accepted', 'rejected', 'not-judged'])
    expect(detail.plots.ctwd.leftOff).toEqual([7])
    expect(detail.plots.svg.wireFeed).toContain('<svg')
  })

  it('the sheet is a PDF', async () => {
    const res = await inspector.fetch(`/api/trials/${id}/sheet`)
    expect(res.status).toBe(200)
    expect(res.headers.get('content-type')).toBe('application/pdf')
    expect(Buffer.from(await res.arrayBuffer()).subarray(0, 5).toString()).toBe('%PDF-')
  })

  it('a bead takes a photo through the file upload, with a thumbnail; those who may not use trials do not see it', async () => {
    const bead = (await inspector.json<Detail>(`/api/trials/${id}`)).body.beads[0]!
    const photo = await upload(inspector, { recordType: 'trial-bead', recordId: bead.id, kind: 'bead-photo' }, { name: 'bead1.png', type: 'image/png', bytes: samplePng })
    expect(photo.status).toBe(201)
    const files = await inspector.json<{ items: { id: number, kind: string }[] }>(`/api/attachments?recordType=trial-bead&recordId=${bead.id}`)
    expect(files.body.items.map(f => f.kind)).toEqual(['bead-photo'])
    expect((await inspector.fetch(`/api/attachments/${files.body.items[0]!.id}/thumbnail`)).status).toBe(200)
    expect((await auditor.json(`/api/attachments?recordType=trial-bead&recordId=${bead.id}`)).status).toBe(404)
    expect((await welder.json(`/api/attachments?recordType=trial-bead&recordId=${bead.id}`)).status).toBe(404)
    const detail = (await inspector.json<Detail & { beads: { photos: { id: number }[] }[] }>(`/api/trials/${id}`)).body
    expect(detail.beads[0]!.photos).toHaveLength(1)
    // A bead with a photo keeps it: remove the photo first
    expect((await send(inspector, 'DELETE', `/api/trials/${id}/beads/${bead.id}`)).status).toBe(409)
  })

  it('a wrong bead can be removed; an unknown one is a 404', async () => {
    const added = await send<{ id: number, number: number }>(inspector, 'POST', `/api/trials/${id}/beads`, { volts: 30, wireFeed: 900 })
    expect((await send(inspector, 'DELETE', `/api/trials/${id}/beads/${added.body.id}`)).status).toBe(200)
    expect((await send(inspector, 'DELETE', `/api/trials/${id}/beads/${added.body.id}`)).status).toBe(404)
  })

  it('from the accepted beads a draft PQR, then after certification a draft WPS that the support check accepts', async () => {
    expect((await send(inspector, 'POST', `/api/trials/${id}/propose-pqr`, { number: 'T-PQR-1', testDate: '2026-11-30', code: 'asme-ix', edition: '2023' })).status).toBe(403)
    const early = await send<{ message: string }>(supervisor, 'POST', `/api/trials/${id}/propose-wps`, { number: 'T-WPS-1', title: 'From trials' })
    expect(early.status).toBe(422)

    const pqr = await send<{ pqr: { id: number, status: string }, proposal: { bead: number } }>(supervisor, 'POST', `/api/trials/${id}/propose-pqr`, { number: 'T-PQR-1', testDate: '2026-11-30', code: 'asme-ix', edition: '2023' })
    expect(pqr.status).toBe(201)
    // The middle bead (5) sits nearest the centre of the square of accepted settings
    expect(pqr.body.proposal.bead).toBe(5)
    expect(pqr.body.pqr.status).toBe('recorded')
    const stored = await supervisor.json<{ pqr: { layers: { volts: number, wireFeed: number, heatInput: number }[], couponThickness: number } }>(`/api/pqrs/${pqr.body.pqr.id}`)
    expect(stored.body.pqr.layers[0]).toMatchObject({ volts: 18, wireFeed: 230, heatInput: 7200 })
    expect((await send(supervisor, 'POST', `/api/trials/${id}/propose-pqr`, { number: 'T-PQR-2', testDate: '2026-11-30', code: 'asme-ix', edition: '2023' })).status).toBe(422)

    // The coupon's tests, by the inspector: 2 tension, 2 face and 2 root bends for T < 3/8 in (ASME IX Table QW-451.1)
    const version = (await inspector.json<{ pqr: { version: number } }>(`/api/pqrs/${pqr.body.pqr.id}`)).body.pqr.version
    const results = await send<{ version: number }>(inspector, 'PUT', `/api/pqrs/${pqr.body.pqr.id}/results`, {
      version,
      tensile: [1, 2].map(n => ({ label: `T${n}`, width: 0.75, thickness: 0.0747, load: 3200, breakLocation: 'base metal' })),
      bends: ['face', 'face', 'root', 'root'].map(type => ({ type, largestIndication: 0 })),
    })
    expect(results.status).toBe(200)
    expect((await send(inspector, 'POST', `/api/pqrs/${pqr.body.pqr.id}/certify`, { version: results.body.version })).status).toBe(200)

    const wps = await send<{ procedure: { id: number, status: string }, proposal: { volts: { min: number, max: number, setPoint: number }, wireFeed: { min: number, max: number } }, support: { supported: boolean, violations: unknown[] } }>(
      supervisor, 'POST', `/api/trials/${id}/propose-wps`, { number: 'T-WPS-1', title: 'From trials' })
    expect(wps.status).toBe(201)
    expect(wps.body.procedure.status).toBe('draft')
    expect(wps.body.proposal.volts).toEqual({ min: 17.5, max: 18.5, setPoint: 18 })
    expect(wps.body.proposal.wireFeed).toMatchObject({ min: 200, max: 260 })
    expect(wps.body.support.violations).toEqual([])
    expect(wps.body.support.supported).toBe(true)
    // The WPS page runs the same support check
    const page = await supervisor.json<{ support: { supported: boolean }, procedure: { version: number } }>(`/api/procedures/${wps.body.procedure.id}`)
    expect(page.body.support.supported).toBe(true)

    // Approved, its production readings show against the trial plot as readings, outside the accepted region's hull.
    expect((await send(supervisor, 'POST', `/api/procedures/${wps.body.procedure.id}/approve`, { version: page.body.procedure.version })).status).toBe(200)
    expect((await send(supervisor, 'POST', `/api/procedures/${wps.body.procedure.id}/readings`, { welderId: null, volts: 19, wireFeedSpeed: 300 })).status).toBe(201)
    const after = (await inspector.json<Detail & { readings: number }>(`/api/trials/${id}`)).body
    expect(after.readings).toBe(1)
    expect(after.plots.wireFeed.marks.filter(m => m.verdict === 'reading')).toHaveLength(1)
    expect(after.plots.wireFeed.region).toHaveLength(4)
  })
})

describe('starting points', () => {
  it('the supervisor adds and removes rows; the inspector reads them', async () => {
    const row = { unit: 'mm', process: 'GMAW', transfer: 'short-circuit', wireDiameter: 1.0, thickness: 2, gas: '82Ar/18CO2', volts: 18, wireFeed: 6000, source: 'test row' }
    expect((await send(inspector, 'POST', '/api/trials/starting-points', row)).status).toBe(403)
    const made = await send<{ id: number }>(supervisor, 'POST', '/api/trials/starting-points', row)
    expect(made.status).toBe(201)
    const list = await inspector.json<{ items: { id: number, source: string }[] }>('/api/trials/starting-points')
    expect(list.body.items.find(r => r.id === made.body.id)?.source).toBe('test row')
    expect((await send(supervisor, 'DELETE', `/api/trials/starting-points/${made.body.id}`)).status).toBe(200)
    expect((await send(supervisor, 'DELETE', `/api/trials/starting-points/${made.body.id}`)).status).toBe(404)
  })
})
