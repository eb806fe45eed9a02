import dayjs from 'dayjs'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'

// Revocation and requalification (ASME IX QW-322.1(b), QW-322.2(b)), welding operators (QW-360, QW-361) and the
// pickers that search on the server. Each suite makes its own records; the demo shop only provides the accounts.
let server: TestServer
let supervisor: Client
let inspector: Client
let welder: Client
let today: string

type Json = Record<string, unknown> & { data?: { fieldErrors: Record<string, string[]> } }
const send = (client: Client, path: string, body: unknown, method = 'POST') =>
  client.json<Json>(path, { method, body: JSON.stringify(body), headers: { 'content-type': 'application/json' } })

interface Standing { process: string, standing: string, lapsesOn: string, daysLeft: number, revoked?: { on: string, reason: string, by: string, clause: string } | null }
interface WelderPage { welder: { id: number }, standings: Standing[], today: string }
interface Revocations { items: { id: number, process: string, revokedOn: string, reason: string, revokedBy: string, inForce: boolean, restoredBy: { id: number, testDate: string } | null }[] }

/** A 6 mm SMAW plate groove coupon in 3G with two clean bends: passes (ASME BPVC IX-2023, QW-163: no open discontinuity). */
const coupon = (welderId: number, testDate: string, extra: Record<string, unknown> = {}) => ({
  welderId, testDate, code: 'asme-ix', edition: '2023', unit: 'mm', processes: [{ process: 'SMAW', depositThickness: 6 }], form: 'plate', weld: 'groove',
  couponThickness: 6, layers: 2, pNumber: '1', fNumber: '4', backing: true, positions: ['3G'], progression: 'uphill',
  visualAccepted: true, examination: 'bend', bends: [{ type: 'face', largestIndication: 0 }, { type: 'root', largestIndication: 0 }], ...extra,
})

async function newWelder(stamp: string, email?: string) {
  const res = await send(supervisor, '/api/welders', { name: `Invented ${stamp}`, stamp, ...(email ? { email } : {}) })
  expect(res.status).toBe(201)
  return res.body.id as number
}

async function certifiedTest(body: unknown) {
  const created = await send(inspector, '/api/tests', body)
  expect(created.status, JSON.stringify(created.body)).toBe(201)
  const test = (await inspector.json<{ id: number, version: number, evaluation: { outcome: string } }>(`/api/tests/${created.body.id}`)).body
  expect(test.evaluation.outcome).toBe('passed')
  expect((await send(inspector, `/api/tests/${test.id}/certify`, { version: test.version })).status).toBe(200)
  return test.id
}

beforeAll(async () => {
  server = await startServer()
  supervisor = await signedIn(server.url, 'supervisor')
  inspector = await signedIn(server.url, 'inspector')
  welder = await signedIn(server.url, 'welder')
  const own = (await welder.json<{ welder: { id: number } }>('/api/me/qualifications')).body.welder.id
  today = (await supervisor.json<WelderPage>(`/api/welders/${own}`)).body.today
}, 60_000)
afterAll(async () => server?.stop())

