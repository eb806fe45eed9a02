import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'
import { samplePng, upload } from './support/files'

// Access on real records, with real ids and valid requests (the role matrix mostly shows the role check runs
// first). Rule of the house: a record someone may not see is a 404. Staff see every record; a welder only their
// own tests; an auditor only what belongs to a project granted to them (the WPSs on it, the PQRs behind those,
// the certified tests of its welders). The records are found through the quality manager's lists, not assumed.
type Role = 'supervisor' | 'inspector' | 'welder' | 'auditor'
let server: TestServer
const as = {} as Record<Role, Client>

interface TestRow { id: number, welderStamp: string, status: string }
interface ProjectDetail { id: number, number: string, procedures: { id: number, status: string }[], welders: { id: number, stamp?: string }[] }

const ids = {
  ownWelderId: 0,
  ownTest: 0, // the welder account's own certified test
  otherTest: 0, // another welder's certified test, on the granted project
  grantedProject: 0,
  otherProject: 0,
  grantedProcedure: 0, // a WPS on the granted project
  otherProcedure: 0, // a WPS on the other project only
  ownTestFile: 0,
  otherTestFile: 0,
  grantedProcedureFile: 0,
  otherProcedureFile: 0,
  uncertifiedTest: 0, // a recorded (not certified) test of a welder on the granted project
  uncertifiedTestFile: 0,
  otherPacket: 0, // a packet of the project not granted to the auditor
}

const json = (body: unknown, method = 'POST'): RequestInit => ({ method, body: JSON.stringify(body), headers: { 'content-type': 'application/json' } })
const status = async (role: Role, path: string, init?: RequestInit) => (await as[role].fetch(path, init)).status

async function attach(recordType: string, recordId: number, kind: string) {
  const res = await upload(as.inspector, { recordType, recordId, kind }, { name: `${recordType}-${recordId}.png`, type: 'image/png', bytes: samplePng })
  if (res.status !== 201) {
    // a record type the inspector may not attach to: the quality manager does
    const again = await upload(as.supervisor, { recordType, recordId, kind }, { name: `${recordType}-${recordId}.png`, type: 'image/png', bytes: samplePng })
    expect(again.status, `${recordType} ${recordId}: ${JSON.stringify(again.body)}`).toBe(201)
    return again.body.id
  }
  return res.body.id
}

beforeAll(async () => {
  server = await startServer()
  for (const role of ['supervisor', 'inspector', 'welder', 'auditor'] as const) as[role] = await signedIn(server.url, role)
  ids.ownWelderId = (await as.welder.json<{ welder: { id: number } }>('/api/me/qualifications')).body.welder.id

  // Projects: the one granted to the auditor is the one it can open; another is one it cannot.
  const projects = (await as.supervisor.json<{ id: number }[]>('/api/projects')).body
  expect(projects.length).toBeGreaterThan(1)
  for (const p of projects) {
    const seen = await status('auditor', `/api/projects/${p.id}`)
    if (seen === 200 && !ids.grantedProject) ids.grantedProject = p.id
    if (seen === 404 && !ids.otherProject) ids.otherProject = p.id
  }
  expect(ids.grantedProject).toBeGreaterThan(0)
  expect(ids.otherProject).toBeGreaterThan(0)
  const granted = (await as.supervisor.json<ProjectDetail>(`/api/projects/${ids.grantedProject}`)).body
  const other = (await as.supervisor.json<ProjectDetail>(`/api/projects/${ids.otherProject}`)).body
  const grantedProcedureIds = new Set(granted.procedures.map(p => p.id))
  ids.grantedProcedure = granted.procedures.find(p => p.status === 'approved')?.id ?? granted.procedures[0]!.id
  const otherOnly = other.procedures.find(p => !grantedProcedureIds.has(p.id))
  if (otherOnly) ids.otherProcedure = otherOnly.id
  else {
    // every WPS of the other project is also on the granted one: take one on no granted project
    const all = (await as.supervisor.json<{ items: { id: number }[] }>('/api/procedures?pageSize=200')).body.items
    for (const p of all) {
      if (!grantedProcedureIds.has(p.id) && await status('auditor', `/api/sheets/procedures/${p.id}?format=json`) === 404) {
        ids.otherProcedure = p.id
        break
      }
    }
  }
  expect(ids.otherProcedure).toBeGreaterThan(0)

  // Tests: the welder's own certified one, another welder's certified one on the granted project, an uncertified one there.
  const tests = (await as.supervisor.json<{ items: TestRow[] }>('/api/tests?pageSize=200')).body.items
  const grantedWelders = new Set(granted.welders.map(w => w.id))
  const roster = (await as.supervisor.json<{ items: { id: number, stamp: string }[] }>('/api/welders?pageSize=200')).body.items
  const idOfStamp = new Map(roster.map(w => [w.stamp, w.id]))
  for (const t of tests) {
    const welderId = idOfStamp.get(t.welderStamp)
    if (welderId === undefined) continue
    if (t.status === 'certified' && welderId === ids.ownWelderId && !ids.ownTest) ids.ownTest = t.id
    if (t.status === 'certified' && welderId !== ids.ownWelderId && grantedWelders.has(welderId) && !ids.otherTest) ids.otherTest = t.id
    if (t.status === 'recorded' && grantedWelders.has(welderId) && !ids.uncertifiedTest) ids.uncertifiedTest = t.id
  }
  expect(ids.ownTest).toBeGreaterThan(0)
  expect(ids.otherTest).toBeGreaterThan(0)
  if (!ids.uncertifiedTest) {
    // record one (a valid 10 mm SMAW 3G coupon, not yet examined) for a welder on the granted project
    const welderId = [...grantedWelders].find(id => id !== ids.ownWelderId) ?? [...grantedWelders][0]!
    const created = await as.inspector.json<{ id: number }>('/api/tests', json({
      welderId, testDate: '2026-11-20', code: 'asme-ix', edition: '2023', unit: 'mm', processes: [{ process: 'SMAW', transfer: null, depositThickness: 10 }],
      form: 'plate', weld: 'groove', couponThickness: 10, layers: 3, pNumber: '1', fNumber: '4', backing: true, positions: ['3G'], progression: 'uphill',
      visualAccepted: null, examination: 'bend', bends: [],
    }))
    expect(created.status).toBe(201)
    ids.uncertifiedTest = created.body.id
  }

  ids.ownTestFile = await attach('welder-test', ids.ownTest, 'coupon-photo')
  ids.otherTestFile = await attach('welder-test', ids.otherTest, 'coupon-photo')
  ids.uncertifiedTestFile = await attach('welder-test', ids.uncertifiedTest, 'coupon-photo')
  ids.grantedProcedureFile = await attach('procedure', ids.grantedProcedure, 'joint-sketch')
  ids.otherProcedureFile = await attach('procedure', ids.otherProcedure, 'joint-sketch')

  const packet = await as.supervisor.json<{ id: number }>('/api/packets', json({ projectId: ids.otherProject }))
  expect(packet.status).toBe(202)
  ids.otherPacket = packet.body.id
}, 120_000)
afterAll(async () => server?.stop())

