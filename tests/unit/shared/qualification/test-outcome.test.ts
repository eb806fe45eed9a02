import { describe, expect, it } from 'vitest'
import { testOutcome, type TestRecord } from '../../../../shared/qualification/test-outcome'

const plate = (extra: Partial<TestRecord> = {}): TestRecord => ({
  code: 'asme-ix', edition: '2023', unit: 'mm', process: 'SMAW', transfer: null, form: 'plate', weld: 'groove',
  couponThickness: 10, depositThickness: 10, layers: 3, outsideDiameter: null, pNumber: '1', fNumber: '4', backing: true,
  positions: ['3G'], visualAccepted: true, visualNotes: null, examination: 'bend', bends: [], radiography: null, macro: null, ...extra,
})

describe('welder test outcome', () => {
  it('is pending until the visual examination is recorded, and fails on a rejected visual (ASME BPVC IX-2023, QW-302.4)', () => {
    expect(testOutcome(plate({ visualAccepted: null })).outcome).toBe('pending')
    const rejected = testOutcome(plate({ visualAccepted: false, visualNotes: 'undercut' }))
    expect(rejected.outcome).toBe('failed')
    expect(rejected.steps.map(s => s.step)).toEqual(['visual'])
  })

  it('fails when one bend shows an open discontinuity over 3 mm (ASME BPVC IX-2023, QW-163, SI value)', () => {
    const result = testOutcome(plate({ bends: [{ type: 'face', largestIndication: 2 }, { type: 'root', largestIndication: 4 }] }))
    expect(result.outcome).toBe('failed')
    expect(result.bend?.specimens.map(s => s.accepted)).toEqual([true, false])
  })

  it('passes at exactly 3 mm ("shall not exceed", ASME BPVC IX-2023, QW-163)', () => {
    expect(testOutcome(plate({ bends: [{ type: 'face', largestIndication: 3 }, { type: 'root', largestIndication: 0 }] })).outcome).toBe('passed')
  })

  it('stays pending with fewer specimens than required: 10 mm weld metal needs 2 bends (ASME BPVC IX-2023, Table QW-452.1(a))', () => {
    const one = testOutcome(plate({ bends: [{ type: 'side', largestIndication: 0 }] }))
    expect(one.outcome).toBe('pending')
    expect(one.ranges?.bendSpecimens?.total).toBe(2)
  })

  it('ignores a corner indication with no sign of an internal discontinuity (ASME BPVC IX-2023, QW-163)', () => {
    expect(testOutcome(plate({ bends: [{ type: 'side', largestIndication: 5, atCorner: true }, { type: 'side', largestIndication: 0 }] })).outcome).toBe('passed')
  })

  it('judges radiography by the rules: any crack rejects (ASME BPVC IX-2023, QW-191.1.2.2(b)(1))', () => {
    const rt = (indications: { kind: string, length: number }[]) => testOutcome(plate({ examination: 'radiography', radiography: { indications } }))
    expect(rt([{ kind: 'crack', length: 0.5 }]).outcome).toBe('failed')
    expect(rt([]).outcome).toBe('passed')
  })

  it('does not judge short-circuit GMAW by radiography: bends are required (ASME BPVC IX-2023, QW-304)', () => {
    const result = testOutcome(plate({ process: 'GMAW', transfer: 'short-circuit', fNumber: '6', examination: 'radiography', radiography: { indications: [] } }))
    expect(result.outcome).toBe('pending')
    expect(result.steps.at(-1)?.clause).toBe('QW-304')
  })

  it('a fillet test follows the inspector\'s macro or fracture judgement (common practice: QW-181/QW-184 have no arithmetic here)', () => {
    const fillet = (macro: TestRecord['macro']) => testOutcome(plate({ weld: 'fillet', positions: ['2F'], examination: 'macro-fracture', macro }))
    expect(fillet(null).outcome).toBe('pending')
    expect(fillet({ accepted: true }).outcome).toBe('passed')
    expect(fillet({ accepted: false, notes: 'lack of root fusion' }).outcome).toBe('failed')
  })
})
