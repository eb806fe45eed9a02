import dayjs from 'dayjs'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import ExcelJS from 'exceljs'
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs'
import { Client, signedIn, startServer, type TestServer } from './harness'
import { pdfPages, squeeze } from './pdf-text'
import { samplePdf, upload } from './support/files'

let server: TestServer
let supervisor: Client
let inspector: Client
let welder: Client
let auditor: Client

beforeAll(async () => {
  server = await startServer()
  supervisor = await signedIn(server.url, 'supervisor')
  inspector = await signedIn(server.url, 'inspector')
  welder = await signedIn(server.url, 'welder')
  auditor = await signedIn(server.url, 'auditor')
})
afterAll(async () => server?.stop())

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers of many shapes, read field by field
type Body = Record<string, any> & { data?: { fieldErrors: Record<string, string[]>, rowErrors?: unknown[] } }
const send = (client: Client, method: string, path: string, body?: unknown) =>
  client.json<Body>(path, { method, ...(body === undefined ? {} : { body: JSON.stringify(body), headers: { 'content-type': 'application/json' } }) })
const today = dayjs().format('YYYY-MM-DD')

async function approvedProcedure() {
  const list = await supervisor.json<{ items: { id: number, number: string, revision: number, status: string }[] }>('/api/procedures?q=KB-W01&pageSize=50')
  const row = list.body.items.find(p => p.number === 'KB-W01' && p.status === 'approved')
  if (!row) throw new Error('no approved KB-W01')
  return row.id
}

