import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { prequalifiedCheck, type PrequalifiedInput } from '../../../../../shared/rules/aws-d1.1/prequalified'

// A FCAW T-joint on A36 to A572 Gr 50 plate up to 1 in, written for these tests (not the demo's WPS).
const base = (): PrequalifiedInput => ({
  layers: [{ process: 'FCAW', transfer: null, fillers: [{ classification: 'E71T-1C', size: 0.045 }] }],
  baseMetals: [{ specification: 'ASTM A36', grade: null }, { specification: 'A572', grade: 'Grade 50' }],
  thickness: { min: 0.25, max: 1 },
  preheatMin: 50,
  positions: ['F', 'H', 'V'],
  joint: { designation: 'TC-U4a-GF', rootOpening: { min: 0.1875, max: 0.25 }, grooveAngle: 30, rootFace: { min: null, max: null } },
})
const run = (input: PrequalifiedInput, edition = '2020', unit: 'in' | 'mm' = 'in') => prequalifiedCheck(input, { edition, unit })
const item = (r: ReturnType<typeof run>, limit: string) => r.items.filter(i => i.limit === limit)

describe('AWS D1.1 prequalified WPS: the edition names its clause and tables', () => {
  it('2020 is clause 5 with Tables 5.3, 5.4, 5.8 and Figure 5.1 (D1.1:2020 Figure 5.1 read; table numbers named on public study pages)', () => {
    const r = run(base())
    expect(r.clause).toBe('clause 5')
    expect(item(r, 'base metal')[0]!.table).toBe('Table 5.3')
    expect(item(r, 'filler')[0]!.table).toBe('Table 5.4')
    expect(item(r, 'preheat')[0]!.table).toBe('Table 5.8')
    expect(item(r, 'joint')[0]!.table).toBe('Figure 5.1')
  })
  it('2015 is clause 3 with Tables 3.1, 3.2, 3.3 and Figure 3.3 for CJP (D1.1:2015 Tables 3.1 and 3.3 and the legend of Figures 3.2/3.3 read)', () => {
    const r = run(base(), '2015')
    expect(r.clause).toBe('clause 3')
    expect(item(r, 'base metal')[0]!.table).toBe('Table 3.1')
    expect(item(r, 'preheat')[0]!.table).toBe('Table 3.3')
    expect(item(r, 'joint')[0]!.table).toBe('Figure 3.3')
  })
})

describe('processes (D1.1:2000 3.2.1, read: SMAW, SAW, GMAW except GMAW-S, FCAW)', () => {
  it('GMAW short-circuit and GTAW fail; spray GMAW passes', () => {
    const gmawS = run({ ...base(), layers: [{ process: 'GMAW', transfer: 'short-circuit', fillers: [{ classification: 'ER70S-6', size: 0.035 }] }] })
    expect(item(gmawS, 'process')[0]!.state).toBe('fail')
    const gtaw = run({ ...base(), layers: [{ process: 'GTAW', fillers: [{ classification: 'ER70S-2', size: 0.094 }] }] })
    expect(item(gtaw, 'process')[0]!.state).toBe('fail')
    const spray = run({ ...base(), layers: [{ process: 'GMAW', transfer: 'spray', fillers: [{ classification: 'ER70S-6', size: 0.045 }] }] })
    expect(item(spray, 'process')[0]!.state).toBe('pass')
  })
})

describe('base metal groups (D1.1:2015 Table 3.1, read on pdfcoffee)', () => {
  it('A36 is Group I up to 3/4 in and Group II over it (Table 3.1: "ASTM A36 (≤3/4 in [20 mm])" in Group I, "(>3/4 in)" in Group II)', () => {
    const thin = run({ ...base(), baseMetals: [{ specification: 'SA-36', grade: '—' }, { specification: 'A36', grade: null }], thickness: { min: 0.25, max: 0.75 } })
    expect(item(thin, 'base metal')[0]!.text).toContain('Group I ')
    const thick = run({ ...base(), baseMetals: [{ specification: 'A36', grade: null }, { specification: 'A36', grade: null }], thickness: { min: 0.25, max: 1 } })
    expect(item(thick, 'base metal')[0]!.text).toContain('Group II')
  })
  it('a steel not carried is "not carried: check by hand", never a pass (house rule)', () => {
    const r = run({ ...base(), baseMetals: [{ specification: 'A514', grade: null }, { specification: 'A36', grade: null }] })
    expect(item(r, 'base metal')[0]).toMatchObject({ state: 'by-hand' })
    expect(item(r, 'base metal')[0]!.text).toContain('not carried')
  })
})