describe('revocation and requalification (QW-322.1(b), QW-322.2(b))', () => {
  let id: number
  let basisTest: number

  it('a certified test starts the standing; only the inspector revokes, with a process held and a specific reason', async () => {
    id = await newWelder('QA-R1')
    basisTest = await certifiedTest(coupon(id, dayjs(today).subtract(20, 'day').format('YYYY-MM-DD')))
    const before = (await supervisor.json<WelderPage>(`/api/welders/${id}`)).body
    expect(before.standings.find(s => s.process === 'SMAW')?.standing).toBe('current')

    expect((await send(supervisor, `/api/welders/${id}/revocations`, { process: 'SMAW', reason: 'Cracked root on two joints' })).status).toBe(403)
    const bad = await send(inspector, `/api/welders/${id}/revocations`, { process: 'XYZ', reason: 'short' })
    expect(bad.status).toBe(400)
    expect(Object.keys(bad.body.data!.fieldErrors).sort()).toEqual(['process', 'reason'])
    const notHeld = await send(inspector, `/api/welders/${id}/revocations`, { process: 'GTAW', reason: 'Cracked root on two joints' })
    expect(notHeld.status).toBe(400)
    expect(notHeld.body.data!.fieldErrors.process).toBeDefined()
    expect((await send(inspector, '/api/welders/99999999/revocations', { process: 'SMAW', reason: 'Cracked root on two joints' })).status).toBe(404)
  })

  it('revoking lapses the process at once everywhere, with reason, who and when; a second revocation is a 409', async () => {
    const made = await send(inspector, `/api/welders/${id}/revocations`, { process: 'SMAW', reason: 'Cracked root on two production joints' })
    expect(made.status).toBe(201)
    expect(made.body.revokedOn).toBe(today)
    expect((await send(inspector, `/api/welders/${id}/revocations`, { process: 'SMAW', reason: 'Cracked root again, second time' })).status).toBe(409)

    const page = (await supervisor.json<WelderPage>(`/api/welders/${id}`)).body
    const smaw = page.standings.find(s => s.process === 'SMAW')!
    expect(smaw.standing).toBe('lapsed')
    expect(smaw.lapsesOn).toBe(today)
    expect(smaw.revoked).toMatchObject({ on: today, reason: 'Cracked root on two production joints', clause: 'ASME IX QW-322.1(b)' })
    expect(smaw.revoked!.by.length).toBeGreaterThan(0)

    // The continuity board: lapsed, and no renewal coupon offered (QW-322.2(a) renews a lapse, not a revocation)
    const board = await supervisor.json<{ rows: (Standing & { welderStamp: string, renewal: unknown })[] }>('/api/continuity/standings?q=QA-R1')
    const row = board.body.rows.find(r => r.welderStamp === 'QA-R1' && r.process === 'SMAW')!
    expect(row.standing).toBe('lapsed')
    expect(row.renewal).toBeNull()

    // The lapse list of the last days names it
    const lapses = await supervisor.json<{ rows: { welderStamp: string, process: string }[] }>('/api/continuity/lapses?days=30&pastDays=1')
    expect(lapses.body.rows.some(r => r.welderStamp === 'QA-R1' && r.process === 'SMAW')).toBe(true)

    // Who can weld it? the welder is no longer able (covered by the test but not current)
    const joint = 'process=SMAW&unit=mm&pNumber=1&thickness=6&form=plate&weld=groove&position=V&fNumber=4&backing=true&progression=uphill'
    const coverage = await inspector.json<{ welders: { able: { stamp: string }[], lapsed: { stamp: string, standing: Standing }[] } }>(`/api/coverage?${joint}`)
    expect(coverage.status).toBe(200)
    expect(coverage.body.welders.able.map(w => w.stamp)).not.toContain('QA-R1')
    expect(coverage.body.welders.lapsed.find(w => w.stamp === 'QA-R1')?.standing.revoked?.reason).toBe('Cracked root on two production joints')

    const list = (await supervisor.json<Revocations>(`/api/welders/${id}/revocations`)).body
    expect(list.items).toHaveLength(1)
    expect(list.items[0]).toMatchObject({ process: 'SMAW', inForce: true, restoredBy: null })
  })

  it('the signed test stays frozen and still verifies unchanged', async () => {
    const test = (await inspector.json<{ status: string, signatures: { verifyCode: string }[] }>(`/api/tests/${basisTest}`)).body
    expect(test.status).toBe('certified')
    const verified = await supervisor.json<{ state: string }>(`/api/verify/${test.signatures[0]!.verifyCode}`)
    expect(verified.status).toBe(200)
    expect(verified.body.state).toBe('unchanged')
  })

  it('a continuity use after the revocation does not restore it; a new certified test does (QW-322.2(b))', async () => {
    expect((await send(inspector, '/api/continuity', { welderId: id, process: 'SMAW', weldedOn: today, reference: 'QA-A spool 1' })).status).toBe(201)
    const still = (await supervisor.json<WelderPage>(`/api/welders/${id}`)).body.standings.find(s => s.process === 'SMAW')!
    expect(still.standing).toBe('lapsed')

    const requalified = await certifiedTest(coupon(id, today))
    const page = (await supervisor.json<WelderPage>(`/api/welders/${id}`)).body
    const smaw = page.standings.find(s => s.process === 'SMAW')!
    expect(smaw.standing).toBe('current')
    expect(smaw.revoked ?? null).toBeNull()
    // Six months from the new test (ASME IX QW-322.1(a)); cross-checked with dayjs
    expect(smaw.lapsesOn).toBe(dayjs(today).add(6, 'month').format('YYYY-MM-DD'))
    const list = (await supervisor.json<Revocations>(`/api/welders/${id}/revocations`)).body
    expect(list.items[0]).toMatchObject({ inForce: false, restoredBy: { id: requalified, testDate: today } })
  })

  it('the welder sees their own revoked process on their page; another welder\'s list is a 404 to them', async () => {
    const mine = await welder.json<{ welder: { id: number }, standings: (Standing & { renewal: unknown })[] }>('/api/me/qualifications')
    const ownId = mine.body.welder.id
    const held = mine.body.standings.find(s => s.standing !== 'lapsed')
    expect(held, 'the demo welder holds a current process').toBeDefined()
    expect((await send(inspector, `/api/welders/${ownId}/revocations`, { process: held!.process, reason: 'Porosity in three production welds' })).status).toBe(201)
    const after = (await welder.json<{ standings: (Standing & { renewal: unknown })[] }>('/api/me/qualifications')).body.standings.find(s => s.process === held!.process)!
    expect(after.standing).toBe('lapsed')
    expect(after.revoked?.reason).toBe('Porosity in three production welds')
    expect(after.renewal).toBeNull()
    expect((await welder.json<Revocations>(`/api/welders/${ownId}/revocations`)).status).toBe(200)
    expect((await welder.json<Revocations>(`/api/welders/${id}/revocations`)).status).toBe(404)
  })
})