describe('each role on real records', () => {
  it('sheets: staff read all; a welder their own test only; an auditor the granted project\'s records only', async () => {
    const rows: [string, Record<Role, number>][] = [
      [`/api/sheets/tests/${ids.ownTest}?format=json`, { supervisor: 200, inspector: 200, welder: 200, auditor: 200 }],
      [`/api/sheets/tests/${ids.otherTest}?format=json`, { supervisor: 200, inspector: 200, welder: 404, auditor: 200 }],
      [`/api/sheets/tests/${ids.uncertifiedTest}?format=json`, { supervisor: 200, inspector: 200, welder: 404, auditor: 404 }],
      [`/api/sheets/procedures/${ids.grantedProcedure}?format=json`, { supervisor: 200, inspector: 200, welder: 200, auditor: 200 }],
      [`/api/sheets/procedures/${ids.otherProcedure}?format=json`, { supervisor: 200, inspector: 200, welder: -1, auditor: 404 }],
    ]
    for (const [path, expected] of rows) {
      for (const role of ['supervisor', 'inspector', 'welder', 'auditor'] as const) {
        if (expected[role] === -1) continue // a welder reads approved WPSs; whether this one is approved depends on the demo
        expect(await status(role, path), `${role} ${path}`).toBe(expected[role])
      }
    }
  })

  // One access rule per record: a welder reads approved WPSs (sheet, files and thumbnails alike) and no other.
  async function welderSeesProcedure(id: number) {
    const { body } = await as.supervisor.json<{ procedure: { status: string } }>(`/api/procedures/${id}`)
    expect(body.procedure.status).toMatch(/^(draft|approved|superseded)$/)
    return body.procedure.status === 'approved' ? 200 : 404
  }

  it('files and thumbnails follow their record: own / another\'s / granted / not granted', async () => {
    const rows: [number, Record<Role, number>][] = [
      [ids.ownTestFile, { supervisor: 200, inspector: 200, welder: 200, auditor: 200 }],
      [ids.otherTestFile, { supervisor: 200, inspector: 200, welder: 404, auditor: 200 }],
      [ids.grantedProcedureFile, { supervisor: 200, inspector: 200, welder: await welderSeesProcedure(ids.grantedProcedure), auditor: 200 }],
      [ids.otherProcedureFile, { supervisor: 200, inspector: 200, welder: await welderSeesProcedure(ids.otherProcedure), auditor: 404 }],
    ]
    for (const [id, expected] of rows) {
      for (const role of ['supervisor', 'inspector', 'welder', 'auditor'] as const) {
        expect(await status(role, `/api/attachments/${id}`), `${role} file ${id}`).toBe(expected[role])
        expect(await status(role, `/api/attachments/${id}/thumbnail`), `${role} thumbnail ${id}`).toBe(expected[role])
      }
    }
  })

  it('file lists follow their record too', async () => {
    const list = (type: string, id: number) => `/api/attachments?recordType=${type}&recordId=${id}`
    const rows: [string, Record<Role, number>][] = [
      [list('welder-test', ids.ownTest), { supervisor: 200, inspector: 200, welder: 200, auditor: 200 }],
      [list('welder-test', ids.otherTest), { supervisor: 200, inspector: 200, welder: 404, auditor: 200 }],
      [list('procedure', ids.grantedProcedure), { supervisor: 200, inspector: 200, welder: await welderSeesProcedure(ids.grantedProcedure), auditor: 200 }],
      [list('procedure', ids.otherProcedure), { supervisor: 200, inspector: 200, welder: await welderSeesProcedure(ids.otherProcedure), auditor: 404 }],
    ]
    for (const [path, expected] of rows) {
      for (const role of ['supervisor', 'inspector', 'welder', 'auditor'] as const) {
        expect(await status(role, path), `${role} ${path}`).toBe(expected[role])
      }
    }
    // what a list shows is the file that was attached, not an empty list
    const own = await as.welder.json<{ items: { id: number }[] }>(list('welder-test', ids.ownTest))
    expect(own.body.items.map(i => i.id)).toContain(ids.ownTestFile)
  })

  // One access rule per record: an auditor sees only certified tests (as the sheet does), so their files too.
  it('an auditor gets 404 for the file of an uncertified test of a granted project\'s welder', async () => {
    expect(await status('auditor', `/api/attachments/${ids.uncertifiedTestFile}`)).toBe(404)
    expect(await status('auditor', `/api/attachments/${ids.uncertifiedTestFile}/thumbnail`)).toBe(404)
  })

  it('packets: an auditor reads the granted project\'s packets and gets 404 for a packet of a project not granted', async () => {
    expect(await status('auditor', `/api/packets/${ids.otherPacket}`)).toBe(404)
    expect(await status('auditor', `/api/packets/${ids.otherPacket}/file`)).toBe(404)
    expect(await status('auditor', `/api/projects/${ids.otherProject}/packets`)).toBe(404)
    expect(await status('auditor', '/api/packets', json({ projectId: ids.otherProject }))).toBe(404)
    // the same packet is there for the quality manager who built it
    expect(await status('supervisor', `/api/packets/${ids.otherPacket}`)).toBe(200)
    // and the granted project's packet works for the auditor
    const mine = await as.auditor.json<{ id: number }>('/api/packets', json({ projectId: ids.grantedProject }))
    expect(mine.status).toBe(202)
    expect(await status('auditor', `/api/packets/${mine.body.id}`)).toBe(200)
    const list = await as.auditor.json<unknown>(`/api/projects/${ids.grantedProject}/packets`)
    expect(list.status).toBe(200)
    expect(JSON.stringify(list.body)).toContain(`"id":${mine.body.id}`)
    expect(JSON.stringify(list.body)).not.toContain(`"id":${ids.otherPacket},`)
    // inspectors and welders do not build packets (role check: 403)
    expect(await status('inspector', '/api/packets', json({ projectId: ids.grantedProject }))).toBe(403)
    expect(await status('welder', '/api/packets', json({ projectId: ids.grantedProject }))).toBe(403)
  })

  it('lists: a welder\'s own view names only their own tests; the auditor sees only the granted project', async () => {
    const me = await as.welder.json<{ welder: { id: number }, tests: { id: number }[] }>('/api/me/qualifications')
    expect(me.status).toBe(200)
    expect(me.body.tests.length).toBeGreaterThan(0)
    expect(me.body.tests.map(t => t.id)).toContain(ids.ownTest)
    expect(me.body.tests.map(t => t.id)).not.toContain(ids.otherTest)
    const listed = await as.welder.json<{ items: { id: number }[] }>('/api/tests?pageSize=200')
    expect(listed.status).toBe(200)
    expect(listed.body.items.map(t => t.id)).toContain(ids.ownTest)
    expect(listed.body.items.map(t => t.id)).not.toContain(ids.otherTest)
    expect(await status('auditor', `/api/projects/${ids.grantedProject}`)).toBe(200)
    expect(await status('auditor', `/api/projects/${ids.otherProject}`)).toBe(404)
  })
})