describe('matching filler (Table 3.2 in 2015 / 5.4 in 2020; from memory)', () => {
  it('E6010 SMAW does not match Group II and says what does (from memory: Group II SMAW is low-hydrogen E70XX)', () => {
    const r = run({ ...base(), layers: [{ process: 'SMAW', fillers: [{ classification: 'E6010', size: 0.125 }] }] })
    const filler = item(r, 'filler')[0]!
    expect(filler.state).toBe('fail')
    expect(filler.required).toContain('E7018')
  })
  it('E7018 matches Group II (from memory)', () => {
    const r = run({ ...base(), layers: [{ process: 'SMAW', fillers: [{ classification: 'E7018', size: 0.125 }] }] })
    expect(item(r, 'filler')[0]!.state).toBe('pass')
  })
  it('an unknown classification is by hand, not a pass or a fail', () => {
    const r = run({ ...base(), layers: [{ process: 'FCAW', fillers: [{ classification: 'XYZ-1', size: 0.045 }] }] })
    expect(item(r, 'filler')[0]!.state).toBe('by-hand')
  })
})

describe('minimum preheat and interpass (D1.1:2015 Table 3.3, read on scribd 338026693 and pdfcoffee)', () => {
  it('category B, over 3/4 thru 1-1/2 in: 50 °F (Table 3.3); 40 °F fails and names the 50 °F required', () => {
    const r = run({ ...base(), preheatMin: 40 }, '2015')
    const p = item(r, 'preheat')[0]!
    expect(p.state).toBe('fail')
    expect(p.required).toBe('50 °F or more')
  })
  it('category B, 1/8 to 3/4 in incl.: 32 °F (Table 3.3)', () => {
    const r = run({ ...base(), preheatMin: 32, thickness: { min: 0.25, max: 0.75 } }, '2015')
    expect(item(r, 'preheat')[0]).toMatchObject({ state: 'pass' })
  })
  it('category B, over 1-1/2 thru 2-1/2 in: 150 °F; over 2-1/2 in: 225 °F (Table 3.3)', () => {
    expect(item(run({ ...base(), preheatMin: 149, thickness: { min: 0.25, max: 2 } }, '2015'), 'preheat')[0]!.required).toBe('150 °F or more')
    expect(item(run({ ...base(), preheatMin: 224, thickness: { min: 0.25, max: 3 } }, '2015'), 'preheat')[0]!.required).toBe('225 °F or more')
  })
  it('category A (SMAW with other than low-hydrogen electrodes) on A36, over 3/4 thru 1-1/2 in: 150 °F (Table 3.3)', () => {
    const r = run({ ...base(), baseMetals: [{ specification: 'A36', grade: null }, { specification: 'A36', grade: null }], layers: [{ process: 'SMAW', fillers: [{ classification: 'E6010', size: 0.125 }] }], preheatMin: 100 }, '2015')
    expect(item(r, 'preheat')[0]!.required).toBe('150 °F or more')
  })
  it('millimetres: category B over 20 thru 38 mm incl. is 10 °C (Table 3.3 SI column)', () => {
    const r = run({ ...base(), thickness: { min: 6, max: 25 }, preheatMin: 5, layers: [{ process: 'FCAW', fillers: [{ classification: 'E71T-1C', size: 1.2 }] }], joint: { designation: 'TC-U4a-GF', rootOpening: { min: 5, max: 6 }, grooveAngle: 30, rootFace: {} } }, '2015', 'mm')
    expect(item(r, 'preheat')[0]!.required).toBe('10 °C or more')
  })
  it('the boundary 3/4 in belongs to the lower band ("1/8 to 3/4 incl.", Table 3.3)', () => {
    expect(item(run({ ...base(), preheatMin: 32, thickness: { min: 0.25, max: 0.75 } }), 'preheat')[0]!.state).toBe('pass')
    expect(item(run({ ...base(), preheatMin: 32, thickness: { min: 0.25, max: 0.76 } }), 'preheat')[0]!.state).toBe('fail')
  })
})

