import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { type Client, signedIn, startServer, type TestServer } from './harness'

let server: TestServer
let supervisor: Client
let inspector: Client
let auditor: Client
const json = (body: unknown, method = 'POST') => ({ method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })

beforeAll(async () => {
  server = await startServer()
  supervisor = await signedIn(server.url, 'supervisor')
  inspector = await signedIn(server.url, 'inspector')
  auditor = await signedIn(server.url, 'auditor')
})
afterAll(async () => server?.stop())

describe('customers and projects (quality manager)', () => {
  let customerId = 0
  let projectId = 0

  it('creates a customer, refuses a duplicate name with a field message', async () => {
    const created = await supervisor.json<{ id: number, version: number }>('/api/customers', json({ name: 'Test customer <b>Å</b>', contact: '' }))
    expect(created.status).toBe(201)
    customerId = created.body.id
    const again = await supervisor.json<{ data: { fieldErrors: Record<string, string[]> } }>('/api/customers', json({ name: 'Test customer <b>Å</b>' }))
    expect(again.status).toBe(400)
    expect(again.body.data.fieldErrors.name?.[0]).toMatch(/exists/)
  })

  it('creates a project, with field messages for a bad period and an unknown customer', async () => {
    const bad = await supervisor.json<{ data: { fieldErrors: Record<string, string[]> } }>('/api/projects', json({ customerId, number: 'T-1', name: 'Test', startsOn: '2026-05-01', endsOn: '2026-04-01' }))
    expect(bad.status).toBe(400)
    expect(bad.body.data.fieldErrors.endsOn?.[0]).toMatch(/before the start/)
    const unknown = await supervisor.json<{ data: { fieldErrors: Record<string, string[]> } }>('/api/projects', json({ customerId: 999999, number: 'T-1', name: 'Test', startsOn: '2026-05-01' }))
    expect(unknown.status).toBe(400)
    expect(unknown.body.data.fieldErrors.customerId).toBeDefined()
    const made = await supervisor.json<{ id: number }>('/api/projects', json({ customerId, number: 'T-1', name: 'Test project', startsOn: '2026-05-01', endsOn: null }))
    expect(made.status).toBe(201)
    projectId = made.body.id
  })

  it('edits with the version read; a stale version is a 409', async () => {
    const detail = await supervisor.json<{ project: { version: number } }>(`/api/projects/${projectId}`)
    const version = detail.body.project.version
    expect((await supervisor.fetch(`/api/projects/${projectId}`, json({ name: 'Renamed', version }, 'PATCH'))).status).toBe(200)
    expect((await supervisor.fetch(`/api/projects/${projectId}`, json({ name: 'Again', version }, 'PATCH'))).status).toBe(409)
  })

  it('attaches WPSs (not drafts) and welders, grants and revokes an auditor, who then cannot read it', async () => {
    const choices = await supervisor.json<{ procedures: { id: number, status: string }[], auditors: { id: number }[], welders: { id: number }[] }>(`/api/projects/${projectId}/choices`)
    expect(choices.body.procedures.length, 'a check over an empty list proves nothing').toBeGreaterThan(0)
    expect(choices.body.procedures.every(p => p.status !== 'draft')).toBe(true)
    const approved = choices.body.procedures.find(p => p.status === 'approved')!
    expect((await supervisor.fetch(`/api/projects/${projectId}/procedures`, json({ procedureId: approved.id }))).status).toBe(200)
    const draft = await supervisor.json<{ data: { fieldErrors: Record<string, string[]> } }>(`/api/projects/${projectId}/procedures`, json({ procedureId: 5 })) // KB-W04 is a draft
    expect(draft.status).toBe(400)
    expect(draft.body.data.fieldErrors.procedureId?.[0]).toMatch(/draft/)
    expect((await supervisor.fetch(`/api/projects/${projectId}/welders`, json({ welderId: choices.body.welders[0]!.id }))).status).toBe(200)
    const notAuditor = await supervisor.fetch(`/api/projects/${projectId}/auditors`, json({ accountId: 1 })) // the supervisor's own account
    expect(notAuditor.status).toBe(400)

    expect((await auditor.fetch(`/api/projects/${projectId}`)).status).toBe(404)
    const auditorId = choices.body.auditors[0]!.id
    expect((await supervisor.fetch(`/api/projects/${projectId}/auditors`, json({ accountId: auditorId }))).status).toBe(200)
    const seen = await auditor.json<{ procedures: { id: number }[], auditors: unknown[] }>(`/api/projects/${projectId}`)
    expect(seen.status).toBe(200)
    expect(seen.body.procedures.map(p => p.id)).toEqual([approved.id])
    expect(seen.body.auditors).toEqual([]) // an auditor is not shown who else was granted
    expect((await supervisor.fetch(`/api/projects/${projectId}/auditors/${auditorId}`, { method: 'DELETE' })).status).toBe(200)
    expect((await auditor.fetch(`/api/projects/${projectId}`)).status).toBe(404)
  })

  it('keeps a customer with projects; deletes the project, then the customer', async () => {
    expect((await supervisor.fetch(`/api/customers/${customerId}`, { method: 'DELETE' })).status).toBe(409)
    expect((await supervisor.fetch(`/api/projects/${projectId}`, { method: 'DELETE' })).status).toBe(200)
    expect((await supervisor.fetch(`/api/projects/${projectId}`)).status).toBe(404)
    expect((await supervisor.fetch(`/api/customers/${customerId}`, { method: 'DELETE' })).status).toBe(200)
  })
})

