import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { cardLines, cardPositions, cardThickness, type CardTest } from '../../../../shared/qualification/id-card'
import type { ProcessStanding } from '../../../../shared/qualification/process-standing'
import type { WelderRangesResult } from '../../../../shared/rules/results'

// The card repeats what the rules computed; these checks are about what it leaves out and never claims.
const standing = (process: string, state: ProcessStanding['standing'], lapsesOn = '2027-01-31'): ProcessStanding => ({
  process, code: 'asme-ix', edition: '2023', testDate: '2026-01-01', lastUse: '2026-07-01', lapsesOn, daysLeft: 30, standing: state, rule: '',
})
const ranges = (over: Partial<WelderRangesResult> = {}): WelderRangesResult => ({ positions: { groove: ['F', 'H', 'V', 'O'], fillet: ['F', 'H'] }, reasons: [], ...over })

describe('the welder ID card', () => {
  it('leaves a lapsed process off: the card shows what the welder may weld today (common practice)', () => {
    const tests: CardTest[] = [{ testDate: '2026-01-01', processes: ['SMAW', 'GTAW'], unit: 'in', ranges: ranges({ depositMax: 0.5 }) }]
    const lines = cardLines([standing('SMAW', 'current'), standing('GTAW', 'lapsed')], tests)
    expect(lines.map(l => l.process)).toEqual(['SMAW'])
    expect(lines[0]).toMatchObject({ positions: 'groove every position; fillet flat, horizontal', thickness: 'weld metal up to 0.5 in', lapsesOn: '2027-01-31' })
  })

  it('takes the latest certified test of the process, and its own deposit on a combination coupon (ASME IX QW-452.1(b) note, from memory)', () => {
    const older: CardTest = { testDate: '2024-01-01', processes: ['GTAW'], unit: 'mm', ranges: ranges({ depositMax: 4 }) }
    const newer: CardTest = { testDate: '2025-06-01', processes: ['GTAW', 'SMAW'], unit: 'mm', ranges: ranges({ depositMax: 20, deposits: [{ process: 'GTAW', depositMax: 6, clause: '' }, { process: 'SMAW', depositMax: null, clause: '' }] }) }
    const [gtaw, smaw] = cardLines([standing('GTAW', 'current'), standing('SMAW', 'lapsing')], [older, newer])
    expect(gtaw!.thickness).toBe('weld metal up to 6 mm')
    expect(smaw!.thickness).toBe('weld metal: no upper limit')
  })

  it('says "cannot tell" rather than a range when the rules could not compute one', () => {
    const [line] = cardLines([standing('FCAW', 'current')], [{ testDate: '2026-01-01', processes: ['FCAW'], unit: 'in', ranges: null }])
    expect(line).toMatchObject({ positions: 'cannot tell: check the test record', thickness: 'cannot tell: check the test record' })
    expect(cardLines([standing('SAW', 'current')], [])[0]!.thickness).toBe('cannot tell: check the test record')
    expect(cardThickness(ranges(), 'SMAW', 'in')).toBe('cannot tell: check the test record')
    expect(cardPositions(ranges({ positions: { groove: [], fillet: [] } }))).toBe('cannot tell: check the test record')
  })

  it('property: whatever the standings, no lapsed process is ever on the card', () => {
    const states = fc.constantFrom<ProcessStanding['standing']>('current', 'lapsing', 'lapsed')
    fc.assert(fc.property(fc.uniqueArray(fc.constantFrom('SMAW', 'GTAW', 'GMAW', 'FCAW', 'SAW'), { minLength: 1 }), fc.array(states, { minLength: 5, maxLength: 5 }), (processes, s) => {
      const list = processes.map((p, i) => standing(p, s[i]!))
      const shown = cardLines(list, [{ testDate: '2026-01-01', processes, unit: 'in', ranges: ranges({ depositMax: 1 }) }]).map(l => l.process)
      return list.every(x => (x.standing === 'lapsed') !== shown.includes(x.process))
    }))
  })
})