describe('equipment register and calibration', () => {
  let overdue: number
  let fresh: number

  it('staff register a meter; the due date is the calibration date plus the interval (dayjs cross-check)', async () => {
    const calibratedOn = dayjs().subtract(13, 'month').format('YYYY-MM-DD')
    const created = await send(inspector, 'POST', '/api/equipment', { kind: 'ammeter', tag: 'T-AM-1', calibratedOn, intervalMonths: 12, description: 'test clamp meter' })
    expect(created.status).toBe(201)
    overdue = created.body.id
    const page = await send(supervisor, 'GET', `/api/equipment/${overdue}`)
    expect(page.status).toBe(200)
    // due = calibration + 12 months, 13 months ago: one month past due (common practice, shop's interval)
    expect(page.body.calibration).toMatchObject({ state: 'out-of-calibration', dueOn: dayjs(calibratedOn).add(12, 'month').format('YYYY-MM-DD') })
    const other = await send(supervisor, 'POST', '/api/equipment', { kind: 'voltmeter', tag: 'T-VM-1', calibratedOn: today, intervalMonths: 6 })
    expect(other.status).toBe(201)
    fresh = other.body.id
    expect((await send(welder, 'GET', `/api/equipment/${fresh}`)).body.calibration.state).toBe('in-calibration')
  })

  it('bad input is 400 per field; a second tag 400; a stale version 409; an unknown id 404', async () => {
    const bad = await send(supervisor, 'POST', '/api/equipment', { kind: 'hammer', tag: '', intervalMonths: 0, calibratedOn: '2026-02-30' })
    expect(bad.status).toBe(400)
    expect(Object.keys(bad.body.data!.fieldErrors).sort()).toEqual(['calibratedOn', 'intervalMonths', 'kind', 'tag'])
    const dup = await send(supervisor, 'POST', '/api/equipment', { kind: 'voltmeter', tag: 'T-AM-1' })
    expect(dup.status).toBe(400)
    expect(dup.body.data!.fieldErrors.tag).toBeDefined()
    const stale = await send(supervisor, 'PATCH', `/api/equipment/${fresh}`, { kind: 'voltmeter', tag: 'T-VM-1', version: 9 })
    expect(stale.status).toBe(409)
    expect((await send(supervisor, 'GET', '/api/equipment/999999')).status).toBe(404)
    expect((await send(supervisor, 'PATCH', '/api/equipment/999999', { kind: 'voltmeter', tag: 'X', version: 1 })).status).toBe(404)
  })

  it('a new calibration date brings the meter back in calibration', async () => {
    const before = await send(supervisor, 'GET', `/api/equipment/${overdue}`)
    const saved = await send(supervisor, 'PATCH', `/api/equipment/${overdue}`, { kind: 'ammeter', tag: 'T-AM-1', calibratedOn: today, intervalMonths: 12, version: before.body.version })
    expect(saved.status).toBe(200)
    expect((await send(supervisor, 'GET', `/api/equipment/${overdue}`)).body.calibration.state).toBe('in-calibration')
    // and back to the old date for the next tests
    const again = await send(supervisor, 'PATCH', `/api/equipment/${overdue}`, { kind: 'ammeter', tag: 'T-AM-1', calibratedOn: before.body.calibratedOn, intervalMonths: 12, version: saved.body.version })
    expect(again.status).toBe(200)
  })

  it('a reading taken with a meter out of calibration that day is flagged; the same meter on a day inside its interval is not', async () => {
    const wps = await approvedProcedure()
    const flagged = await send(inspector, 'POST', `/api/procedures/${wps}/readings`, { volts: 18, amps: 120, equipmentIds: [overdue, fresh] })
    expect(flagged.status).toBe(201)
    expect(flagged.body.calibrationFlag).toBe(true)
    expect(flagged.body.equipment.map((e: { equipmentId: number, flagged: boolean }) => [e.equipmentId, e.flagged])).toEqual([[overdue, true], [fresh, false]])
    const inside = dayjs().subtract(12, 'month').format('YYYY-MM-DD')
    const earlier = await send(inspector, 'POST', `/api/procedures/${wps}/readings`, { volts: 18, amps: 120, takenAt: `${inside}T10:00:00Z`, equipmentIds: [overdue] })
    expect(earlier.status).toBe(201)
    expect(earlier.body.calibrationFlag).toBe(false)
    const plain = await send(inspector, 'POST', `/api/procedures/${wps}/readings`, { volts: 18, amps: 120 })
    expect(plain.body.calibrationFlag).toBe(false)
    const unknown = await send(inspector, 'POST', `/api/procedures/${wps}/readings`, { volts: 18, equipmentIds: [999999] })
    expect(unknown.status).toBe(400)
    expect(unknown.body.data!.fieldErrors.equipmentIds).toBeDefined()
    const list = await send(supervisor, 'GET', `/api/procedures/${wps}/readings`)
    const row = list.body.items.find((r: { id: number }) => r.id === flagged.body.id)
    expect(row.calibrationFlag).toBe(true)
    expect(row.equipment.map((e: { tag: string }) => e.tag).sort()).toEqual(['T-AM-1', 'T-VM-1'])
    expect((await send(supervisor, 'GET', `/api/equipment/${overdue}`)).body.readings.length).toBe(2)
  })

  it('the due list names the overdue meter and not the fresh one; the weekly digest names it too', async () => {
    const due = await send(inspector, 'GET', '/api/equipment/due')
    const ids = due.body.map((d: { id: number }) => d.id)
    expect(ids).toContain(overdue)
    expect(ids).not.toContain(fresh)
    const run = await send(supervisor, 'POST', '/api/mail/run-reminders', {})
    expect(run.status).toBe(200)
    const mail = await send(supervisor, 'GET', '/api/mail?kind=weekly-digest&pageSize=5')
    expect(mail.body.items.length).toBeGreaterThan(0)
    expect(mail.body.items[0].text).toContain('T-AM-1')
    expect(mail.body.items[0].text).not.toContain('T-VM-1')
  })

  it('a calibration certificate attaches to the entry; an auditor cannot see it', async () => {
    const up = await upload(supervisor, { recordType: 'equipment', recordId: overdue, kind: 'calibration-certificate' }, { name: 'cert.pdf', type: 'application/pdf', bytes: samplePdf })
    expect(up.status).toBe(201)
    expect((await supervisor.fetch(`/api/attachments/${up.body.id}`)).status).toBe(200)
    expect((await auditor.fetch(`/api/attachments/${up.body.id}`)).status).toBe(404)
    const byWelder = await upload(welder, { recordType: 'equipment', recordId: overdue, kind: 'calibration-certificate' }, { name: 'cert.pdf', type: 'application/pdf', bytes: samplePdf })
    expect(byWelder.status).toBe(403)
  })
})

/** The first active welder current in at least one process today (read from the roster, not from the demo data). */
async function currentWelder() {
  const roster = await send(supervisor, 'GET', '/api/welders?pageSize=200&status=active')
  const found = roster.body.items.find((w: { standings: { standing: string }[] }) => w.standings.some(s => s.standing !== 'lapsed'))
  if (!found) throw new Error('no welder current in any process')
  return found.id as number
}

