import dayjs from 'dayjs'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startFakeSmtp, type FakeSmtp } from '../../scripts/fake-smtp.mjs'
import { signedIn, startServer, type Client, type TestServer } from './harness'

// Issue 7: each welder with a qualification lapsing in 30, 14 and 7 days gets one reminder for each step, the
// quality manager a weekly digest of what lapses in the next 60 days, and a re-run never sends anything twice.
interface Standing { process: string, lapsesOn: string, daysLeft: number, lastUse: string }
interface WelderRow { id: number, stamp: string, name: string, email: string | null, status: string, standings: Standing[] }
interface Outbox { items: { to: string, subject: string, status: string, attempts: number, lastError: string | null, kind: string, text: string }[], total: number, counts: Record<string, number> }
interface Run { remindersQueued: number, digestsQueued: number, sent: number, week: string }

// The reminder steps of issue 7 written out as data (days left → step), not recomputed the way the code does it.
const stepTable: [first: number, last: number, step: number][] = [[1, 7, 7], [8, 14, 14], [15, 30, 30]]
const stepOf = (daysLeft: number) => stepTable.find(([first, last]) => daysLeft >= first && daysLeft <= last)?.[2] ?? null
// Dates through dayjs, not date-fns (the library the code uses)
const day = (date: Date | dayjs.Dayjs) => dayjs(date).format('YYYY-MM-DD')

let smtp: FakeSmtp
let server: TestServer
let supervisor: Client
let roster: WelderRow[]

beforeAll(async () => {
  smtp = await startFakeSmtp()
  server = await startServer({ env: { SMTP_URL: smtp.url, MAIL_FROM: 'Rootface tests <rootface@test.invalid>', NUXT_MAIL_TEST_CLOCK: 'true', NUXT_MAIL_RETRY_SECONDS: '1' } })
  supervisor = await signedIn(server.url, 'supervisor')
  roster = (await supervisor.json<{ items: WelderRow[] }>('/api/welders?pageSize=200')).body.items
})
afterAll(async () => {
  await server?.stop()
  await smtp?.close()
})

const settle = () => new Promise(resolve => setTimeout(resolve, 400))