describe('reminders after a revocation', () => {
  it('a revoked process gets no lapse reminder; the same qualification unrevoked does', async () => {
    // Tested six months less 20 days ago: lapses in 20 days (QW-322.1(a)), inside the 30-day reminder step
    const testDate = dayjs(today).subtract(6, 'month').add(20, 'day').format('YYYY-MM-DD')
    const revoked = await newWelder('QA-M1', 'qa-m1@invented.test')
    const kept = await newWelder('QA-M2', 'qa-m2@invented.test')
    await certifiedTest(coupon(revoked, testDate))
    await certifiedTest(coupon(kept, testDate))
    expect((await send(inspector, `/api/welders/${revoked}/revocations`, { process: 'SMAW', reason: 'Undercut beyond limits on four fillets' })).status).toBe(201)
    expect((await send(supervisor, '/api/mail/run-reminders', {})).status).toBe(200)
    const to = async (address: string) => (await supervisor.json<{ items: { to: string }[] }>(`/api/mail?q=${encodeURIComponent(address)}&pageSize=50`)).body.items.filter(m => m.to === address)
    expect(await to('qa-m2@invented.test')).toHaveLength(1)
    expect(await to('qa-m1@invented.test')).toHaveLength(0)
  })
})

describe('welding operators (QW-360, QW-361)', () => {
  const operator = { mode: 'machine', visualControl: 'remote', arcVoltageControl: true, jointTracking: true, consumableInserts: false, passesPerSide: 'multiple' }

  it('an operator test needs the operator\'s variables; a welder test may not carry them', async () => {
    const id = await newWelder('QA-O1')
    const missing = await send(inspector, '/api/tests', coupon(id, today, { qualifiedAs: 'welding-operator' }))
    expect(missing.status).toBe(400)
    expect(missing.body.data!.fieldErrors.operator).toBeDefined()
    const stray = await send(inspector, '/api/tests', coupon(id, today, { operator }))
    expect(stray.status).toBe(400)
    expect(stray.body.data!.fieldErrors.operator).toBeDefined()
    const wrongMode = await send(inspector, '/api/tests', coupon(id, today, { qualifiedAs: 'welding-operator', operator: { ...operator, mode: 'hand' } }))
    expect(wrongMode.status).toBe(400)
  })

  it('a certified operator test is kept under its own standing and never answers for a manual joint', async () => {
    const id = await newWelder('QA-O2')
    const testId = await certifiedTest(coupon(id, today, { qualifiedAs: 'welding-operator', operator }))
    const test = (await inspector.json<{ qualifiedAs: string, operator: typeof operator, signatures: { verifyCode: string }[] }>(`/api/tests/${testId}`)).body
    expect(test.qualifiedAs).toBe('welding-operator')
    expect(test.operator).toEqual(operator)
    const verified = await supervisor.json<{ state: string }>(`/api/verify/${test.signatures[0]!.verifyCode}`)
    expect(verified.body.state).toBe('unchanged')

    // The WPQ sheet prints the operator's variables and what they qualify (QW-361.2(b): remote visual control only)
    const sheet = await supervisor.json<{ blocks: { heading: string, fields?: { label: string, value: string }[], table?: { rows: string[][] } }[] }>(`/api/sheets/tests/${testId}?format=json`)
    expect(sheet.status).toBe(200)
    const operatorBlock = sheet.body.blocks.find(b => b.heading.startsWith('Welding operator'))
    expect(operatorBlock?.fields?.find(f => f.label === 'Visual control')?.value).toBe('Remote')
    const qualified = sheet.body.blocks.find(b => b.heading === 'Qualified as a welding operator')
    expect(qualified?.table?.rows.map(r => r[0])).toContain('QW-361.2(b)')

    const page = (await supervisor.json<WelderPage>(`/api/welders/${id}`)).body
    expect(page.standings.map(s => s.process)).toEqual(['SMAW (welding operator)'])
    const joint = 'process=SMAW&unit=mm&pNumber=1&thickness=6&form=plate&weld=groove&position=V&fNumber=4&backing=true&progression=uphill'
    const coverage = await inspector.json<{ welders: Record<string, { stamp: string }[] | number> }>(`/api/coverage?${joint}`)
    const named = Object.values(coverage.body.welders).flatMap(v => (Array.isArray(v) ? v.map(w => w.stamp) : []))
    expect(named).not.toContain('QA-O2')

    // Continuity is logged per process and keeps the operator's qualification alive too (QW-322.1(a))
    const later = dayjs(today).format('YYYY-MM-DD')
    expect((await send(inspector, '/api/continuity', { welderId: id, process: 'SMAW', weldedOn: later, reference: 'QA-A machine seam' })).status).toBe(201)
    const kept = (await supervisor.json<WelderPage>(`/api/welders/${id}`)).body.standings[0]!
    expect(kept.standing).toBe('current')

    // The operator's qualification is revoked on its own key
    expect((await send(inspector, `/api/welders/${id}/revocations`, { process: 'SMAW (welding operator)', reason: 'Seam tracking drift not caught by the operator' })).status).toBe(201)
    expect((await supervisor.json<WelderPage>(`/api/welders/${id}`)).body.standings[0]!.standing).toBe('lapsed')
  })
})

