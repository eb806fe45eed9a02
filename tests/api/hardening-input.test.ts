import { createHash } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'
import { samplePdf, upload } from './support/files'

// Issue 14, findings 7 and 9: the three inputs that gave a 500 are 400s with messages (a JSON body nested 400,000
// deep, a lone surrogate in a text field or an imported CSV, an impossible date); file names are kept as given and
// sent back encoded (RFC 6266, 4.3: filename* in RFC 8187 form); the CSP names default-src 'self'.
type Problem = { message?: string, data?: { formErrors: string[], fieldErrors: Record<string, string[]> } }
const raw = (body: string): RequestInit => ({ method: 'POST', headers: { 'content-type': 'application/json' }, body })

describe('bad input is a 400 with a message, never a 500', () => {
  let server: TestServer
  let supervisor: Client
  beforeAll(async () => {
    server = await startServer()
    supervisor = await signedIn(server.url, 'supervisor')
  })
  afterAll(async () => server?.stop())

  it('an array nested 400,000 deep', async () => {
    const res = await supervisor.json<Problem>('/api/customers', raw('['.repeat(400_000) + ']'.repeat(400_000)))
    expect(res.status).toBe(400)
    expect(res.body.message).toContain('nests deeper than 64 levels')
    // An ordinary body still works afterwards.
    expect((await supervisor.json('/api/customers', raw(JSON.stringify({ name: 'Deep Water Fabrication' })))).status).toBe(201)
  })

  it('a lone surrogate in a text field names the field', async () => {
    const res = await supervisor.json<Problem>('/api/customers', raw('{"name":"A\\ud800B"}'))
    expect(res.status).toBe(400)
    expect(res.body.data?.fieldErrors.name?.[0]).toContain('broken character')
    // A paired surrogate (an emoji) is a character and is stored.
    expect((await supervisor.json('/api/customers', raw('{"name":"Flame \\ud83d\\udd25 Works"}'))).status).toBe(201)
  })

  it('a lone surrogate in an imported CSV', async () => {
    const csv = 'stamp,process,date,reference\nKB-03,GMAW,2026-01-05,job \ud800 12\n'
    const res = await supervisor.json<Problem>('/api/continuity/import', raw(JSON.stringify({ csv, commit: true })))
    expect(res.status).toBe(400)
    expect(res.body.data?.fieldErrors.csv?.[0]).toContain('broken character')
  })

  it.each(['2026-13-45', '2026-02-30'])('an impossible date %s in a query', async (day) => {
    for (const path of [`/api/continuity?from=${day}`, `/api/continuity?to=${day}`]) {
      const res = await supervisor.json<Problem>(path)
      expect(res.status, path).toBe(400)
      expect(Object.values(res.body.data?.fieldErrors ?? {}).flat()[0]).toMatch(/calendar date/)
    }
    expect((await supervisor.fetch('/api/continuity?from=2026-02-28')).status).toBe(200)
  })
})

describe('file names kept as given; the content security policy', () => {
  let server: TestServer
  let supervisor: Client
  let pqrId: number
  beforeAll(async () => {
    server = await startServer()
    supervisor = await signedIn(server.url, 'supervisor')
    pqrId = (await supervisor.json<{ items: { id: number }[] }>('/api/pqrs?pageSize=1')).body.items[0]!.id
  })
  afterAll(async () => server?.stop())

  it.each([
    ['a=b.pdf', 'a%3Db.pdf'],
    ['a;b.pdf', 'a%3Bb.pdf'],
    ['Prüfbericht Nr. 7 ½.pdf', 'Pr%C3%BCfbericht%20Nr.%207%20%C2%BD.pdf'],
  ])('%s is stored under its own name and sent back encoded', async (name, encoded) => {
    const bytes = Buffer.concat([samplePdf, Buffer.from(`% ${name}\n`)])
    const res = await upload(supervisor, { recordType: 'pqr', recordId: pqrId, kind: 'other' }, { name, type: 'application/pdf', bytes })
    expect(res.status, JSON.stringify(res.body)).toBe(201)
    expect(res.body.fileName).toBe(name)
    const download = await supervisor.fetch(`/api/attachments/${res.body.id}`)
    expect(download.status).toBe(200)
    expect(download.headers.get('content-disposition')).toContain(`filename*=UTF-8''${encoded}`)
    expect(createHash('sha256').update(Buffer.from(await download.arrayBuffer())).digest('hex')).toBe(res.body.sha256)
  })

  it('pages carry a CSP with default-src \'self\' and no style or font from another origin', async () => {
    for (const path of ['/', '/sign-in']) {
      const res = await fetch(`${server.url}${path}`, { redirect: 'manual' })
      const csp = res.headers.get('content-security-policy') ?? ''
      expect(csp, path).toContain('default-src \'self\'')
      const style = /style-src ([^;]*)/.exec(csp)?.[1] ?? ''
      expect(style).toBe('\'self\' \'unsafe-inline\'')
      expect(/font-src ([^;]*)/.exec(csp)?.[1]).not.toContain('https:')
      expect(csp).not.toMatch(/https:(?!\/)/)
    }
  })
})