describe('lapse reminders and the weekly digest', () => {
  const today = day(new Date())
  // What the demo seeds: active welders with an address and a qualification 1 to 30 days from lapsing.
  const due = () => roster.filter(w => w.status === 'active' && w.email)
    .flatMap(w => w.standings.filter(s => stepOf(s.daysLeft)).map(s => ({ welder: w, standing: s })))

  it('the first run sends each welder one reminder per lapsing process and the supervisor one digest', async () => {
    const expected = due()
    expect(expected.length).toBeGreaterThan(0)
    const run = await supervisor.json<Run>('/api/mail/run-reminders', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ today }) })
    expect(run.status).toBe(200)
    expect(run.body.remindersQueued).toBe(expected.length)
    expect(run.body.digestsQueued).toBe(1)
    await smtp.waitFor(expected.length + 1)
    await settle()
    expect(smtp.messages).toHaveLength(expected.length + 1)

    for (const { welder, standing } of expected) {
      const got = smtp.messages.filter(m => m.to.includes(welder.email!) && m.subject.startsWith(`${standing.process} qualification lapses on ${standing.lapsesOn}`))
      expect(got, `${welder.stamp} ${standing.process}`).toHaveLength(1)
      expect(got[0]!.text).toContain(`lapses on ${standing.lapsesOn}, in ${standing.daysLeft} day`)
      expect(got[0]!.text).toContain('the inspector have the final word')
      expect(got[0]!.html).toContain(standing.lapsesOn)
      expect(got[0]!.from).toBe('rootface@test.invalid')
    }
    const digest = smtp.messages.filter(m => m.to.includes('supervisor@demo.rootface.test'))
    expect(digest).toHaveLength(1)
    const within60 = roster.filter(w => w.status === 'active').flatMap(w => w.standings.filter(s => s.daysLeft > 0 && s.daysLeft <= 60).map(s => ({ w, s })))
    expect(digest[0]!.subject).toContain(`${within60.length} qualification`)
    for (const { w, s } of within60) expect(digest[0]!.text).toMatch(new RegExp(`${s.lapsesOn}\\s+${s.daysLeft}\\s+${w.stamp}`))
    // Nobody who is not due hears anything.
    const addressed = new Set(smtp.messages.flatMap(m => m.to))
    expect(addressed).toEqual(new Set([...expected.map(e => e.welder.email!), 'supervisor@demo.rootface.test']))
  })

  it('a second run the same day sends nothing', async () => {
    const before = smtp.messages.length
    const run = await supervisor.json<Run>('/api/mail/run-reminders', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ today }) })
    expect(run.body).toMatchObject({ remindersQueued: 0, digestsQueued: 0, sent: 0 })
    await settle()
    expect(smtp.messages.length).toBe(before)
    const outbox = await supervisor.json<Outbox>('/api/mail?pageSize=200')
    expect(outbox.body.total).toBe(before)
    expect(outbox.body.counts.sent).toBe(before)
  })

  it('days later, only qualifications that reached the next step get another reminder, once', async () => {
    const candidate = due().find(e => e.standing.daysLeft > 14)
    expect(candidate, 'the demo has a qualification in the 30-day step').toBeTruthy()
    const shift = candidate!.standing.daysLeft - 14
    const later = day(dayjs(today).add(shift, 'day'))
    const sentSteps = new Set(due().map(e => `${e.welder.id}|${e.standing.process}|${stepOf(e.standing.daysLeft)}`))
    const expected = roster.filter(w => w.status === 'active' && w.email).flatMap(w => w.standings
      .filter(s => stepOf(s.daysLeft - shift) && !sentSteps.has(`${w.id}|${s.process}|${stepOf(s.daysLeft - shift)}`))
      .map(s => ({ w, s })))
    expect(expected.some(e => e.w.id === candidate!.welder.id && e.s.process === candidate!.standing.process)).toBe(true)

    const before = smtp.messages.length
    const first = await supervisor.json<Run>('/api/mail/run-reminders', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ today: later }) })
    expect(first.body.remindersQueued).toBe(expected.length)
    const again = await supervisor.json<Run>('/api/mail/run-reminders', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ today: later }) })
    expect(again.body).toMatchObject({ remindersQueued: 0, digestsQueued: 0 })
    await smtp.waitFor(before + expected.length + first.body.digestsQueued)
    await settle()
    const fresh = smtp.messages.slice(before)
    expect(fresh.filter(m => m.subject.includes('qualification lapses on'))).toHaveLength(expected.length)
    for (const { w, s } of expected) {
      expect(fresh.filter(m => m.to.includes(w.email!) && m.subject.startsWith(`${s.process} qualification lapses on ${s.lapsesOn} (${s.daysLeft - shift} day`))).toHaveLength(1)
    }
  })

  it('another day can be set only on a server with the test clock; a bad day is a 400', async () => {
    const bad = await supervisor.json<{ data: { fieldErrors: Record<string, string[]> } }>('/api/mail/run-reminders', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ today: 'next tuesday' }) })
    expect(bad.status).toBe(400)
    expect(bad.body.data.fieldErrors.today).toBeTruthy()
  })
})

describe('the outbox', () => {
  it('a refused delivery stays queued with its error and goes out on a later try, once', async () => {
    smtp.refuseNext(1)
    const before = smtp.messages.length
    const invite = await supervisor.json<{ id: number }>('/api/accounts', {
      method: 'POST', headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: 'retry.check@kestrelbend.test', name: 'Retry Check', role: 'inspector' }),
    })
    expect(invite.status).toBe(201)
    let row: Outbox['items'][number] | undefined
    for (let i = 0; i < 40 && !row?.lastError; i++) {
      await settle()
      row = (await supervisor.json<Outbox>('/api/mail?q=retry.check')).body.items[0]
    }
    expect(row).toMatchObject({ status: 'queued', attempts: 1, kind: 'invitation' })
    expect(row!.lastError).toContain('try again later')
    expect(smtp.messages.length).toBe(before)

    await new Promise(resolve => setTimeout(resolve, 1200)) // NUXT_MAIL_RETRY_SECONDS=1 in this suite
    const send = await supervisor.json<{ sent: number }>('/api/mail/send', { method: 'POST', headers: { 'content-type': 'application/json' }, body: '{}' })
    expect(send.body.sent).toBe(1)
    await smtp.waitFor(before + 1)
    const again = await supervisor.json<{ sent: number }>('/api/mail/send', { method: 'POST', headers: { 'content-type': 'application/json' }, body: '{}' })
    expect(again.body.sent).toBe(0)
    await settle()
    expect(smtp.messages.filter(m => m.to.includes('retry.check@kestrelbend.test'))).toHaveLength(1)
    expect((await supervisor.json<Outbox>('/api/mail?q=retry.check')).body.items[0]).toMatchObject({ status: 'sent', attempts: 2, lastError: null })
  })

  it('only a supervisor reads the outbox', async () => {
    for (const role of ['inspector', 'welder', 'auditor'] as const) {
      expect((await (await signedIn(server.url, role)).fetch('/api/mail')).status).toBe(403)
    }
  })
})