describe('joint details (D1.1:2020 Figure 5.1, TC-U4a-GF rows read: R 3/16 α 30° all positions; fit-up R +1/4 −1/16, α +10° −5°)', () => {
  it('R 3/16 to 1/4 in at 30° passes; at 20° it fails and lists the preparations', () => {
    expect(item(run(base()), 'joint')[0]!.state).toBe('pass')
    const r = run({ ...base(), joint: { ...base().joint, grooveAngle: 20 } })
    expect(item(r, 'joint')[0]).toMatchObject({ state: 'fail' })
    expect(item(r, 'joint')[0]!.required).toContain('α 30°')
  })
  it('root opening over R + 1/4 in fails (3/16 + 1/4 = 7/16 in is the most for the 3/16 row; the 3/8 row is F only)', () => {
    const r = run({ ...base(), joint: { ...base().joint, rootOpening: { min: 0.25, max: 0.5 } } })
    expect(item(r, 'joint')[0]!.state).toBe('fail')
  })
  it('an SMAW-only detail used with FCAW passes by note e; a -GF detail with SMAW fails (legend note e read)', () => {
    const smawDetail = run({ ...base(), joint: { ...base().joint, designation: 'TC-U4a', rootOpening: { min: 0.25, max: 0.25 }, grooveAngle: 45 } })
    expect(item(smawDetail, 'joint').every(i => i.state === 'pass')).toBe(true)
    const wrong = run({ ...base(), layers: [{ process: 'SMAW', fillers: [{ classification: 'E7018', size: 0.125 }] }] })
    expect(item(wrong, 'joint')[0]!.state).toBe('fail')
  })
  it('no designation, or one not carried, is by hand', () => {
    expect(item(run({ ...base(), joint: { ...base().joint, designation: null } }), 'joint')[0]!.state).toBe('by-hand')
    expect(item(run({ ...base(), joint: { ...base().joint, designation: 'B-U3a' } }), 'joint')[0]!.state).toBe('by-hand')
  })
})

describe('the whole check', () => {
  it('the FCAW T-joint has no failures, and the limits not carried stay by hand (never passed)', () => {
    const r = run(base())
    expect(r.failures).toBe(0)
    expect(r.noFailures).toBe(true)
    expect(r.byHand).toBeGreaterThan(0)
    expect(r.items.filter(i => i.limit === 'other').every(i => i.state === 'by-hand')).toBe(true)
    expect(r.caution).toContain('final word')
  })

  // One essential variable made unqualified never leaves the check without a failure. The detail allows 30° −5°/+10° and
  // 45° −5°/+10° (Figure 5.1 fit-up, read), so an angle under 25° or over 55° fits neither.
  it('property: an unqualified process, filler, preheat, groove angle or electrode size always fails', () => {
    const breakers: ((i: PrequalifiedInput, n: number) => PrequalifiedInput)[] = [
      (i, n) => ({ ...i, layers: [{ ...i.layers[0]!, process: ['GTAW', 'ESW', 'EGW', 'PAW'][n % 4]! }] }),
      i => ({ ...i, layers: [{ process: 'GMAW', transfer: 'short-circuit', fillers: [{ classification: 'ER70S-6', size: 0.035 }] }] }),
      (i, n) => ({ ...i, preheatMin: 49 - (n % 80) }),
      (i, n) => ({ ...i, joint: { ...i.joint, grooveAngle: n % 2 ? 24 - (n % 20) : 56 + (n % 40) } }),
      (i, n) => ({ ...i, layers: [{ ...i.layers[0]!, fillers: [{ classification: 'E71T-1C', size: 0.079 + (n % 50) / 100 }] }] }),
      i => ({ ...i, layers: [{ process: 'SMAW', fillers: [{ classification: 'E6013', size: 0.125 }] }], joint: { ...i.joint, designation: 'TC-U4a', rootOpening: { min: 0.25, max: 0.25 }, grooveAngle: 45 } }),
    ]
    fc.assert(fc.property(fc.integer({ min: 0, max: breakers.length - 1 }), fc.nat(1000), fc.constantFrom('2015', '2020', '2025'), (which, n, edition) => {
      const r = run(breakers[which]!(base(), n), edition)
      return r.failures > 0 && !r.noFailures
    }))
  })
})
