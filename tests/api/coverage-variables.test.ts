import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn, startServer, type Client, type TestServer } from './harness'

let server: TestServer
let inspector: Client

beforeAll(async () => {
  server = await startServer()
  inspector = await signedIn(server.url, 'inspector')
})
afterAll(async () => server?.stop())

interface Finding { met: boolean, clause: string, text: string, state?: string, variable?: string }
interface Welder { stamp: string, covered: boolean, answer: string, record: string[], reasons: Finding[], testIds: number[] }
interface Answer {
  procedures: { number: string, covered: boolean, reasons: Finding[] }[]
  welders: { able: Welder[], notCovered: Welder[], undecided: Welder[], undecidedCount: number }
}
const ask = (query: string) => inspector.json<Answer>(`/api/coverage?${query}`)

// The demo's welder tests are all ASME IX (2023); their SMAW tests made in 3G, 5G or 6G record uphill progression.
describe('who can weld it: the joint\'s code, several positions and the welder variables', () => {
  it('a joint welded F, V and O needs every position qualified (ASME BPVC IX-2023, Table QW-461.9)', async () => {
    // Every variable the demo's SMAW tests restrict is stated (P-No., F-No. with backing, progression): else "cannot tell".
    const stated = 'pNumber=1&fNumber=4&backing=true&progression=uphill'
    const res = await ask(`code=asme-ix&process=SMAW&unit=in&thickness=0.5&form=plate&weld=groove&positions=F,V,O&${stated}`)
    expect(res.status).toBe(200)
    expect(res.body.welders.able.length).toBeGreaterThan(0)
    for (const w of res.body.welders.able) {
      expect(w.answer).toBe('covered')
      expect(w.reasons).toContainEqual(expect.objectContaining({ clause: 'QW-461.9', met: true, text: expect.stringContaining('F, V, O') }))
    }
    // 3G alone (F, V on plate) does not reach overhead
    const single = await ask(`code=asme-ix&process=SMAW&unit=in&thickness=0.5&form=plate&weld=groove&positions=F,V&${stated}`)
    expect(single.body.welders.able.length).toBeGreaterThanOrEqual(res.body.welders.able.length)
  })

  it('a test to another code never covers the joint (AWS D1.1 joint, ASME IX tests)', async () => {
    const res = await ask('code=aws-d1.1&process=SMAW&unit=in&thickness=0.5&form=plate&weld=groove&position=F')
    expect(res.status).toBe(200)
    expect(res.body.welders.able).toEqual([])
    expect(res.body.procedures.filter(p => p.covered)).toEqual([])
    for (const w of res.body.welders.notCovered) expect(w.reasons).toContainEqual(expect.objectContaining({ variable: 'code', state: 'not-met' }))
  })

  it('a downhill vertical joint is not covered by uphill tests (ASME BPVC IX QW-405.3, from memory)', async () => {
    const res = await ask('code=asme-ix&process=SMAW&unit=in&thickness=0.5&form=plate&weld=groove&position=V&progression=downhill')
    expect(res.status).toBe(200)
    expect(res.body.welders.able).toEqual([])
    expect(res.body.welders.notCovered.some(w => w.reasons.some(r => r.clause === 'QW-405.3' && r.state === 'not-met'))).toBe(true)
  })

  it('GTAW variables the tests did not record are "not recorded": cannot tell, never covered (QW-409.4, from memory)', async () => {
    const res = await ask('code=asme-ix&process=GTAW&unit=in&form=pipe&outsideDiameter=4.5&thickness=0.2&weld=groove&position=F&current=DCEN')
    expect(res.status).toBe(200)
    expect(res.body.welders.able).toEqual([])
    expect(res.body.welders.undecidedCount).toBeGreaterThan(0)
    for (const w of res.body.welders.undecided) {
      expect([w.covered, w.answer]).toEqual([false, 'cannot-tell'])
      expect(w.record).toContain('test.current')
      expect(w.reasons).toContainEqual(expect.objectContaining({ clause: 'QW-409.4', state: 'not-recorded' }))
    }
  })

  it('bad positions, progression, code or GTAW values are 400 per field', async () => {
    const cases: [string, string][] = [
      ['process=SMAW&positions=F,X', 'positions'],
      ['process=SMAW&position=V&progression=sideways', 'progression'],
      ['process=SMAW&position=F&code=api-1104', 'code'],
      ['process=GTAW&position=F&current=DC', 'current'],
      ['process=GTAW&position=F&fillerForm=wire', 'fillerForm'],
    ]
    for (const [query, field] of cases) {
      const res = await inspector.json<{ data?: { fieldErrors: Record<string, string[]> } }>(`/api/coverage?${query}`)
      expect(res.status, query).toBe(400)
      expect(Object.keys(res.body.data?.fieldErrors ?? {}), query).toContain(field)
    }
  })
})
