import dayjs from 'dayjs'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'

// Imported welder-test history once an inspector confirms it (it then keeps the standing like a certified test, never
// before), and the e-mail a revocation sends. Each suite makes its own invented welders; the demo gives the accounts.
let server: TestServer
let supervisor: Client
let inspector: Client
let welder: Client
let auditor: Client
let today: string

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers of many shapes, read field by field
type Body = Record<string, any>
const send = (client: Client, method: string, path: string, body?: unknown) =>
  client.json<Body>(path, { method, ...(body === undefined ? {} : { body: JSON.stringify(body), headers: { 'content-type': 'application/json' } }) })
interface Standing { process: string, standing: string, testDate: string, lastUse: string, lapsesOn: string, revoked?: { on: string, reason: string } | null }
const standingsOf = async (id: number) => (await send(supervisor, 'GET', `/api/welders/${id}`)).body.standings as Standing[]
const day = (d: dayjs.Dayjs) => d.format('YYYY-MM-DD')

async function importedHistory(stamp: string, lines: string[]) {
  const created = await send(supervisor, 'POST', '/api/welders', { name: `Invented ${stamp}`, stamp })
  expect(created.status).toBe(201)
  const csv = ['Stamp,Process,Code,Edition,Test date,Positions,Thickness,Certificate', ...lines].join('\n')
  const stored = await send(supervisor, 'POST', '/api/import/tests', { format: 'csv', content: csv, commit: true })
  expect(stored.status, JSON.stringify(stored.body)).toBe(200)
  expect(stored.body.stored).toBe(lines.length)
  const history = (await send(inspector, 'GET', `/api/welders/${created.body.id}/imported-tests`)).body as { id: number, process: string, state: string }[]
  return { id: created.body.id as number, history }
}

beforeAll(async () => {
  server = await startServer()
  supervisor = await signedIn(server.url, 'supervisor')
  inspector = await signedIn(server.url, 'inspector')
  welder = await signedIn(server.url, 'welder')
  auditor = await signedIn(server.url, 'auditor')
  const own = (await welder.json<{ welder: { id: number } }>('/api/me/qualifications')).body.welder.id
  today = (await send(supervisor, 'GET', `/api/welders/${own}`)).body.today
}, 60_000)
afterAll(async () => server?.stop())

describe('imported test history, confirmed by the inspector, keeps the standing like a certified test', () => {
  it('counts for nothing while "imported"; once confirmed it starts the standing and continuity extends it', async () => {
    const tested = day(dayjs(today).subtract(60, 'day'))
    const { id, history } = await importedHistory('RC-01', [
      `RC-01,SMAW,ASME IX,2019,${tested},"1G, 2G, 3G","1/16 to 3/4 in",C-101`,
      `RC-01,GTAW,ASME IX,2019,${tested},1G,"up to 1/4 in",C-102`,
    ])
    const smaw = history.find(h => h.process === 'SMAW')!
    const gtaw = history.find(h => h.process === 'GTAW')!
    expect([smaw.state, gtaw.state]).toEqual(['imported', 'imported'])
    // never a yes before confirmation: no kept standing, no coverage, no card line
    expect(await standingsOf(id)).toEqual([])
    for (const client of [supervisor, welder, auditor]) {
      expect((await send(client, 'POST', `/api/imported-tests/${smaw.id}/confirm`)).status).toBe(403)
    }
    expect(await standingsOf(id)).toEqual([])
    expect((await send(inspector, 'POST', '/api/imported-tests/99999999/confirm')).status).toBe(404)
    expect((await send(inspector, 'POST', '/api/imported-tests/abc/confirm')).status).toBe(400)

    const confirmed = await send(inspector, 'POST', `/api/imported-tests/${smaw.id}/confirm`)
    expect(confirmed.status).toBe(200)
    const after = await standingsOf(id)
    // ASME BPVC IX, QW-322.1(a): lapses 6 months after the last use (the test day itself when nothing is logged);
    // the date cross-checked with dayjs (same month-end clamping)
    expect(after).toEqual([expect.objectContaining({ process: 'SMAW', testDate: tested, lastUse: tested, lapsesOn: day(dayjs(tested).add(6, 'month')), standing: 'current' })])
    // the other imported line stays imported and counts for nothing
    expect(after.some(s => s.process === 'GTAW')).toBe(false)

    // continuity logged after the confirmed test keeps it current, as for a certified test (QW-322.1(a))
    const used = day(dayjs(today).subtract(10, 'day'))
    const entry = await send(inspector, 'POST', '/api/continuity', { welderId: id, process: 'SMAW', weldedOn: used, reference: 'Job RC-7' })
    expect(entry.status, JSON.stringify(entry.body)).toBe(201)
    const extended = (await standingsOf(id)).find(s => s.process === 'SMAW')!
    expect(extended).toMatchObject({ lastUse: used, lapsesOn: day(dayjs(used).add(6, 'month')) })
    // a GTAW use does not make the unconfirmed GTAW line count
    expect((await send(inspector, 'POST', '/api/continuity', { welderId: id, process: 'GTAW', weldedOn: used, reference: 'Job RC-7' })).status).toBe(201)
    expect((await standingsOf(id)).some(s => s.process === 'GTAW')).toBe(false)

    // the confirmation is in the audit trail, in its own words
    const audit = await send(supervisor, 'GET', '/api/audit?pageSize=20')
    expect(JSON.stringify(audit.body)).toContain('confirm')
  })

  it('an old confirmed record lapses on its date; a qualification standing on it can be revoked and mails the quality manager', async () => {
    const old = '2023-02-10'
    const { id, history } = await importedHistory('RC-02', [`RC-02,SMAW,AWS D1.1,2020,${old},"1G, 2G",unlimited,C-201`])
    expect((await send(inspector, 'POST', `/api/imported-tests/${history[0]!.id}/confirm`)).status).toBe(200)
    // AWS D1.1:2020 6.2.3 ("a period exceeding six months", SOURCES B): still qualified on the six-month anniversary,
    // lapsed from the next day; 2023-02-10 + 6 months + 1 day, by dayjs
    const [s] = await standingsOf(id)
    expect(s).toMatchObject({ process: 'SMAW', lapsesOn: day(dayjs(old).add(6, 'month').add(1, 'day')), standing: 'lapsed' })

    const fresh = day(dayjs(today).subtract(20, 'day'))
    const second = await importedHistory('RC-03', [`RC-03,SMAW,ASME IX,2019,${fresh},1G,"up to 1/2 in",C-301`])
    expect((await send(inspector, 'POST', `/api/imported-tests/${second.history[0]!.id}/confirm`)).status).toBe(200)
    const revoked = await send(inspector, 'POST', `/api/welders/${second.id}/revocations`, { process: 'SMAW', reason: 'Lack of fusion found on two production welds' })
    expect(revoked.status, JSON.stringify(revoked.body)).toBe(201)
    expect(revoked.body.basisTestId).toBeNull() // the basis is the imported record, not a welder test
    expect((await standingsOf(second.id))[0]).toMatchObject({ standing: 'lapsed', revoked: expect.objectContaining({ reason: 'Lack of fusion found on two production welds' }) })
    const mail = await send(supervisor, 'GET', '/api/mail?kind=revocation&pageSize=50')
    const about = (mail.body.items as { to: string, subject: string, text: string }[]).filter(m => m.subject.includes('RC-03'))
    expect(about.map(m => m.to)).toContain('supervisor@demo.rootface.test')
    expect(about[0]!.text).toContain('Lack of fusion found on two production welds')
  })
})