describe('sign-off requests', () => {
  it('an inspector asks the quality manager to approve a draft WPS; it shows in the supervisor\'s inbox and is marked done', async () => {
    const candidates = await inspector.json<{ records: { recordType: string, recordId: number, meaning: string }[], people: { id: number }[] }>('/api/signoffs/candidates')
    const { recordType, recordId, meaning } = candidates.body.records.find(r => r.recordType === 'procedure')!
    const draft = { recordType, recordId, meaning }
    expect(draft.meaning).toBe('approved')
    const asked = await inspector.json<{ id: number }>('/api/signoffs', json({ ...draft, requestedOf: candidates.body.people[0]!.id, note: 'Ready for you' }))
    expect(asked.status).toBe(201)
    expect((await inspector.fetch('/api/signoffs', json({ ...draft, requestedOf: null, note: null }))).status).toBe(409) // one open request at a time
    const inbox = await supervisor.json<{ id: number, note: string }[]>('/api/signoffs?box=inbox')
    expect(inbox.body.find(r => r.id === asked.body.id)?.note).toBe('Ready for you')
    expect((await inspector.json<{ id: number }[]>('/api/signoffs?box=inbox')).body.some(r => r.id === asked.body.id)).toBe(false)
    expect((await inspector.fetch(`/api/signoffs/${asked.body.id}`, json({ status: 'done' }, 'PATCH'))).status).toBe(403)
    expect((await supervisor.fetch(`/api/signoffs/${asked.body.id}`, json({ status: 'done' }, 'PATCH'))).status).toBe(200)
    expect((await supervisor.fetch(`/api/signoffs/${asked.body.id}`, json({ status: 'done' }, 'PATCH'))).status).toBe(409)
  })

  it('a quality manager asks an inspector to certify a recorded test, and may withdraw it; roles cannot ask the wrong way', async () => {
    const candidates = await supervisor.json<{ records: { recordType: string, recordId: number, meaning: string }[] }>('/api/signoffs/candidates')
    const found = candidates.body.records.find(r => r.recordType === 'welder-test')!
    const test = { recordType: found.recordType, recordId: found.recordId, meaning: found.meaning }
    const asked = await supervisor.json<{ id: number }>('/api/signoffs', json({ ...test, requestedOf: null, note: '' }))
    expect(asked.status).toBe(201)
    expect((await inspector.json<{ id: number }[]>('/api/signoffs')).body.some(r => r.id === asked.body.id)).toBe(true)
    expect((await supervisor.fetch(`/api/signoffs/${asked.body.id}`, json({ status: 'withdrawn' }, 'PATCH'))).status).toBe(200)
    expect((await inspector.json<{ id: number }[]>('/api/signoffs')).body.some(r => r.id === asked.body.id)).toBe(false)
    const wrongWay = await inspector.json<{ data: { fieldErrors: Record<string, string[]> } }>('/api/signoffs', json({ ...test, meaning: 'certified', requestedOf: null, note: null }))
    expect(wrongWay.status).toBe(400)
    expect(wrongWay.body.data.fieldErrors.meaning).toBeDefined()
    // A record already signed with that meaning: test 1 is certified in the demo
    expect((await supervisor.fetch('/api/signoffs', json({ recordType: 'welder-test', recordId: 1, meaning: 'certified', requestedOf: null, note: null }))).status).toBe(409)
  })
})
