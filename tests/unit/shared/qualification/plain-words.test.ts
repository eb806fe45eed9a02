import { describe, expect, it } from 'vitest'
import { positionsInWords, rangesInWords } from '../../../../shared/qualification/plain-words'
import { qualifiedRangesOf } from '../../../../shared/qualification/test-ranges'
import type { WelderRangesResult } from '../../../../shared/rules/results'

describe('ranges in plain words', () => {
  it('names positions in words', () => {
    expect(positionsInWords(['F', 'V'])).toBe('flat, vertical')
    expect(positionsInWords(['F', 'H', 'V', 'O'])).toBe('every position')
  })

  it('describes a 3G plate groove test in mm: F and V on plate, 2t deposit (ASME BPVC IX-2023, Tables QW-461.9 and QW-452.1(b))', () => {
    const ranges = qualifiedRangesOf({ code: 'asme-ix', edition: '2023', unit: 'mm', process: 'SMAW', form: 'plate', weld: 'groove', couponThickness: 10, depositThickness: 10, layers: 3, pNumber: '1', fNumber: '4', backing: true, positions: ['3G'] })
    const lines = rangesInWords(ranges as unknown as WelderRangesResult, 'mm')
    expect(lines).toContain('Groove welds on plate (and pipe over 610 mm OD): flat, vertical.')
    expect(lines).toContain('Weld metal up to 20 mm thick.')
    // QW-433: F-No. 4 with backing qualifies F-No. 1 to 4 with backing (from memory, as the rule module marks it)
    expect(lines).toContain('Filler F-No. 1, 2, 3, 4, with backing only.')
  })
})