describe('a revocation e-mails the welder (when they have an account) and the quality manager', () => {
  it('one message each, in plain words, queued in the outbox with the revocation', async () => {
    const mine = (await welder.json<{ welder: { id: number, stamp: string }, standings: Standing[] }>('/api/me/qualifications')).body
    const held = mine.standings.find(s => s.standing !== 'lapsed' && !s.revoked)
    expect(held, 'the demo welder holds a current process').toBeDefined()
    const before = (await send(supervisor, 'GET', '/api/mail?kind=revocation&pageSize=200')).body.total as number
    const made = await send(inspector, 'POST', `/api/welders/${mine.welder.id}/revocations`, { process: held!.process, reason: 'Undercut beyond the limit on three welds' })
    expect(made.status).toBe(201)
    const mail = (await send(supervisor, 'GET', '/api/mail?kind=revocation&pageSize=200')).body
    const quality = (await send(supervisor, 'GET', '/api/accounts?pageSize=200')).body.items
      .filter((a: { role: string, active: boolean }) => a.role === 'supervisor' && a.active).map((a: { email: string }) => a.email)
    const fresh = (mail.items as { to: string, subject: string, text: string }[]).slice(0, mail.total - before)
    expect(fresh.map(m => m.to).sort()).toEqual(['welder@demo.rootface.test', ...quality].sort())
    const toWelder = fresh.find(m => m.to === 'welder@demo.rootface.test')!
    expect(toWelder.subject).toBe(`Your ${held!.process} qualification was revoked`)
    expect(toWelder.text).toContain('Undercut beyond the limit on three welds')
    expect(toWelder.text).toContain('new test')
    const toManager = fresh.find(m => m.to !== 'welder@demo.rootface.test')!
    expect(toManager.subject).toContain(`${mine.welder.stamp}`)
    expect(toManager.text).toContain('revoked the')
    // a refused revocation (already revoked) sends nothing
    expect((await send(inspector, 'POST', `/api/welders/${mine.welder.id}/revocations`, { process: held!.process, reason: 'Undercut beyond the limit again' })).status).toBe(409)
    expect((await send(supervisor, 'GET', '/api/mail?kind=revocation&pageSize=200')).body.total).toBe(mail.total)
  })

  it('a welder without an account: only the quality manager hears of it', async () => {
    const tested = day(dayjs(today).subtract(5, 'day'))
    const { id, history } = await importedHistory('RC-04', [`RC-04,GTAW,ASME IX,2019,${tested},1G,"up to 1/4 in",C-401`])
    expect((await send(inspector, 'POST', `/api/imported-tests/${history[0]!.id}/confirm`)).status).toBe(200)
    expect((await send(inspector, 'POST', `/api/welders/${id}/revocations`, { process: 'GTAW', reason: 'Tungsten inclusions on two welds' })).status).toBe(201)
    const mail = (await send(supervisor, 'GET', '/api/mail?kind=revocation&pageSize=200')).body.items as { to: string, subject: string }[]
    const about = mail.filter(m => m.subject.includes('RC-04'))
    expect(about.length).toBeGreaterThan(0)
    expect(about.every(m => m.to !== 'welder@demo.rootface.test' && !m.subject.startsWith('Your'))).toBe(true)
  })
})
