import { describe, expect, it } from 'vitest'
import { judgeProcedures, judgeWelders, resolveJoint, type CandidateRow, type ResolvedJoint, type TestRow } from '../../../../shared/qualification/joint-coverage'
import { continuityChain } from '../../../../shared/qualification/process-standing'

// "Who can weld it?" for welders: each welder's certified tests against one joint, and where the process stands.
// Positions: ASME BPVC IX Table QW-461.9 (docs/sources.md §A3: 1G plate → F; 3G plate → F, V groove); P-No.: QW-423.1
// (§A6); lapse: QW-322.1(a) with the §A4 date convention; 14 ga = 0.0747 in (Manufacturers' Standard Gauge, §D).
// Conversions at 25.4 mm per inch exactly. All records here are invented for the test.
const joint: ResolvedJoint = { process: 'SMAW', unit: 'in', form: 'plate', weld: 'groove', position: 'V', thickness: 0.5, pNumber: '1', fNumber: 4, backing: true }
const test = (id: number, positions: string[], extra: Partial<TestRow> = {}): TestRow => ({
  id, test_date: '2026-01-10', code: 'asme-ix', edition: '2023', unit: 'in', process: 'SMAW', transfer: null, form: 'plate', weld: 'groove',
  coupon_thickness: 0.375, deposit_thickness: null, layers: null, outside_diameter: null, p_number: '1', f_number: '4', backing: true, positions, ...extra,
})
const chain = (lastUse: string) => continuityChain({ process: 'SMAW', code: 'asme-ix', edition: '2023', testDate: lastUse, uses: [] })
const welder = (id: number, tests: TestRow[], lastUse = '2026-05-01'): CandidateRow => ({ id, name: `Welder ${id}`, stamp: `T-${id}`, tests, chain: chain(lastUse) })

describe('judging welders for one joint', () => {
  it('covered by the one test that covers it, named alone; the 1G test is passed over', () => {
    const [w] = judgeWelders([welder(1, [test(11, ['1G']), test(12, ['3G'])])], joint, '2026-06-01')
    expect(w).toMatchObject({ id: 1, name: 'Welder 1', stamp: 'T-1', covered: true, answer: 'covered', current: true, testIds: [12], record: [] })
    expect(w!.standing).toMatchObject({ standing: 'current', lapsesOn: '2026-11-01' }) // 2026-05-01 + 6 months
    expect(w!.reasons.every(r => r.met) && w!.reasons.length > 0).toBe(true)
  })
  it('not covered: every test listed, the first one\'s findings shown', () => {
    const [w] = judgeWelders([welder(2, [test(21, ['1G']), test(22, ['2G'])])], joint, '2026-06-01')
    expect(w).toMatchObject({ covered: false, answer: 'not-covered', testIds: [21, 22] })
    expect(w!.reasons.find(r => r.clause === 'QW-461.9')).toMatchObject({ met: false, text: 'Groove V on plate: the test qualifies F; not V.' })
  })
  it('cannot tell wins over not covered, and names what to record', () => {
    const [w] = judgeWelders([welder(3, [test(31, ['1G']), test(32, ['3G'], { p_number: null })])], joint, '2026-06-01')
    expect(w).toMatchObject({ covered: false, answer: 'cannot-tell', record: ['test.pNumber'], testIds: [31, 32] })
  })
  it('a lapsed welder is shown as not current even when a test covers the joint', () => {
    const [w] = judgeWelders([welder(4, [test(41, ['3G'])], '2025-01-01')], joint, '2026-06-01')
    expect(w).toMatchObject({ covered: true, current: false })
    expect(w!.standing.standing).toBe('lapsed')
  })
  it('a test recorded in mm is judged with the joint converted: 12.7 mm = 1/2 in', () => {
    const mm = test(51, ['3G'], { unit: 'mm', coupon_thickness: 9.525 }) // 3/8 in: deposit up to 19.05 mm
    const [w] = judgeWelders([welder(5, [mm])], joint, '2026-06-01')
    expect(w!.covered).toBe(true)
    expect(w!.reasons.find(r => r.clause === 'QW-404.30, QW-452.1(b)')?.text).toBe('SMAW deposit 12.7 mm: qualified up to 19.05 mm.')
  })
  it('a stored test the rules refuse is "cannot tell", with the rule\'s words; identical coupons are judged once', () => {
    const odd = test(61, ['7G'])
    const [a, b] = judgeWelders([welder(6, [odd]), welder(7, [{ ...odd, id: 71 }])], joint, '2026-06-01')
    expect(a).toMatchObject({ covered: false, answer: 'cannot-tell', record: [] })
    expect(a!.reasons).toEqual([{ met: false, state: 'not-recorded', clause: 'rules', text: 'Cannot judge this test: testPositions: 7G is not a plate groove test position in QW-461.9 (1G, 2G, 3G, 4G)', basis: 'convention' }])
    expect(b!.reasons).toBe(a!.reasons) // the same verdict object: judged once
  })
})

describe('the joint and the WPSs', () => {
  it('a gauge becomes the sheet thickness, said in words', () => {
    expect(resolveJoint({ ...joint, thickness: undefined, gauge: 14 } as never)).toMatchObject({ thickness: 0.0747, gaugeNote: '14 ga sheet steel is 0.0747 in thick.' })
    expect(resolveJoint(joint as never)).toEqual(joint)
    expect(resolveJoint({ ...joint, gauge: 99 } as never)).toHaveProperty('error')
  })
  it('each approved WPS row is judged with its own stated ranges', () => {
    const row = { id: 9, number: 'W-9', revision: 2, title: 'Plate', code: 'asme-ix', edition: '2023', unit: 'in', process: 'SMAW', transfer: null, p_number_a: '1', p_number_b: '1', thickness_min: 0.1875, thickness_max: 1, diameter_min: null, positions: ['F', 'V'], f_numbers: ['4'] }
    const [p] = judgeProcedures([row, { ...row, id: 10, positions: ['F'] }], joint)
    expect(p).toMatchObject({ id: 9, number: 'W-9', revision: 2, title: 'Plate', code: 'asme-ix', edition: '2023', covered: true })
    expect(judgeProcedures([{ ...row, positions: ['F'] }], joint)[0]!.covered).toBe(false)
  })
})