describe('welder ID card', () => {
  it('prints two credit-card pages (85.6 × 54 mm) with the stamp, each current process and the caution', async () => {
    const id = await currentWelder()
    const card = await send(supervisor, 'GET', `/api/welders/${id}/card?format=json`)
    expect(card.status).toBe(200)
    const page = await send(supervisor, 'GET', `/api/welders/${id}`)
    const current = page.body.standings.filter((s: { standing: string }) => s.standing !== 'lapsed').map((s: { process: string }) => s.process).sort()
    expect(current.length, 'a card with no process proves little').toBeGreaterThan(0)
    expect(card.body.lines.map((l: { process: string }) => l.process).sort()).toEqual(current)
    const res = await supervisor.fetch(`/api/welders/${id}/card`)
    expect(res.status).toBe(200)
    expect(res.headers.get('content-type')).toBe('application/pdf')
    const bytes = new Uint8Array(await res.arrayBuffer())
    const doc = await getDocument({ data: bytes.slice(), disableFontFace: true, verbosity: 0 }).promise
    expect(doc.numPages).toBe(2)
    const view = (await doc.getPage(1)).getViewport({ scale: 1 })
    // ISO/IEC 7810 ID-1: 85.6 × 54 mm = 242.65 × 153.07 pt (1 in = 25.4 mm = 72 pt)
    expect(view.width).toBeCloseTo((85.6 / 25.4) * 72, 1)
    expect(view.height).toBeCloseTo((54 / 25.4) * 72, 1)
    await doc.destroy()
    const [front, back] = await pdfPages(bytes)
    expect(squeeze(front!)).toContain(squeeze(page.body.welder.stamp))
    for (const p of current) expect(back).toContain(p)
    expect(squeeze(back!)).toContain(squeeze('the inspector have the final word'))
  })

  it('the public page answers only while on, under its token; a renewal revokes the old token', async () => {
    const on = await send(supervisor, 'POST', '/api/welders/1/card-page', { action: 'on' })
    expect(on.status).toBe(200)
    expect(on.body.token).toMatch(/^[\w-]{32}$/)
    const anyone = new Client(server.url)
    const seen = await anyone.json<Body>(`/api/cards/${on.body.token}`)
    expect(seen.status).toBe(200)
    // name, stamp, processes, positions, thickness, lapse dates: nothing else
    expect(Object.keys(seen.body).sort()).toEqual(['asOf', 'name', 'qualifications', 'stamp'])
    for (const q of seen.body.qualifications) expect(Object.keys(q).sort()).toEqual(['lapsesOn', 'positions', 'process', 'thickness'])
    const pdf = await pdfPages(new Uint8Array(await (await supervisor.fetch('/api/welders/1/card')).arrayBuffer()))
    expect(pdf[1]).toContain('Scan')
    const renewed = await send(supervisor, 'POST', '/api/welders/1/card-page', { action: 'renew' })
    expect(renewed.body.token).not.toBe(on.body.token)
    expect((await anyone.fetch(`/api/cards/${on.body.token}`)).status).toBe(404)
    expect((await anyone.fetch(`/api/cards/${renewed.body.token}`)).status).toBe(200)
    const off = await send(supervisor, 'POST', '/api/welders/1/card-page', { action: 'off' })
    expect(off.body).toEqual({ public: false, token: null })
    expect((await anyone.fetch(`/api/cards/${renewed.body.token}`)).status).toBe(404)
    expect((await send(supervisor, 'POST', '/api/welders/1/card-page', { action: 'maybe' })).status).toBe(400)
    expect((await send(supervisor, 'POST', '/api/welders/999999/card-page', { action: 'on' })).status).toBe(404)
  })

  it('a welder downloads their own card; the welder page does not hand out the token', async () => {
    const me = await send(welder, 'GET', '/api/me/qualifications')
    expect((await welder.fetch(`/api/welders/${me.body.welder.id}/card`)).status).toBe(200)
    const page = await send(auditor, 'GET', '/api/welders/1')
    if (page.status === 200) expect(page.body.welder.cardToken).toBeUndefined()
    expect((await send(supervisor, 'GET', '/api/welders/1')).body.welder.cardToken).toBeUndefined()
  })
})

