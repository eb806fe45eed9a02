import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'
import { pdfPages, squeeze } from './pdf-text'

// Process layers: a WPS, a PQR and a welder test with several processes. The records here are made by the test;
// the demo's combination records are only looked up to show they load, never used as expected values.
let server: TestServer
let supervisor: Client
let inspector: Client

type Json = Record<string, unknown> & { id: number, version: number, status: string, data?: { fieldErrors: Record<string, string[]> } }
const send = (client: Client, method: string, path: string, body?: unknown) =>
  client.json<Json>(path, { method, headers: { 'content-type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) })

const none = { min: null, max: null, setPoint: null }
const win = (setPoint: number, trim: number) => ({ min: setPoint - trim, max: setPoint + trim, setPoint })
let ids: { bases: Record<string, number>, fillers: Record<string, number>, welder: number } = { bases: {}, fillers: {}, welder: 0 }

const layer = (over: Record<string, unknown>): Record<string, unknown> => ({
  name: 'all passes', passes: null, process: 'SMAW', transfer: null, fillers: [], fillerAdded: null, depositMax: null, current: 'DCEP',
  amps: none, volts: none, wireFeed: none, travelSpeed: none, heatInputMax: null, ctwd: none, gas: { composition: null, flow: none },
  bead: 'stringer', pulsing: false, oscillation: null, electrodes: 'single', passesPerSide: null, backGouging: false,
  tungsten: { type: null, size: null }, backingGas: { composition: null, flow: none }, consumableInsert: null, flux: { name: null, classification: null },
  ...over,
})
const filler = (specification: string, classification: string, fNumber: string, size: number) => ({ fillerMetalId: null, specification, classification, fNumber, aNumber: '8', size })

/** A GTAW root + SMAW fill/cap pipe WPS, carbon steel (P-No. 1) to austenitic stainless (P-No. 8), invented values. */
const wps = (number: string, supportingPqrIds: number[], unit = 'in') => ({
  number, title: 'GTAW root, SMAW fill and cap, pipe', code: 'asme-ix', edition: '2023', unit, supportingPqrIds,
  baseMetals: { a: { baseMetalId: null, pNumber: '1', groupNumber: 1 }, b: { baseMetalId: null, pNumber: '8', groupNumber: 1 } },
  thickness: { groove: { min: 0.1875, max: 1 }, fillet: { min: null, max: null } }, diameter: { min: 2.375, max: null },
  joints: { type: 'pipe butt', groove: 'single-V', grooveAngle: 75, rootOpening: { min: 0.09375, max: 0.125 }, rootFace: { min: 0.0625, max: 0.09375 }, backing: 'none' },
  positions: ['F', 'H', 'V', 'O'], progression: 'uphill', toughnessRequired: false, preheatMin: 50, interpassMax: 350,
  pwht: { required: false, temperature: { min: null, max: null }, holdHours: null, note: null }, cleaning: null,
  layers: [
    layer({ name: 'root', passes: '1', process: 'GTAW', current: 'DCEN', fillerAdded: true, depositMax: 0.25, fillers: [filler('SFA-5.9', 'ER309L', '6', 0.09375)],
      amps: win(105, 15), volts: win(11.5, 1.5), travelSpeed: { min: 2.5, max: 4.5, setPoint: null }, tungsten: { type: 'EWCe-2', size: 0.09375 },
      gas: { composition: 'Argon', flow: win(20, 5) }, backingGas: { composition: 'Argon', flow: win(15, 5) } }),
    layer({ name: 'fill and cap', passes: '2 to 6', process: 'SMAW', depositMax: 0.75, fillers: [filler('SFA-5.4', 'E309L-16', '5', 0.125)],
      amps: win(110, 15), volts: win(18.4, 1), travelSpeed: { min: 3.5, max: 7, setPoint: null } }),
  ],
})

/** A combination coupon: T = 1/2 in, GTAW t = 1/8 in, SMAW t = 3/8 in, SA-106 B to SA-240 304L, invented values. */
const coupon = (number: string, welderId: number | null) => ({
  number, testDate: '2026-06-10', code: 'asme-ix', edition: '2023', unit: 'in', couponThickness: 0.5,
  baseMetalId: ids.bases['SA-106 B'], baseMetalBId: ids.bases['SA-240 304L'], welderId, toughnessRequired: false,
  actuals: { position: '6G', progression: 'uphill', preheat: 60 }, labReportNumber: null,
  layers: [
    { name: 'root', process: 'GTAW', fillerMetalId: ids.fillers.ER309L, fillerSize: 0.09375, depositThickness: 0.125, current: 'DCEN', amps: 105, volts: 11.5, travelSpeed: 3.2 },
    { name: 'fill and cap', process: 'SMAW', fillerMetalId: ids.fillers['E309L-16'], fillerSize: 0.125, depositThickness: 0.375, current: 'DCEP', amps: 112, volts: 24, travelSpeed: 5 },
  ],
})

beforeAll(async () => {
  server = await startServer()
  supervisor = await signedIn(server.url, 'supervisor')
  inspector = await signedIn(server.url, 'inspector')
  const bases = (await supervisor.json<{ id: number, specification: string, grade: string }[]>('/api/catalogue/base-metals')).body
  const fillers = (await supervisor.json<{ id: number, classification: string }[]>('/api/catalogue/filler-metals')).body
  ids = {
    bases: Object.fromEntries(bases.map(b => [`${b.specification} ${b.grade}`, b.id])),
    fillers: Object.fromEntries(fillers.map(f => [f.classification, f.id])),
    welder: (await supervisor.json<{ items: { id: number }[] }>('/api/welders?q=KB-07')).body.items[0]!.id,
  }
})
afterAll(async () => server?.stop())

let pqrId = 0
let wpsId = 0

describe('a combination PQR: base metal A and B, a layer per process, the welder of the coupon', () => {
  it('records the coupon and qualifies each process from its own deposit (ASME BPVC IX-2023, Table QW-451.1: up to 2t)', async () => {
    const created = await send(supervisor, 'POST', '/api/pqrs', coupon('PQR-L01', ids.welder))
    expect(created.status, JSON.stringify(created.body)).toBe(201)
    pqrId = created.body.id
    const { body } = await supervisor.json<{ pqr: { processes: string[], depositThickness: number }, baseMetalB: { pNumber: string }, welder: { stamp: string }, layers: { process: string }[], qualifiesByProcess: { depositMax: number | null, baseMetal: { min: number, max: number } }[] }>(`/api/pqrs/${pqrId}`)
    expect(body.pqr.processes).toEqual(['GTAW', 'SMAW'])
    // The whole deposit is the sum of the processes' deposits: 1/8 + 3/8 = 1/2 in
    expect(body.pqr.depositThickness).toBe(0.5)
    expect(body.baseMetalB.pNumber).toBe('8')
    expect(body.welder.stamp).toBe('KB-07')
    expect(body.layers.map(l => l.process)).toEqual(['GTAW', 'SMAW'])
    // Table QW-451.1, T from 3/8 in to under 3/4 in: base metal 3/16 in to 2T = 1 in; deposit 2t: 2 × 1/8 and 2 × 3/8
    expect(body.qualifiesByProcess.map(q => q.depositMax)).toEqual([0.25, 0.75])
    expect(body.qualifiesByProcess[0]!.baseMetal).toEqual({ min: 0.1875, max: 1 })
  })

  it('refuses a filler that is not in the catalogue and deposits thicker than the coupon, on the field', async () => {
    const bad = await send(supervisor, 'POST', '/api/pqrs', { ...coupon('PQR-L02', null), layers: [{ ...coupon('x', null).layers[0], fillerMetalId: 999_999 }] })
    expect(bad.status).toBe(400)
    expect(bad.body.data?.fieldErrors['layers.0.fillerMetalId']).toBeDefined()
    const thick = coupon('PQR-L03', null)
    thick.layers[1]!.depositThickness = 0.5
    const res = await send(supervisor, 'POST', '/api/pqrs', thick)
    expect(res.status).toBe(400)
    expect(res.body.data?.fieldErrors.layers?.[0]).toMatch(/thicker than the coupon/)
  })

  it('certifies with two tension and four side bends (QW-451.1, T of 3/8 in and over)', async () => {
    const results = await send(inspector, 'PUT', `/api/pqrs/${pqrId}/results`, {
      version: 1,
      // SA-106 B, 60,000 psi specified minimum: 26,300 lbf / (0.75 × 0.495 in²) = 70,842 psi (QW-153)
      tensile: [1, 2].map(n => ({ label: `T${n}`, width: 0.75, thickness: 0.495, load: 26300, breakLocation: 'base metal' })),
      bends: [1, 2, 3, 4].map(() => ({ type: 'side', largestIndication: 0 })),
    })
    expect(results.status, JSON.stringify(results.body)).toBe(200)
    const certified = await send(inspector, 'POST', `/api/pqrs/${pqrId}/certify`, { version: results.body.version })
    expect(certified.body.status).toBe('certified')
  })
})

describe('a combination WPS: layers, pass table, support per layer, the sheet', () => {
  it('stores the layers; the process list keeps lists and "Who can weld it?" working', async () => {
    const created = await send(supervisor, 'POST', '/api/procedures', wps('KB-L01', [pqrId]))
    expect(created.status, JSON.stringify(created.body)).toBe(201)
    wpsId = created.body.id
    const detail = await supervisor.json<{ draft: { layers: { process: string, fillers: { size: number }[] }[] }, support: { checked: boolean, violations: { field: string | null, clause: string, text: string }[], findings: { field: string | null }[] } }>(`/api/procedures/${wpsId}`)
    expect(detail.body.draft.layers.map(l => l.process)).toEqual(['GTAW', 'SMAW'])
    expect(detail.body.draft.layers[0]!.fillers[0]!.size).toBe(0.09375)
    expect(detail.body.support.checked).toBe(true)
    expect(detail.body.support.findings.some(f => f.field?.startsWith('layers.1.'))).toBe(true)
    const smaw = await supervisor.json<{ items: { number: string }[] }>('/api/procedures?process=SMAW&pageSize=200')
    expect(smaw.body.items.map(p => p.number)).toContain('KB-L01')
    const gtaw = await supervisor.json<{ items: { number: string }[] }>('/api/procedures?process=GTAW&pageSize=200')
    expect(gtaw.body.items.map(p => p.number)).toContain('KB-L01')
  })

  it('a layer deposit over what its process qualifies is flagged on that layer with its clause, and blocks approval', async () => {
    const draft = wps('KB-L02', [pqrId])
    // GTAW t = 1/8 in qualifies up to 2t = 1/4 in (ASME BPVC IX-2023, Table QW-451.1); 3/8 in is over
    draft.layers[0]!.depositMax = 0.375
    const created = await send(supervisor, 'POST', '/api/procedures', draft)
    const detail = await supervisor.json<{ procedure: { version: number }, support: { violations: { field: string | null, clause: string }[] } }>(`/api/procedures/${created.body.id}`)
    const onLayer = detail.body.support.violations.find(v => v.field === 'layers.0.depositMax')
    expect(onLayer?.clause).toMatch(/QW-404\.30/)
    const approve = await send(supervisor, 'POST', `/api/procedures/${created.body.id}/approve`, { version: detail.body.procedure.version })
    expect(approve.status).toBe(422)
  })

  it('a layer without a filler is refused unless it is autogenous GTAW; a tungsten on SMAW is refused', async () => {
    const draft = wps('KB-L03', [pqrId])
    draft.layers[1] = { ...draft.layers[1]!, fillers: [] }
    const res = await send(supervisor, 'POST', '/api/procedures', draft)
    expect(res.status).toBe(400)
    const tungsten = wps('KB-L04', [pqrId])
    tungsten.layers[1] = { ...tungsten.layers[1]!, tungsten: { type: 'EWTh-2', size: 0.09375 } }
    expect((await send(supervisor, 'POST', '/api/procedures', tungsten)).status).toBe(400)
  })

  it('the sheet prints the layers, the pass table, the root opening and set point with trim, and no internal names', async () => {
    const model = await supervisor.json<{ blocks: { heading: string, fields?: { label: string, value: string }[], table?: { columns: string[], rows: string[][] } }[] }>(`/api/sheets/procedures/${wpsId}?format=json`)
    expect(model.status).toBe(200)
    const headings = model.body.blocks.map(b => b.heading)
    expect(headings).toContain('Pass table')
    expect(headings.filter(h => h.startsWith('Layer '))).toHaveLength(2)
    expect(headings).not.toContain('Other variables')
    const pass = model.body.blocks.find(b => b.heading === 'Pass table')!.table!
    expect(pass.rows.map(r => r[1])).toEqual(['GTAW', 'SMAW'])
    const res = await supervisor.fetch(`/api/sheets/procedures/${wpsId}`)
    const text = squeeze((await pdfPages(new Uint8Array(await res.arrayBuffer()))).join('\n'))
    // The window as the welder reads it: set point 18.4 V with a trim of 1.0 V
    expect(text).toContain(squeeze('18.4 V ± 1.0 V'))
    expect(text).toContain(squeeze('Root opening'))
    expect(text).toContain(squeeze('P-No. 1 Group 1 to P-No. 8 Group 1'))
  })

  it('a millimetre record prints wire feed speed in mm/min', async () => {
    const draft = wps('KB-L05', [pqrId], 'mm')
    Object.assign(draft, { thickness: { groove: { min: 5, max: 25 }, fillet: { min: null, max: null } }, diameter: { min: 60, max: null },
      joints: { ...draft.joints, rootOpening: { min: 2.5, max: 3 }, rootFace: { min: 1.5, max: 2 } }, preheatMin: 10, interpassMax: 175 })
    draft.layers = [layer({ name: 'all passes', process: 'GMAW', transfer: 'spray', fillers: [filler('SFA-5.18', 'ER70S-6', '6', 1.2)], wireFeed: win(7500, 500), volts: win(27, 1.5) })]
    const created = await send(supervisor, 'POST', '/api/procedures', draft)
    expect(created.status, JSON.stringify(created.body)).toBe(201)
    const model = await supervisor.json<{ blocks: { heading: string, fields?: { label: string, value: string }[] }[] }>(`/api/sheets/procedures/${created.body.id}?format=json`)
    const wfs = model.body.blocks.flatMap(b => b.fields ?? []).find(f => f.label === 'Wire feed speed')
    expect(wfs?.value).toBe('7500 mm/min ± 500 mm/min')
  })
})

describe('a 6G combination coupon: one record, each process its own deposit and continuity', () => {
  let testId = 0
  it('a test from the PQR must name the welder of its coupon (QW-301.2)', async () => {
    const other = (await supervisor.json<{ items: { id: number }[] }>('/api/welders?q=KB-01')).body.items[0]!.id
    const res = await send(inspector, 'POST', '/api/tests', combination(other, pqrId))
    expect(res.status).toBe(400)
    expect(res.body.data?.fieldErrors.pqrId).toBeDefined()
  })

  it('records and certifies one coupon with GTAW and SMAW; each process gets its own deposit limit and standing', async () => {
    const created = await send(inspector, 'POST', '/api/tests', combination(ids.welder, pqrId))
    expect(created.status, JSON.stringify(created.body)).toBe(201)
    testId = created.body.id
    const cert = await send(inspector, 'POST', `/api/tests/${testId}/certify`, { version: created.body.version })
    expect(cert.status, JSON.stringify(cert.body)).toBe(200)
    const test = await inspector.json<{ processes: { process: string, depositThickness: number, depositMax: number | null }[] }>(`/api/tests/${testId}`)
    // ASME BPVC IX-2023, QW-452.1(b): each process qualifies up to 2t of its own deposit: 2 × 1/8 in and 2 × 3/8 in
    expect(test.body.processes.map(p => [p.process, p.depositThickness, p.depositMax])).toEqual([['GTAW', 0.125, 0.25], ['SMAW', 0.375, 0.75]])
    const welder = await supervisor.json<{ standings: { process: string, testDate: string }[] }>(`/api/welders/${ids.welder}`)
    for (const process of ['GTAW', 'SMAW']) expect(welder.body.standings.find(s => s.process === process)?.testDate, process).toBe('2026-06-11')
    const listed = await inspector.json<{ items: { id: number }[] }>(`/api/tests?process=SMAW&pageSize=200`)
    expect(listed.body.items.map(t => t.id)).toContain(testId)
  })

  it('the WPQ sheet lists both processes with their deposits', async () => {
    const model = await inspector.json<{ blocks: { heading: string, table?: { rows: string[][] } }[] }>(`/api/sheets/tests/${testId}?format=json`)
    const table = model.body.blocks.find(b => b.heading === 'Processes on the coupon')!.table!
    expect(table.rows.map(r => r[1])).toEqual(['GTAW', 'SMAW'])
  })
})

describe('signatures made before process layers keep verifying', () => {
  it('every demo signature still verifies "unchanged"', async () => {
    for (const path of ['/api/procedures/1', '/api/pqrs/1']) {
      const detail = await supervisor.json<{ signatures: { verifyCode: string }[] }>(path)
      for (const s of detail.body.signatures) {
        const v = await supervisor.json<{ state: string }>(`/api/verify/${s.verifyCode}`)
        expect(v.body.state, path).toBe('unchanged')
      }
    }
  })
})

function combination(welderId: number, pqr: number) {
  return {
    welderId, pqrId: pqr, procedureId: null, testDate: '2026-06-11', code: 'asme-ix', edition: '2023', unit: 'in',
    processes: [{ process: 'GTAW', transfer: null, depositThickness: 0.125, fNumber: '6' }, { process: 'SMAW', transfer: null, depositThickness: 0.375, fNumber: '5' }],
    form: 'pipe', weld: 'groove', couponThickness: 0.5, layers: 4, outsideDiameter: 6.625, pNumber: '1', fNumber: '6', backing: false,
    positions: ['6G'], progression: 'uphill', visualAccepted: true, visualNotes: null, examination: 'bend',
    bends: [1, 2, 3, 4].map(() => ({ type: 'side', largestIndication: 0, atCorner: false })), radiography: null, macro: null,
  }
}
