import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'
import { procedureDraftSchema, type ProcedureDraft } from '#shared/schemas/procedure'

interface Finding { met: boolean, clause: string, text: string, field: string | null }
interface Detail {
  procedure: { id: number, number: string, revision: number, status: string, version: number, current: boolean }
  draft: ProcedureDraft
  pqrs: { id: number, number: string, status: string }[]
  support: { checked: boolean, supported: boolean, violations: Finding[], findings: Finding[], blockers: string[], qualifies: { number: string, baseMetal: { min: number, max: number } }[] }
  signatures: { meaning: string, sha256: string, verifyCode: string, signerName: string }[]
  revisions: { id: number, revision: number, status: string }[]
}
interface ListRow { id: number, number: string, revision: number, status: string, current: boolean }
interface Answer {
  id: number
  number: string
  revision: number
  status: string
  version: number
  welderId: number
  within: boolean
  signature: { sha256: string, verifyCode: string }
  heatInput: { value: number }
  checks: { parameter: string, within: boolean }[]
}
type Errors = { message?: string, data?: { fieldErrors: Record<string, string[]>, formErrors: string[], violations?: Finding[], blockers?: string[] } }

let server: TestServer
let supervisor: Client
let inspector: Client
let welder: Client
let auditor: Client

const send = (client: Client, method: string, path: string, body?: unknown) =>
  client.json<Answer & Errors>(path, { method, headers: { 'content-type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) })

async function byNumber(number: string, revision: number) {
  const list = await supervisor.json<{ items: ListRow[] }>(`/api/procedures?q=${encodeURIComponent(number)}&pageSize=50`)
  const row = list.body.items.find(p => p.number === number && p.revision === revision)
  if (!row) throw new Error(`no ${number} rev. ${revision}`)
  return row
}
const detail = async (client: Client, id: number) => client.json<Detail>(`/api/procedures/${id}`)

/** A draft from the seeded short-circuit sheet WPS, renumbered, with one value out of support. */
async function sheetDraft(number: string) {
  const w01 = await detail(supervisor, (await byNumber('KB-W01', 0)).id)
  return { ...w01.body.draft, number, title: 'GMAW-S 10 ga test draft', thickness: { ...w01.body.draft.thickness, groove: { min: 0.0625, max: 0.25 } } }
}

beforeAll(async () => {
  server = await startServer()
  ;[supervisor, inspector, welder, auditor] = await Promise.all([
    signedIn(server.url, 'supervisor'), signedIn(server.url, 'inspector'), signedIn(server.url, 'welder'), signedIn(server.url, 'auditor'),
  ])
})
afterAll(async () => server?.stop())

describe('reading procedures', () => {
  it('marks the current revision of each number; superseded revisions stay listed', async () => {
    const rev0 = await byNumber('KB-W02', 0)
    const rev1 = await byNumber('KB-W02', 1)
    expect(rev0).toMatchObject({ status: 'superseded', current: false })
    expect(rev1).toMatchObject({ status: 'approved', current: true })
    expect(await byNumber('KB-W01', 0)).toMatchObject({ status: 'approved', current: true })
    expect(await byNumber('KB-W04', 0)).toMatchObject({ status: 'draft', current: false })
  })

  it('one WPS carries its variables, supporting PQRs, signature and a passing support check', async () => {
    const { status, body } = await detail(supervisor, (await byNumber('KB-W01', 0)).id)
    expect(status).toBe(200)
    expect(body.pqrs.map(p => p.number)).toEqual(['PQR-K101'])
    expect(body.signatures).toHaveLength(1)
    expect(body.signatures[0]).toMatchObject({ meaning: 'approved' })
    expect(body.signatures[0]!.sha256).toMatch(/^[0-9a-f]{64}$/)
    expect(body.draft.layers).toHaveLength(1)
    expect(body.draft.layers[0]!.volts).toMatchObject({ min: 17, max: 19.5 })
    expect(body.support.checked).toBe(true)
    expect(body.support.supported).toBe(true)
    // ASME BPVC IX-2019, Table QW-451.1 (T from 1/16 to 3/8 in: 1/16 in to 2T) with QW-403.10 (GMAW-S, T under 1/2 in: 1.1T):
    // a 0.1345 in coupon qualifies 0.0625 in to 0.14795 in.
    expect(body.support.qualifies[0]!.baseMetal).toEqual({ min: 0.0625, max: 0.14795 })
  })

  it('every stored WPS reads back as a draft the form and the route accept', async () => {
    const list = await supervisor.json<{ items: ListRow[] }>('/api/procedures?pageSize=50')
    expect(list.body.items.length).toBeGreaterThan(0)
    for (const row of list.body.items) {
      const parsed = procedureDraftSchema.safeParse((await detail(supervisor, row.id)).body.draft)
      expect(parsed.success, `${row.number} rev. ${row.revision}: ${parsed.error?.issues.map(i => `${i.path.join('.')} ${i.message}`).join('; ')}`).toBe(true)
    }
  })

  it('welders read approved procedures only, without the PQR records; auditors not at all', async () => {
    const approved = await byNumber('KB-W01', 0)
    const draft = await byNumber('KB-W04', 0)
    const mine = await detail(welder, approved.id)
    expect(mine.status).toBe(200)
    expect(Object.keys(mine.body.pqrs[0]!).sort()).toEqual(['id', 'number', 'status'])
    expect((await detail(welder, draft.id)).status).toBe(404)
    expect((await detail(inspector, draft.id)).status).toBe(200)
    expect((await detail(auditor, approved.id)).status).toBe(403)
    expect((await detail(supervisor, 999_999)).status).toBe(404)
    expect((await supervisor.fetch('/api/procedures/abc')).status).toBe(400)
  })

  it('a draft whose PQR is not certified yet cannot be approved, and says why', async () => {
    const draft = await byNumber('KB-W04', 0)
    const { body } = await detail(supervisor, draft.id)
    expect(body.support.blockers.join(' ')).toContain('PQR-K104')
    const res = await send(supervisor, 'POST', `/api/procedures/${draft.id}/approve`, { version: body.procedure.version })
    expect(res.status).toBe(422)
    expect((res.body as Errors).data?.blockers?.join(' ')).toContain('not certified')
  })
})

describe('drafting, approving and revising', () => {
  let id = 0

  it('refuses a bad draft with field messages', async () => {
    const empty = await send(supervisor, 'POST', '/api/procedures', {})
    expect(empty.status).toBe(400)
    const fields = (empty.body as Errors).data!.fieldErrors
    for (const key of ['number', 'title', 'unit', 'layers', 'baseMetals', 'positions']) expect(fields[key], key).toBeDefined()
    const inverted = await send(supervisor, 'POST', '/api/procedures', { ...(await sheetDraft('KB-T90')), thickness: { groove: { min: 0.2, max: 0.1 }, fillet: { min: null, max: null } } })
    expect(inverted.status).toBe(400)
    expect((inverted.body as Errors).data!.fieldErrors.thickness?.[0]).toMatch(/minimum is above the maximum/)
    const noProgression = await send(supervisor, 'POST', '/api/procedures', { ...(await sheetDraft('KB-T91')), progression: null })
    expect((noProgression.body as Errors).data!.fieldErrors.progression?.[0]).toMatch(/uphill or downhill/)
    const badJson = await supervisor.json('/api/procedures', { method: 'POST', headers: { 'content-type': 'application/json' }, body: '{"number":' })
    expect(badJson.status).toBe(400)
  })

  it('only the supervisor creates drafts; a number in use is a 409', async () => {
    const draft = await sheetDraft('KB-T01')
    expect((await send(inspector, 'POST', '/api/procedures', draft)).status).toBe(403)
    expect((await send(welder, 'POST', '/api/procedures', draft)).status).toBe(403)
    const created = await send(supervisor, 'POST', '/api/procedures', draft)
    expect(created.status).toBe(201)
    expect(created.body).toMatchObject({ number: 'KB-T01', revision: 0, status: 'draft', version: 1 })
    id = created.body.id
    expect((await send(supervisor, 'POST', '/api/procedures', draft)).status).toBe(409)
    expect((await send(supervisor, 'POST', '/api/procedures', { ...draft, number: 'KB-W01' })).status).toBe(409)
    const missingPqr = await send(supervisor, 'POST', '/api/procedures', { ...draft, number: 'KB-T02', supportingPqrIds: [999_999] })
    expect(missingPqr.status).toBe(400)
    expect((missingPqr.body as Errors).data!.fieldErrors.supportingPqrIds).toBeDefined()
  })

  it('flags the thickness outside what PQR-K101 qualifies, with its clause, and refuses approval', async () => {
    const { body } = await detail(supervisor, id)
    expect(body.support.supported).toBe(false)
    const thickness = body.support.violations.find(v => v.field === 'thickness.groove')
    // ASME BPVC IX-2019, QW-403.8 with Table QW-451.1: 1/4 in is over the 0.14795 in the coupon qualifies.
    expect(thickness?.clause).toBe('QW-403.8, QW-451.1')
    const res = await send(supervisor, 'POST', `/api/procedures/${id}/approve`, { version: body.procedure.version })
    expect(res.status).toBe(422)
    expect((res.body as Errors).data?.violations?.map(v => v.clause)).toContain('QW-403.8, QW-451.1')
  })

  it('saves a fix; a stale version is a 409 and changes nothing', async () => {
    const { body } = await detail(supervisor, id)
    const fixed = { ...body.draft, thickness: { ...body.draft.thickness, groove: { min: 0.0625, max: 0.1479 } } }
    expect((await send(supervisor, 'PATCH', `/api/procedures/${id}`, { version: body.procedure.version + 5, draft: fixed })).status).toBe(409)
    expect((await send(inspector, 'PATCH', `/api/procedures/${id}`, { version: body.procedure.version, draft: fixed })).status).toBe(403)
    expect((await send(supervisor, 'PATCH', '/api/procedures/999999', { version: 1, draft: fixed })).status).toBe(404)
    const bad = await send(supervisor, 'PATCH', `/api/procedures/${id}`, { version: body.procedure.version, draft: { ...fixed, layers: [] } })
    expect(bad.status).toBe(400)
    expect((bad.body as Errors).data!.fieldErrors.draft).toBeDefined()
    const saved = await send(supervisor, 'PATCH', `/api/procedures/${id}`, { version: body.procedure.version, draft: fixed })
    expect(saved.status).toBe(200)
    expect(saved.body.version).toBe(body.procedure.version + 1)
    const again = await detail(supervisor, id)
    expect(again.body.draft.thickness.groove).toEqual({ min: 0.0625, max: 0.1479 })
    expect(again.body.support.supported).toBe(true)
    expect((await send(supervisor, 'PATCH', `/api/procedures/${id}`, { version: body.procedure.version, draft: fixed })).status).toBe(409)
  })

  it('approves: signed with its content hash, frozen after', async () => {
    const { body } = await detail(supervisor, id)
    expect((await send(inspector, 'POST', `/api/procedures/${id}/approve`, { version: body.procedure.version })).status).toBe(403)
    expect((await send(supervisor, 'POST', `/api/procedures/${id}/approve`, { version: body.procedure.version - 1 })).status).toBe(409)
    expect((await send(supervisor, 'POST', `/api/procedures/${id}/approve`, {})).status).toBe(400)
    expect((await send(supervisor, 'POST', '/api/procedures/999999/approve', { version: 1 })).status).toBe(404)
    const approved = await send(supervisor, 'POST', `/api/procedures/${id}/approve`, { version: body.procedure.version })
    expect(approved.status).toBe(200)
    expect(approved.body.status).toBe('approved')
    expect(approved.body.signature.sha256).toMatch(/^[0-9a-f]{64}$/)
    expect(approved.body.signature.verifyCode).toMatch(/^[A-Z2-9]{10}$/)
    const after = await detail(supervisor, id)
    expect(after.body.procedure).toMatchObject({ status: 'approved', current: true })
    expect(after.body.signatures.map(s => s.meaning)).toEqual(['approved'])
    const frozen = await send(supervisor, 'PATCH', `/api/procedures/${id}`, { version: after.body.procedure.version, draft: after.body.draft })
    expect(frozen.status).toBe(409)
    expect((frozen.body as Errors).message).toMatch(/signed/)
    expect((await send(supervisor, 'POST', `/api/procedures/${id}/approve`, { version: after.body.procedure.version })).status).toBe(409)
    // Inspectors and welders read it now.
    expect((await detail(inspector, id)).status).toBe(200)
    expect((await detail(welder, id)).status).toBe(200)
  })

  it('a change is a new revision; approving it supersedes the old one, which stays readable and signed', async () => {
    const { body } = await detail(supervisor, id)
    expect((await send(supervisor, 'POST', `/api/procedures/${id}/revise`, { version: body.procedure.version + 1 })).status).toBe(409)
    const revised = await send(supervisor, 'POST', `/api/procedures/${id}/revise`, { version: body.procedure.version })
    expect(revised.status).toBe(201)
    expect(revised.body).toMatchObject({ number: 'KB-T01', revision: 1, status: 'draft' })
    expect((await send(supervisor, 'POST', `/api/procedures/${id}/revise`, { version: body.procedure.version })).status).toBe(409)
    const draft = await detail(supervisor, revised.body.id)
    expect(draft.body.pqrs.map(p => p.number)).toEqual(['PQR-K101'])
    const renumbered = await send(supervisor, 'PATCH', `/api/procedures/${revised.body.id}`, { version: 1, draft: { ...draft.body.draft, number: 'KB-T77' } })
    expect(renumbered.status).toBe(409)
    const saved = await send(supervisor, 'PATCH', `/api/procedures/${revised.body.id}`, { version: 1, draft: { ...draft.body.draft, title: 'GMAW-S 10 ga, revised' } })
    expect(saved.status).toBe(200)
    expect((await send(supervisor, 'POST', `/api/procedures/${revised.body.id}/approve`, { version: saved.body.version })).status).toBe(200)
    const old = await detail(supervisor, id)
    expect(old.body.procedure).toMatchObject({ status: 'superseded', current: false })
    expect(await byNumber('KB-T01', 0)).toMatchObject({ status: 'superseded', current: false })
    expect(old.body.signatures).toHaveLength(1)
    expect(old.body.revisions.map(r => `${r.revision}:${r.status}`)).toEqual(['1:approved', '0:superseded'])
    expect((await byNumber('KB-T01', 1)).current).toBe(true)
    expect((await send(supervisor, 'POST', `/api/procedures/${id}/revise`, { version: old.body.procedure.version })).status).toBe(409)
  })
})

describe('discarding a draft', () => {
  it('removes an unsigned draft; a signed revision or a stale version is a 409', async () => {
    const created = await send(supervisor, 'POST', '/api/procedures', await sheetDraft('KB-T40'))
    expect(created.status).toBe(201)
    expect((await send(inspector, 'DELETE', `/api/procedures/${created.body.id}`, { version: 1 })).status).toBe(403)
    expect((await send(supervisor, 'DELETE', `/api/procedures/${created.body.id}`, {})).status).toBe(400)
    expect((await send(supervisor, 'DELETE', `/api/procedures/${created.body.id}`, { version: 2 })).status).toBe(409)
    expect((await send(supervisor, 'DELETE', `/api/procedures/${created.body.id}`, { version: 1 })).status).toBe(200)
    expect((await detail(supervisor, created.body.id)).status).toBe(404)
    expect((await send(supervisor, 'DELETE', `/api/procedures/${created.body.id}`, { version: 1 })).status).toBe(404)
    const approved = await detail(supervisor, (await byNumber('KB-W01', 0)).id)
    expect((await send(supervisor, 'DELETE', `/api/procedures/${approved.body.procedure.id}`, { version: approved.body.procedure.version })).status).toBe(409)
  })

  it('a draft another record refers to stays (409), never a 500', async () => {
    const created = await send(supervisor, 'POST', '/api/procedures', await sheetDraft('KB-T41'))
    const test = await send(inspector, 'POST', '/api/tests', {
      welderId: 1, procedureId: created.body.id, testDate: '2026-06-01', code: 'asme-ix', edition: '2023', unit: 'in',
      processes: [{ process: 'GMAW', transfer: 'short-circuit' }], form: 'plate', weld: 'groove', couponThickness: 0.1345, positions: ['1G'], examination: 'bend',
    })
    expect(test.status, JSON.stringify(test.body)).toBe(201)
    const res = await send(supervisor, 'DELETE', `/api/procedures/${created.body.id}`, { version: 1 })
    expect(res.status).toBe(409)
    expect((await detail(supervisor, created.body.id)).status).toBe(200)
  })
})

describe('an AWS D1.1 WPS qualified by test', () => {
  it('is compared with its PQR variable by variable; what is not compared needs the signed statement', async () => {
    const bases = await supervisor.json<{ id: number, specification: string, grade: string }[]>('/api/catalogue/base-metals')
    const fillers = await supervisor.json<{ id: number, classification: string }[]>('/api/catalogue/filler-metals')
    // A 3/8 in SMAW plate tested 3G at 60 °F, as welded (values invented).
    const pqr = await send(supervisor, 'POST', '/api/pqrs', {
      number: 'PQR-D11', testDate: '2026-05-04', code: 'aws-d1.1', edition: '2020', unit: 'in',
      couponThickness: 0.375, baseMetalId: bases.body.find(b => b.specification === 'SA-36')!.id, actuals: { preheat: 60, pwht: 'none', position: '3G' },
      layers: [{ name: 'all passes', process: 'SMAW', fillerMetalId: fillers.body.find(f => f.classification === 'E7018')!.id, depositThickness: 0.375 }],
    })
    expect(pqr.status).toBe(201)
    const results = await send(inspector, 'PUT', `/api/pqrs/${pqr.body.id}/results`, {
      version: 1,
      tensile: [1, 2].map(n => ({ label: `T${n}`, width: 0.75, thickness: 0.375, load: 19000, breakLocation: 'base metal' })),
      bends: ['side', 'side', 'side', 'side'].map(type => ({ type, largestIndication: 0 })),
    })
    expect(results.status).toBe(200)
    expect((await send(inspector, 'POST', `/api/pqrs/${pqr.body.id}/certify`, { version: results.body.version })).body.status).toBe('certified')
    const w02 = await detail(supervisor, (await byNumber('KB-W02', 1)).id)
    // D1.1:2015 Table 4.2 (from memory): a 3/8 in plate qualifies 1/8 to 3/4 in; a 3G test qualifies vertical (each test its own position).
    const draft = { ...w02.body.draft, code: 'aws-d1.1', edition: '2020', supportingPqrIds: [pqr.body.id], thickness: { ...w02.body.draft.thickness, groove: { min: 0.125, max: 0.75 } }, positions: ['V'], progression: 'uphill', preheatMin: 60, pwht: { ...w02.body.draft.pwht, required: false } }
    const overhead = await send(supervisor, 'POST', '/api/procedures', { ...draft, number: 'KB-S10', positions: ['V', 'O'] })
    expect(overhead.status).toBe(201)
    const outside = (await detail(supervisor, overhead.body.id)).body.support as { checked: boolean, violations: { clause: string, byHand?: boolean }[] }
    expect(outside.checked).toBe(true)
    expect(outside.violations.filter(v => !v.byHand).map(v => v.clause)).toEqual(['Clause 6 WPS positions table (Table 4.1 in 2015)'])
    expect((await send(supervisor, 'POST', `/api/procedures/${overhead.body.id}/approve`, { version: 1, handCheck: 'Checked the rest by hand against PQR-D11' })).status).toBe(422)

    const created = await send(supervisor, 'POST', '/api/procedures', { ...draft, number: 'KB-S11' })
    expect(created.status).toBe(201)
    const { body } = await detail(supervisor, created.body.id)
    expect(body.support).toMatchObject({ checked: true, supported: false, rulesMissing: false, blockers: [] })
    const support = body.support as { violations: { clause: string, byHand?: boolean }[] }
    expect(support.violations.length).toBeGreaterThan(0)
    expect(support.violations.every(v => v.byHand && v.clause === 'Table 6.5')).toBe(true)
    const unstated = await send(supervisor, 'POST', `/api/procedures/${created.body.id}/approve`, { version: 1 })
    expect(unstated.status).toBe(400)
    expect((unstated.body as Errors).data!.fieldErrors.handCheck).toBeDefined()
    const approved = await send(supervisor, 'POST', `/api/procedures/${created.body.id}/approve`, { version: 1, handCheck: 'Filler, electrical, gas and joint checked by hand against PQR-D11' })
    expect(approved.status).toBe(200)
    expect((await detail(supervisor, created.body.id)).body.procedure.status).toBe('approved')
  })
})

describe('production readings', () => {
  it('checks each reading against the window and computes heat input', async () => {
    const w01 = await byNumber('KB-W01', 0)
    const inside = await send(inspector, 'POST', `/api/procedures/${w01.id}/readings`, { volts: 18, amps: 120, travelSpeed: 14, wireFeedSpeed: 230, reference: 'hood panel 3' })
    expect(inside.status).toBe(201)
    expect(inside.body.within).toBe(true)
    // ASME BPVC IX, QW-409.1(a): J/in = V × A × 60 / travel speed = 18 × 120 × 60 / 14 = 9257.142857 J/in.
    expect(inside.body.heatInput.value).toBeCloseTo(9257.142857, 5)
    const outside = await send(supervisor, 'POST', `/api/procedures/${w01.id}/readings`, { volts: 21, amps: 120 })
    expect(outside.status).toBe(201)
    expect(outside.body.within).toBe(false)
    expect(outside.body.checks.find(c => c.parameter === 'volts')?.within).toBe(false)
  })

  it('a welder records their own readings and sees only theirs', async () => {
    const w01 = await byNumber('KB-W01', 0)
    const mine = await send(welder, 'POST', `/api/procedures/${w01.id}/readings`, { welderId: 1, volts: 18.5, ctwd: 0.4, gasFlow: 30 })
    expect(mine.status).toBe(201)
    const me = await welder.json<{ welder: { id: number } }>('/api/me/qualifications')
    expect(mine.body.welderId).toBe(me.body.welder.id)
    const list = await welder.json<{ items: { welderId: number }[] }>(`/api/procedures/${w01.id}/readings`)
    expect(list.body.items.length).toBe(1)
    const all = await inspector.json<{ items: unknown[], window: Record<string, unknown> }>(`/api/procedures/${w01.id}/readings`)
    expect(all.body.items.length).toBeGreaterThanOrEqual(3)
    expect(all.body.window.volts).toEqual({ min: 17, max: 19.5 })
  })

  it('refuses readings on drafts, empty readings and parameters the window does not state', async () => {
    const draft = await byNumber('KB-W04', 0)
    expect((await send(supervisor, 'POST', `/api/procedures/${draft.id}/readings`, { volts: 25 })).status).toBe(409)
    expect((await send(welder, 'POST', `/api/procedures/${draft.id}/readings`, { volts: 25 })).status).toBe(404)
    const w02 = await byNumber('KB-W02', 1)
    const empty = await send(supervisor, 'POST', `/api/procedures/${w02.id}/readings`, {})
    expect(empty.status).toBe(400)
    expect((empty.body as Errors).data!.fieldErrors.volts).toBeDefined()
    const noWire = await send(supervisor, 'POST', `/api/procedures/${w02.id}/readings`, { wireFeedSpeed: 200 })
    expect(noWire.status).toBe(400)
    expect((noWire.body as Errors).message).toMatch(/wire feed speed/)
    expect((await send(auditor, 'POST', `/api/procedures/${w02.id}/readings`, { volts: 22 })).status).toBe(403)
    expect((await send(supervisor, 'POST', '/api/procedures/999999/readings', { volts: 22 })).status).toBe(404)
  })
})
