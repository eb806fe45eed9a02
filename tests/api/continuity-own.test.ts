import { mkdtempSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { removeDir, signedIn, startServer, type TestServer } from './harness'
import { openDatabase } from '../../server/database/client'
import { shopSettings } from '../../server/database/schema'

// A shop that lets welders log their own continuity: seed, stop, flip the setting, start again on the same data.
let server: TestServer
const dir = mkdtempSync(join(tmpdir(), 'rootface-own-continuity-'))

beforeAll(async () => {
  const first = await startServer({ dataDir: dir })
  await first.stop()
  const database = await openDatabase({ dataDir: join(dir, 'db') })
  await database.db.update(shopSettings).set({ welderLogsOwnContinuity: true })
  await database.close()
  server = await startServer({ dataDir: dir })
})
afterAll(async () => {
  await server?.stop()
  removeDir(dir)
})

describe('welders logging their own continuity (shop setting on)', () => {
  it('a welder logs their own use, but another welder\'s is a 404 and bulk or import stays with staff', async () => {
    const welder = await signedIn(server.url, 'welder')
    const me = await welder.json<{ welder: { id: number }, logsOwnContinuity: boolean }>('/api/me/qualifications')
    expect(me.body.logsOwnContinuity).toBe(true)
    const own = me.body.welder.id
    const yesterday = new Date(Date.now() - 86_400_000).toISOString().slice(0, 10)
    const post = (path: string, body: unknown) => welder.json(path, { method: 'POST', body: JSON.stringify(body), headers: { 'content-type': 'application/json' } })
    expect((await post('/api/continuity', { welderId: own, process: 'GMAW', weldedOn: yesterday, reference: 'own log' })).status).toBe(201)
    expect((await post('/api/continuity', { welderId: own === 1 ? 2 : 1, process: 'GMAW', weldedOn: yesterday, reference: 'not mine' })).status).toBe(404)
    expect((await post('/api/continuity/bulk', { welderIds: [own], process: 'GMAW', weldedOn: yesterday, reference: 'x' })).status).toBe(403)
    const log = await welder.json<{ items: { reference: string }[] }>('/api/continuity?q=own%20log')
    expect(log.body.items.map(e => e.reference)).toEqual(['own log'])
  })
})