describe('pickers that search on the server', () => {
  it('finds a welder beyond the first 200 of a large roster, by stamp, exact stamp first', async () => {
    for (let i = 1; i <= 205; i++) {
      const res = await send(supervisor, '/api/welders', { name: `Invented Picker ${i}`, stamp: `QA-P${String(i).padStart(3, '0')}` })
      expect(res.status).toBe(201)
    }
    const hit = await inspector.json<{ items: { stamp: string }[], more: boolean }>('/api/search/welders?q=QA-P205')
    expect(hit.status).toBe(200)
    expect(hit.body.items.map(w => w.stamp)).toEqual(['QA-P205'])
    const many = await inspector.json<{ items: { stamp: string }[], more: boolean }>('/api/search/welders?q=QA-P2&limit=5')
    expect(many.body.items).toHaveLength(5)
    expect(many.body.more).toBe(true)
    expect(many.body.items.map(w => w.stamp)).toEqual(['QA-P200', 'QA-P201', 'QA-P202', 'QA-P203', 'QA-P204'])
  })

  it('answers the records of ids, and refuses bad input with field messages', async () => {
    const two = await supervisor.json<{ items: { stamp: string }[] }>('/api/search/welders?q=QA-P00&limit=2')
    expect(two.body.items.length).toBe(2)
    const ids = (await supervisor.json<{ items: { id: number }[] }>('/api/search/welders?q=QA-P00&limit=2')).body.items.map(w => w.id)
    const byId = await supervisor.json<{ items: { id: number }[] }>(`/api/search/welders?ids=${ids.join(',')}`)
    expect(byId.body.items.map(w => w.id).sort()).toEqual([...ids].sort())
    for (const query of ['q=' + 'x'.repeat(81), 'ids=abc', 'limit=0', 'limit=51', 'status=gone']) {
      const res = await supervisor.json<Json>(`/api/search/welders?${query}`)
      expect(res.status, query).toBe(400)
      expect(Object.keys(res.body.data?.fieldErrors ?? {}).length, query).toBeGreaterThan(0)
    }
  })

  it('searches WPSs and PQRs by number, with the PQR support the WPS form checks against', async () => {
    const wps = await inspector.json<{ items: { number: string, status: string }[] }>('/api/search/procedures?q=KB-W&status=approved')
    expect(wps.status).toBe(200)
    expect(wps.body.items.length).toBeGreaterThan(0)
    expect(wps.body.items.every(p => p.number.includes('KB-W') && p.status === 'approved')).toBe(true)
    const pqr = await supervisor.json<{ items: { number: string, support: { id: number } }[] }>('/api/search/pqrs?q=PQR')
    expect(pqr.status).toBe(200)
    expect(pqr.body.items.length).toBeGreaterThan(0)
    expect(pqr.body.items.every(p => p.number.includes('PQR') && p.support)).toBe(true)
    expect((await supervisor.json('/api/search/pqrs?status=sideways')).status).toBe(400)
    expect((await supervisor.json('/api/search/procedures?ids=1,x')).status).toBe(400)
  })
})