describe('bringing records in', () => {
  const rosterCsv = (rows: string[]) => ['Stamp,Name,Employee no,E-mail', ...rows].join('\r\n')
  // 500 invented welders; line n of the file is welder n - 1
  const invented = Array.from({ length: 500 }, (_, i) => `IM-${String(i + 1).padStart(3, '0')},Imported Welder ${i + 1},E-${9000 + i},im${i + 1}@example.test`)

  it('a roster of 500 with two bad lines: the dry run names them, the commit stores nothing; fixed, all 500 go in', async () => {
    const bad = [...invented]
    bad[41] = 'IM-042,,E-9041,im42@example.test' // no name: line 43
    bad[299] = 'IM-300,Imported Welder 300,E-9299,not-an-address' // line 301
    const dry = await send(supervisor, 'POST', '/api/import/roster', { format: 'csv', content: rosterCsv(bad) })
    expect(dry.status).toBe(200)
    expect(dry.body.mapping).toEqual({ stamp: 'Stamp', name: 'Name', employeeNumber: 'Employee no', email: 'E-mail' })
    expect(dry.body.total).toBe(498)
    expect(dry.body.errors.map((e: { line: number, field: string }) => [e.line, e.field])).toEqual([[43, 'name'], [301, 'email']])
    expect(dry.body.stored).toBe(0)
    const before = (await send(supervisor, 'GET', '/api/welders?pageSize=1')).body.total
    const refused = await send(supervisor, 'POST', '/api/import/roster', { format: 'csv', content: rosterCsv(bad), commit: true })
    expect(refused.status).toBe(400)
    expect(refused.body.data?.rowErrors).toHaveLength(2)
    expect((await send(supervisor, 'GET', '/api/welders?pageSize=1')).body.total).toBe(before)
    const done = await send(supervisor, 'POST', '/api/import/roster', { format: 'csv', content: rosterCsv(invented), commit: true })
    expect(done.status).toBe(200)
    expect(done.body.stored).toBe(500)
    expect((await send(supervisor, 'GET', '/api/welders?pageSize=1')).body.total).toBe(before + 500)
    // the same file again: every stamp is on the roster now
    const again = await send(supervisor, 'POST', '/api/import/roster', { format: 'csv', content: rosterCsv(invented.slice(0, 3)) })
    expect(again.body.errors.map((e: { message: string }) => e.message)).toEqual(['Stamp IM-001 is already on the roster', 'Stamp IM-002 is already on the roster', 'Stamp IM-003 is already on the roster'])
  }, 120_000)

  it('an XLSX with the shop\'s own headers, mapped by hand; a mapping to a missing column is a line-1 error', async () => {
    const book = new ExcelJS.Workbook()
    const sheet = book.addWorksheet('Uses')
    sheet.addRow(['Welder symbol', 'Proc.', 'Day', 'Job'])
    sheet.addRow(['IM-001', 'SMAW', new Date(Date.UTC(2026, 0, 5)), 'J-1'])
    sheet.addRow(['IM-002', 'GTAW', '2026-01-06', 'J-2'])
    sheet.addRow(['ZZ-999', 'GTAW', '2026-01-06', 'J-3'])
    const content = Buffer.from(await book.xlsx.writeBuffer()).toString('base64')
    const mapping = { stamp: 'Welder symbol', process: 'Proc.', weldedOn: 'Day', reference: 'Job' }
    const dry = await send(inspector, 'POST', '/api/import/continuity', { format: 'xlsx', content, mapping })
    expect(dry.status).toBe(200)
    expect(dry.body.headers).toEqual(['Welder symbol', 'Proc.', 'Day', 'Job'])
    expect(dry.body.preview.map((r: { weldedOn: string }) => r.weldedOn)).toEqual(['2026-01-05', '2026-01-06'])
    expect(dry.body.errors).toEqual([{ line: 4, field: 'stamp', message: 'No welder with stamp ZZ-999 on the roster', column: 'Welder symbol', value: 'ZZ-999' }])
    const wrong = await send(inspector, 'POST', '/api/import/continuity', { format: 'xlsx', content, mapping: { ...mapping, reference: 'Nope' } })
    expect(wrong.body.errors[0]).toMatchObject({ line: 1, field: 'mapping' })
    const unread = await send(inspector, 'POST', '/api/import/continuity', { format: 'xlsx', content: Buffer.from('not a workbook').toString('base64') })
    expect(unread.status).toBe(400)
  })

  it('test history comes in as recorded, "imported", until an inspector confirms it; nothing is recomputed', async () => {
    const csv = [
      'Stamp,Process,Code,Edition,Test date,Positions,Thickness,Diameter,Certificate',
      'IM-010,smaw,ASME IX,2019,2025-03-04,"1G, 2G and 3G","1/16 to 3/4 in","2 7/8 in OD and over",C-77',
      'IM-010,GTAW,ISO 9606-1,2017,2025-13-01,PA PC,3-12 mm,,C-78',
      'IM-010,FCAW,Company standard,,2025-03-04,,,,C-79',
    ].join('\n')
    const dry = await send(supervisor, 'POST', '/api/import/tests', { format: 'csv', content: csv })
    expect(dry.body.errors.map((e: { line: number, field: string }) => [e.line, e.field])).toEqual([[3, 'testDate'], [4, 'code']])
    const ok = csv.split('\n').slice(0, 2).join('\n')
    const stored = await send(supervisor, 'POST', '/api/import/tests', { format: 'csv', content: ok, commit: true })
    expect(stored.body.stored).toBe(1)
    const roster = await send(supervisor, 'GET', '/api/welders?q=IM-010&pageSize=5')
    const id = roster.body.items.find((w: { stamp: string }) => w.stamp === 'IM-010').id
    const history = await send(inspector, 'GET', `/api/welders/${id}/imported-tests`)
    // the ranges exactly as the file states them
    expect(history.body).toEqual([expect.objectContaining({ process: 'SMAW', code: 'asme-ix', edition: '2019', positions: '1G, 2G and 3G', thickness: '1/16 to 3/4 in', diameter: '2 7/8 in OD and over', reference: 'C-77', state: 'imported', confirmedBy: null })])
    // not in the standings: nothing was recomputed from it
    expect((await send(supervisor, 'GET', `/api/welders/${id}`)).body.standings).toEqual([])
    expect((await send(supervisor, 'POST', `/api/imported-tests/${history.body[0].id}/confirm`)).status).toBe(403)
    const confirmed = await send(inspector, 'POST', `/api/imported-tests/${history.body[0].id}/confirm`)
    expect(confirmed.status).toBe(200)
    expect(confirmed.body.state).toBe('confirmed')
    expect((await send(inspector, 'POST', `/api/imported-tests/${history.body[0].id}/confirm`)).status).toBe(409)
    expect((await send(inspector, 'GET', `/api/welders/${id}/imported-tests`)).body[0].confirmedBy).toBeTruthy()
  })

  it('WPS and PQR registers come in by header, as recorded; a number already entered or imported is a row error', async () => {
    const wps = await supervisor.json<{ items: { number: string, revision: number }[] }>('/api/procedures?pageSize=1')
    const entered = wps.body.items[0]!
    const csv = [
      'WPS No,Rev,Title,Code,Edition,Process,Date,Status',
      `IMP-W-1,2,Old shop WPS,AWS D1.1,2015,FCAW,2018-04-02,approved`,
      `${entered.number},${entered.revision},Already here,ASME IX,2019,SMAW,,`,
      'IMP-W-1,2,Twice,AWS D1.1,2015,FCAW,,',
    ].join('\n')
    const dry = await send(inspector, 'POST', '/api/import/wps-headers', { format: 'csv', content: csv })
    expect(dry.body.mapping).toMatchObject({ number: 'WPS No', revision: 'Rev', code: 'Code', processes: 'Process', documentDate: 'Date' })
    expect(dry.body.errors.map((e: { line: number, message: string }) => [e.line, e.message])).toEqual([
      [3, `${entered.number} rev. ${entered.revision} is entered in Rootface already`], [4, 'IMP-W-1 rev. 2 is on line 2 too'],
    ])
    const ok = await send(inspector, 'POST', '/api/import/wps-headers', { format: 'csv', content: csv.split('\n').slice(0, 2).join('\n'), commit: true })
    expect(ok.body.stored).toBe(1)
    const list = await send(welder, 'GET', '/api/imported-documents?kind=wps')
    expect(list.status).toBe(403)
    const seen = await send(supervisor, 'GET', '/api/imported-documents?kind=wps')
    expect(seen.body).toEqual([expect.objectContaining({ number: 'IMP-W-1', revision: '2', code: 'aws-d1.1', edition: '2015', processes: 'FCAW', documentDate: '2018-04-02', status: 'approved' })])
    expect((await send(supervisor, 'GET', '/api/imported-documents?kind=pqr')).body).toEqual([])
  })

  it('only the quality manager imports a roster; a welder imports nothing; an unknown kind is 400', async () => {
    expect((await send(inspector, 'POST', '/api/import/roster', { format: 'csv', content: rosterCsv(['X-1,X']) })).status).toBe(403)
    expect((await send(welder, 'POST', '/api/import/continuity', { format: 'csv', content: 'a' })).status).toBe(403)
    expect((await send(supervisor, 'POST', '/api/import/nothing', { format: 'csv', content: 'a' })).status).toBe(400)
    expect((await send(supervisor, 'POST', '/api/import/roster', { format: 'ods', content: 'a' })).status).toBe(400)
  })
})
