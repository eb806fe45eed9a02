import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { Client, signedIn, startServer, type TestServer } from './harness'

let server: TestServer
let welder: Client

beforeAll(async () => {
  server = await startServer()
  welder = await signedIn(server.url, 'welder')
})
afterAll(async () => server?.stop())

describe('the welder\'s own view', () => {
  it('lists qualifications in plain words, days left and the approved WPSs of current processes', async () => {
    const res = await welder.json<{ standings: { process: string, standing: string, daysLeft: number }[], tests: { status: string, covers: string[] }[], procedures: { process: string }[], logsOwnContinuity: boolean }>('/api/me/qualifications')
    expect(res.status).toBe(200)
    expect(res.body.logsOwnContinuity).toBe(false) // the demo shop keeps continuity with its staff
    const certified = res.body.tests.filter(t => t.status === 'certified')
    expect(certified.length).toBeGreaterThan(0)
    expect(certified.every(t => t.covers.length > 0)).toBe(true)
    const current = new Set(res.body.standings.filter(s => s.standing !== 'lapsed').map(s => s.process))
    expect(current.size).toBeGreaterThan(0)
    expect(res.body.procedures.length).toBeGreaterThan(0)
    expect(res.body.procedures.every(p => current.has(p.process))).toBe(true)
  })

  it('the calendar file has one all-day event per process on its lapse date (RFC 5545)', async () => {
    const me = await welder.json<{ standings: { process: string, lapsesOn: string }[] }>('/api/me/qualifications')
    const res = await welder.fetch('/api/me/calendar.ics')
    expect(res.status).toBe(200)
    expect(res.headers.get('content-type')).toMatch(/^text\/calendar/)
    const text = await res.text()
    expect(text.startsWith('BEGIN:VCALENDAR')).toBe(true)
    expect(text).toContain('\r\n')
    expect(text.match(/BEGIN:VEVENT/g)?.length).toBe(me.body.standings.length)
    for (const s of me.body.standings) expect(text).toContain(`DTSTART;VALUE=DATE:${s.lapsesOn.replaceAll('-', '')}`)
  })

  it('a secret feed address works without a session until it is turned off or replaced', async () => {
    const make = await welder.json<{ path: string }>('/api/me/calendar-feed', { method: 'POST', body: JSON.stringify({ rotate: true }), headers: { 'content-type': 'application/json' } })
    expect(make.status).toBe(200)
    const anonymous = new Client(server.url)
    const feed = await anonymous.fetch(make.body.path)
    expect(feed.status).toBe(200)
    expect(await feed.text()).toContain('BEGIN:VEVENT')
    const again = await welder.json<{ path: string }>('/api/me/calendar-feed', { method: 'POST', body: JSON.stringify({ rotate: true }), headers: { 'content-type': 'application/json' } })
    expect(again.body.path).not.toBe(make.body.path)
    expect((await anonymous.fetch(make.body.path)).status).toBe(404)
    expect((await welder.fetch('/api/me/calendar-feed', { method: 'DELETE' })).status).toBe(204)
    expect((await anonymous.fetch(again.body.path)).status).toBe(404)
  })
})
