import { describe, expect, it } from 'vitest'
import { fieldWords } from '../../../../shared/vocabulary/field-words'
import { ok } from '../rules/helpers'

// The words are the trade's (P-No. and F-No. as ASME BPVC IX, QW-420 and QW-430, write them); the rule texts must not
// print a request field's name. Issue 17: "every pNumber" on the welder's "cannot tell" line.
describe('field words: one vocabulary for the history and the rules', () => {
  it('writes trade abbreviations as the trade does and splits other names into words', () => {
    expect(fieldWords('pNumber')).toBe('P-No.') // ASME BPVC IX, QW-420 (common practice for the abbreviation)
    expect(fieldWords('fNumber')).toBe('F-No.') // ASME BPVC IX, QW-430
    expect(fieldWords('weldedOn')).toBe('welded on')
    expect(fieldWords('backing_gas')).toBe('backing gas')
    expect(fieldWords('backingGas')).toBe('backing gas')
    expect(fieldWords('outsideDiameter')).toBe('pipe OD')
  })
})

const camelCase = /\b[a-z]+[A-Z][A-Za-z]*\b/
const gtaw = { process: 'GTAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 0.375, depositThickness: 0.375 }

describe('cannot-tell sentences name what to record in trade words', () => {
  it('a test on P-No. 1 and F-No. 6 (ASME IX QW-423.1, QW-433: neither qualifies every P-No. or F-No.) asks for them by those words', () => {
    const answer = ok({ code: 'asme-ix', check: 'covers', unit: 'in', input: {
      test: { ...gtaw, pNumber: '1', fNumber: 6, backing: false },
      production: { process: 'GTAW', form: 'plate', weld: 'groove', position: 'F', thickness: 0.25 },
    } })
    const texts = answer.reasons as { variable?: string, state?: string, text: string }[]
    const pNo = texts.find(r => r.variable === 'p-number')
    expect(pNo?.state).toBe('not-recorded')
    expect(pNo?.text).toBe('The test was P-No. 1, which does not qualify every P-No.; production does not state its P-No.: cannot tell, record it.')
    const fNo = texts.find(r => r.variable === 'f-number')
    expect(fNo?.text).toBe('The test was F-No. 6, which does not qualify every F-No.; production does not state its F-No.: cannot tell, record it.')
    const unstated = texts.filter(r => r.state === 'not-recorded')
    expect(unstated.length).toBeGreaterThanOrEqual(2)
    for (const r of unstated) expect(r.text).not.toMatch(camelCase)
  })
  it('a production layer the test did not record asks for the test\'s value in words (QW-409.4 current, from memory)', () => {
    const answer = ok({ code: 'asme-ix', check: 'covers', unit: 'in', input: {
      test: { ...gtaw, pNumber: '1', fNumber: 6, backing: true },
      production: { process: 'GTAW', form: 'plate', weld: 'groove', position: 'F', thickness: 0.25, pNumber: '1', fNumber: 6, backing: true, current: 'DCEN', backingGas: true },
    } })
    const current = (answer.reasons as { variable?: string, text: string }[]).find(r => r.variable === 'current')
    expect(current?.text).toBe('Production is DCEN; the test did not record its current and polarity: cannot tell, record it.')
  })
})
