import dayjs from 'dayjs'
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { checkJoint, refusalLines, type AssignedProcedure, type Assignment, type RegisterJoint } from '../../../../shared/qualification/joint-check'
import type { CandidateRow, ProcedureRow, TestRow } from '../../../../shared/qualification/joint-coverage'

// An invented SMAW plate WPS and a welder's 3G + 4G side-bend plate test with backing (not demo data).
const row: ProcedureRow = {
  id: 1, number: 'T-1', revision: 0, title: 'SMAW plate', code: 'asme-ix', edition: '2023', unit: 'in', process: 'SMAW', transfer: null,
  p_number_a: '1', p_number_b: '1', thickness_min: 0.1875, thickness_max: 1.5, diameter_min: null, positions: ['F', 'H', 'V', 'O'], f_numbers: ['4'],
}
const wps: AssignedProcedure = { id: 1, number: 'T-1', revision: 0, status: 'approved', code: 'asme-ix', processes: ['SMAW'], rows: [row] }
const test: TestRow = {
  id: 9, test_date: '2026-01-10', code: 'asme-ix', edition: '2023', unit: 'in', process: 'SMAW', transfer: null, form: 'plate', weld: 'groove',
  coupon_thickness: 0.75, deposit_thickness: 0.75, layers: null, outside_diameter: null, p_number: '1', f_number: '4', backing: true, positions: ['3G', '4G'],
  progression: 'uphill',
}
const chainOf = (lastUse: string) => ({ process: 'SMAW', code: 'asme-ix' as const, edition: '2023', testDate: '2026-01-10', lastUse, lapsesOn: dayjs(lastUse).add(6, 'month').format('YYYY-MM-DD'), rule: 'QW-322.1(a)' })
const candidate = (lastUse = '2026-01-10'): CandidateRow => ({ id: 5, name: 'T. Welder', stamp: 'T-05', tests: [test], chain: chainOf(lastUse) })
const joint: RegisterJoint = { unit: 'in', weld: 'groove', pNumberA: '1', pNumberB: '1', thickness: 0.5, outsideDiameter: null, positions: ['F', 'V'], progression: 'uphill', backing: true }
const crew = (c: CandidateRow | null = candidate()): Assignment[] => [{ welderId: 5, stamp: 'T-05', active: true, process: 'SMAW', layer: 'all', fNumber: 4, candidate: c }]

describe('the check of a production joint', () => {
  it('passes a joint inside the WPS and the welder\'s test while the welder is current (ASME BPVC IX-2023, QW-451.1, QW-452.1(b), QW-461.9, QW-322.1(a))', () => {
    const result = checkJoint({ joint, procedure: wps, assignments: crew(), on: '2026-03-01' })
    expect(result.refusals).toEqual([])
    expect(result.ok).toBe(true)
  })

  it('refuses a welder not current on the weld date: six months after the last use (QW-322.1(a)), dates cross-checked with dayjs', () => {
    const lapse = dayjs('2026-01-10').add(6, 'month').format('YYYY-MM-DD')
    const result = checkJoint({ joint, procedure: wps, assignments: crew(), on: lapse })
    expect(result.ok).toBe(false)
    expect(result.refusals[0]).toMatchObject({ subject: 'welder', answer: 'lapsed', stamp: 'T-05' })
    const dayBefore = dayjs(lapse).subtract(1, 'day').format('YYYY-MM-DD')
    expect(checkJoint({ joint, procedure: wps, assignments: crew(), on: dayBefore }).ok).toBe(true)
  })

  it('refuses with reasons: no WPS, a draft WPS, a WPS without the process, a welder without a test', () => {
    expect(checkJoint({ joint, procedure: null, assignments: crew(), on: '2026-03-01' }).refusals[0]!.answer).toBe('missing')
    expect(checkJoint({ joint, procedure: { ...wps, status: 'draft' }, assignments: crew(), on: '2026-03-01' }).ok).toBe(false)
    const gtaw = checkJoint({ joint, procedure: wps, assignments: [{ ...crew()[0]!, process: 'GTAW', candidate: null }], on: '2026-03-01' })
    expect(gtaw.refusals.map(r => r.subject).sort()).toEqual(['welder', 'wps'])
    expect(refusalLines(gtaw.refusals).join(' ')).toContain('no GTAW layer')
    expect(checkJoint({ joint, procedure: wps, assignments: [], on: '2026-03-01' }).ok).toBe(false)
  })

  it('"cannot tell" is a refusal: a joint without its thickness against a WPS that limits it (never a false yes)', () => {
    const result = checkJoint({ joint: { ...joint, thickness: null }, procedure: wps, assignments: crew(), on: '2026-03-01' })
    expect(result.ok).toBe(false)
    expect(result.refusals.some(r => r.answer === 'cannot-tell')).toBe(true)
  })

  it('judges both base metals of a dissimilar joint: P-No. 8 on side B is outside a P-No. 1 WPS (QW-403.11)', () => {
    const result = checkJoint({ joint: { ...joint, pNumberB: '8' }, procedure: wps, assignments: crew(), on: '2026-03-01' })
    expect(result.ok).toBe(false)
    expect(result.refusals.find(r => r.subject === 'wps')!.reasons.map(r => r.clause)).toContain('QW-403.11, QW-424')
  })

  it('property: one essential variable set outside the WPS or the test never leaves "yes"', () => {
    const outside = fc.oneof(
      fc.double({ min: 1.51, max: 5, noNaN: true }).map(t => ({ joint: { ...joint, thickness: t } })), // WPS max 1.5 in (stated range)
      fc.double({ min: 0.01, max: 0.18, noNaN: true }).map(t => ({ joint: { ...joint, thickness: t } })), // WPS min 3/16 in
      fc.constantFrom('3', '4', '8', '43').map(p => ({ joint: { ...joint, pNumberA: p } })), // WPS lists P-No. 1 only
      fc.constantFrom(1, 2, 3, 5, 6).map(f => ({ fNumber: f })), // WPS and test: F-No. 4 (QW-404.4, QW-433)
      fc.constant({ joint: { ...joint, backing: false } }), // test with backing does not qualify without (QW-402.4)
      fc.constant({ status: 'superseded' }),
    )
    fc.assert(fc.property(outside, (change) => {
      const j = 'joint' in change ? change.joint : joint
      const assignments = 'fNumber' in change ? [{ ...crew()[0]!, fNumber: change.fNumber }] : crew()
      const procedure = 'status' in change ? { ...wps, status: change.status } : wps
      return !checkJoint({ joint: j, procedure, assignments, on: '2026-03-01' }).ok
    }), { numRuns: 150 })
  })
})
