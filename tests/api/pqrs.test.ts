import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'

type Errors = { message?: string, data?: { fieldErrors: Record<string, string[]> } }
interface Answer {
  id: number
  number: string
  status: string
  version: number
  minTensilePsi: number
  aNumber: string
  signature: { sha256: string }
}
interface Metal { id: number, specification: string, grade?: string, classification?: string, pNumber?: string, minTensilePsi?: number | null }
interface PqrDetail {
  pqr: { id: number, number: string, status: string, version: number }
  tensile: { label: string, strength: number, accepted: boolean }[]
  bends: { type: string, accepted: boolean }[]
  signatures: { meaning: string, sha256: string }[]
  qualifies: { baseMetal: { min: number, max: number }, depositMax: number, reasons: { clause: string }[] }
  specimensNeeded: { tension: number, face: number, root: number, side: number }
  procedures: { number: string }[]
  minimumStrength: number
}

let server: TestServer
let supervisor: Client
let inspector: Client
let welder: Client
let auditor: Client
let base: Metal
let filler: Metal

const send = (client: Client, method: string, path: string, body?: unknown) =>
  client.json<Answer & Errors>(path, { method, headers: { 'content-type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) })

const smaw = (depositThickness: number) => ({ name: 'all passes', process: 'SMAW', transfer: null, fillerMetalId: filler.id, depositThickness, current: 'DCEP', amps: 120, volts: 22, travelSpeed: 6 })
const coupon = (deposit = 0.25) => ({
  number: 'PQR-T201', testDate: '2026-03-02', code: 'asme-ix', edition: '2023', unit: 'in',
  couponThickness: 0.25, baseMetalId: base.id, toughnessRequired: false, layers: [smaw(deposit)],
  actuals: { position: '1G', preheat: 60 }, labReportNumber: 'LAB-T-1',
})

beforeAll(async () => {
  server = await startServer()
  ;[supervisor, inspector, welder, auditor] = await Promise.all([
    signedIn(server.url, 'supervisor'), signedIn(server.url, 'inspector'), signedIn(server.url, 'welder'), signedIn(server.url, 'auditor'),
  ])
  const bases = await supervisor.json<Metal[]>('/api/catalogue/base-metals')
  base = bases.body.find(b => b.specification === 'SA-516' && b.grade === '70')!
  const fillers = await supervisor.json<Metal[]>('/api/catalogue/filler-metals')
  filler = fillers.body.find(f => f.classification === 'E7018')!
})
afterAll(async () => server?.stop())

async function pqrId(number: string) {
  const list = await supervisor.json<{ items: { id: number, number: string }[] }>(`/api/pqrs?q=${number}`)
  return list.body.items.find(p => p.number === number)!.id
}

describe('reading PQRs', () => {
  it('lists PQRs for staff only, filtered on the server', async () => {
    const all = await inspector.json<{ total: number, items: { number: string, status: string }[] }>('/api/pqrs?sort=number')
    expect(all.status).toBe(200)
    expect(all.body.items.map(p => p.number)).toEqual(['PQR-K101', 'PQR-K102', 'PQR-K103', 'PQR-K104', 'PQR-K105', 'WPQR-ISO-07'])
    const recorded = await inspector.json<{ items: { number: string }[] }>('/api/pqrs?status=recorded')
    expect(recorded.body.items.map(p => p.number)).toEqual(['PQR-K104']) // WPQR-ISO-07 is certified (demo-iso.ts)
    expect((await welder.fetch('/api/pqrs')).status).toBe(403)
    expect((await auditor.fetch('/api/pqrs')).status).toBe(403)
    expect((await inspector.fetch('/api/pqrs?status=lost')).status).toBe(400)
  })

  it('one PQR shows its results with computed strength and the ranges it qualifies, with clauses', async () => {
    const { status, body } = await supervisor.json<PqrDetail>(`/api/pqrs/${await pqrId('PQR-K101')}`)
    expect(status).toBe(200)
    // strength = load / (width × thickness): 5410 lbf / (0.75 in × 0.1345 in) = 53630.731 psi (common practice, QW-152).
    expect(body.tensile[0]!.strength).toBeCloseTo(53630.731, 2)
    expect(body.tensile.length, 'a check over an empty list proves nothing').toBeGreaterThan(0)
    expect(body.tensile.every(t => t.accepted)).toBe(true)
    // ASME BPVC IX-2019, Table QW-451.1 and QW-403.10: 1/16 in to 1.1T = 0.14795 in; QW-404.32: deposit up to 1.1t.
    expect(body.qualifies.baseMetal).toEqual({ min: 0.0625, max: 0.14795 })
    expect(body.qualifies.depositMax).toBe(0.14795)
    expect(body.qualifies.reasons.map(r => r.clause)).toEqual(expect.arrayContaining(['QW-451.1', 'QW-403.10']))
    // Table QW-451.1: T under 3/8 in takes 2 tension, 2 face and 2 root bends.
    expect(body.specimensNeeded).toEqual({ tension: 2, face: 2, root: 2, side: 0 })
    expect(body.signatures.map(s => s.meaning)).toEqual(['certified'])
    expect(body.procedures.map(p => p.number)).toEqual(['KB-W01', 'KB-W05'])
    expect((await supervisor.fetch('/api/pqrs/999999')).status).toBe(404)
    expect((await welder.fetch(`/api/pqrs/${await pqrId('PQR-K101')}`)).status).toBe(403)
  })
})

describe('recording, testing and certifying a PQR', () => {
  let id = 0

  it('refuses a bad coupon with field messages', async () => {
    const empty = await send(supervisor, 'POST', '/api/pqrs', {})
    expect(empty.status).toBe(400)
    for (const key of ['number', 'testDate', 'couponThickness', 'baseMetalId', 'layers']) expect((empty.body as Errors).data!.fieldErrors[key], key).toBeDefined()
    const thick = await send(supervisor, 'POST', '/api/pqrs', coupon(0.5))
    expect((thick.body as Errors).data!.fieldErrors.layers?.[0]).toMatch(/thicker than the coupon/)
    const badDay = await send(supervisor, 'POST', '/api/pqrs', { ...coupon(), testDate: '2026-02-30' })
    expect((badDay.body as Errors).data!.fieldErrors.testDate).toBeDefined()
    const noMetal = await send(supervisor, 'POST', '/api/pqrs', { ...coupon(), baseMetalId: 999_999 })
    expect(noMetal.status).toBe(400)
    expect((noMetal.body as Errors).data!.fieldErrors.baseMetalId).toBeDefined()
  })

  it('the supervisor records the coupon; a number in use is a 409', async () => {
    expect((await send(inspector, 'POST', '/api/pqrs', coupon())).status).toBe(403)
    const created = await send(supervisor, 'POST', '/api/pqrs', coupon())
    expect(created.status).toBe(201)
    expect(created.body).toMatchObject({ status: 'recorded', version: 1 })
    id = created.body.id
    expect((await send(supervisor, 'POST', '/api/pqrs', coupon())).status).toBe(409)
  })

  it('corrects the coupon with the version it read; a stale version is a 409', async () => {
    expect((await send(supervisor, 'PATCH', `/api/pqrs/${id}`, { version: 7, pqr: coupon() })).status).toBe(409)
    expect((await send(supervisor, 'PATCH', '/api/pqrs/999999', { version: 1, pqr: coupon() })).status).toBe(404)
    const saved = await send(supervisor, 'PATCH', `/api/pqrs/${id}`, { version: 1, pqr: { ...coupon(0.375), couponThickness: 0.375 } })
    expect(saved.status).toBe(200)
    expect(saved.body.version).toBe(2)
  })

  it('the inspector records results; strength and acceptance come from the rules', async () => {
    const results = {
      version: 2,
      tensile: [
        { label: 'T1', width: 0.75, thickness: 0.375, load: 22500, breakLocation: 'base metal' },
        { label: 'T2', width: 0.75, thickness: 0.375, load: 18000, breakLocation: 'weld metal' },
      ],
      bends: [
        { type: 'face', largestIndication: 0 }, { type: 'face', largestIndication: 0.125 },
        { type: 'root', largestIndication: 0 }, { type: 'root', largestIndication: 0.2 },
      ],
    }
    expect((await send(supervisor, 'PUT', `/api/pqrs/${id}/results`, results)).status).toBe(403)
    const bad = await send(inspector, 'PUT', `/api/pqrs/${id}/results`, { ...results, tensile: [{ label: 'T1', width: -1, thickness: 0.375, load: 1, breakLocation: 'somewhere' }] })
    expect(bad.status).toBe(400)
    expect((bad.body as Errors).data!.fieldErrors.tensile).toBeDefined()
    expect((await send(inspector, 'PUT', `/api/pqrs/${id}/results`, { ...results, version: 1 })).status).toBe(409)
    const saved = await send(inspector, 'PUT', `/api/pqrs/${id}/results`, results)
    expect(saved.status).toBe(200)
    const { body } = await inspector.json<PqrDetail>(`/api/pqrs/${id}`)
    // 22500 / (0.75 × 0.375) = 80000 psi against SA-516 70's 70000 psi (ASME BPVC IX QW-153.1): accepted;
    // 18000 / 0.28125 = 64000 psi: rejected.
    expect(body.minimumStrength).toBe(70000)
    expect(body.tensile.map(t => [t.strength, t.accepted])).toEqual([[80000, true], [64000, false]])
    // ASME BPVC IX QW-163: an open discontinuity over 1/8 in fails; exactly 1/8 in passes.
    expect(body.bends.map(b => b.accepted)).toEqual([true, true, true, false])
  })

  it('certifying needs the specimens Table QW-451.1 asks for, then signs and freezes the PQR', async () => {
    const version = (await inspector.json<PqrDetail>(`/api/pqrs/${id}`)).body.pqr.version
    const few = await send(inspector, 'PUT', `/api/pqrs/${id}/results`, { version, tensile: [{ label: 'T1', width: 0.75, thickness: 0.375, load: 22500, breakLocation: 'base metal' }], bends: [] })
    expect(few.status).toBe(200)
    expect((await send(inspector, 'POST', `/api/pqrs/${id}/certify`, { version: few.body.version })).status).toBe(422)
    const full = await send(inspector, 'PUT', `/api/pqrs/${id}/results`, {
      version: few.body.version,
      tensile: [1, 2].map(n => ({ label: `T${n}`, width: 0.75, thickness: 0.375, load: 22500, breakLocation: 'base metal' })),
      bends: ['face', 'face', 'root', 'root'].map(type => ({ type, largestIndication: 0 })),
    })
    expect((await send(supervisor, 'POST', `/api/pqrs/${id}/certify`, { version: full.body.version })).status).toBe(403)
    expect((await send(inspector, 'POST', `/api/pqrs/${id}/certify`, { version: full.body.version - 1 })).status).toBe(409)
    const certified = await send(inspector, 'POST', `/api/pqrs/${id}/certify`, { version: full.body.version })
    expect(certified.status).toBe(200)
    expect(certified.body.status).toBe('certified')
    expect(certified.body.signature.sha256).toMatch(/^[0-9a-f]{64}$/)
    const v = certified.body.version
    expect((await send(inspector, 'PUT', `/api/pqrs/${id}/results`, { version: v, tensile: [], bends: [] })).status).toBe(409)
    expect((await send(supervisor, 'PATCH', `/api/pqrs/${id}`, { version: v, pqr: coupon() })).status).toBe(409)
    expect((await send(inspector, 'POST', `/api/pqrs/${id}/certify`, { version: v })).status).toBe(409)
  })

  it('failed results are certified as failed and cannot support a WPS', async () => {
    const created = await send(supervisor, 'POST', '/api/pqrs', { ...coupon(), number: 'PQR-T202' })
    const results = await send(inspector, 'PUT', `/api/pqrs/${created.body.id}/results`, {
      version: 1,
      tensile: [1, 2].map(n => ({ label: `T${n}`, width: 0.75, thickness: 0.25, load: 9000, breakLocation: 'weld metal' })),
      bends: ['face', 'face', 'root', 'root'].map(type => ({ type, largestIndication: 0 })),
    })
    const certified = await send(inspector, 'POST', `/api/pqrs/${created.body.id}/certify`, { version: results.body.version })
    expect(certified.body.status).toBe('failed')
  })
})

describe('catalogue', () => {
  it('staff read it; only the supervisor adds and corrects entries', async () => {
    expect((await inspector.fetch('/api/catalogue/base-metals')).status).toBe(200)
    expect((await welder.fetch('/api/catalogue/filler-metals')).status).toBe(403)
    const entry = { specification: 'SA-285', grade: 'C', pNumber: '1', groupNumber: 1, minTensilePsi: 55000 }
    expect((await send(inspector, 'POST', '/api/catalogue/base-metals', entry)).status).toBe(403)
    const bad = await send(supervisor, 'POST', '/api/catalogue/base-metals', { ...entry, pNumber: 'one' })
    expect((bad.body as Errors).data!.fieldErrors.pNumber).toBeDefined()
    const created = await send(supervisor, 'POST', '/api/catalogue/base-metals', entry)
    expect(created.status).toBe(201)
    expect((await send(supervisor, 'POST', '/api/catalogue/base-metals', entry)).status).toBe(409)
    const patched = await send(supervisor, 'PATCH', `/api/catalogue/base-metals/${created.body.id}`, { minTensilePsi: 55500 })
    expect(patched.body.minTensilePsi).toBe(55500)
    expect((await send(supervisor, 'PATCH', '/api/catalogue/base-metals/999999', { grade: 'X' })).status).toBe(404)
    const filler = await send(supervisor, 'POST', '/api/catalogue/filler-metals', { specification: 'SFA-5.28', classification: 'ER80S-D2', fNumber: '6', aNumber: '10' })
    expect(filler.status).toBe(201)
    expect((await send(supervisor, 'PATCH', `/api/catalogue/filler-metals/${filler.body.id}`, { aNumber: '2' })).body.aNumber).toBe('2')
  })

  it('an entry a signed PQR relies on cannot change', async () => {
    const res = await send(supervisor, 'PATCH', `/api/catalogue/base-metals/${base.id}`, { minTensilePsi: 10000 })
    expect(res.status).toBe(409)
    expect((await send(supervisor, 'PATCH', `/api/catalogue/filler-metals/${filler.id}`, { fNumber: '5' })).status).toBe(409)
  })
})
