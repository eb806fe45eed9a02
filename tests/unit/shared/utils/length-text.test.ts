import { createRequire } from 'node:module'
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { readLength } from '../../../../shared/utils/length-text'

type Convert = (value: number) => { from: (unit: string) => { to: (unit: string) => number } }
const convert = createRequire(import.meta.url)('convert-units') as Convert

// Fractions and mixed numbers as the trade writes lengths (3/8 in plate, 1-1/2 in pipe): common practice.
describe('reading a typed length', () => {
  it.each([
    ['3/8', 0.375], ['1-1/2', 1.5], ['1 1/2', 1.5], ['0.375', 0.375], ['.375', 0.375], ['3/16"', 0.1875], ['1/4 in', 0.25],
    ['2-7/8', 2.875], ['10', 10],
  ])('reads "%s" in an inch field as %s in', (text, value) => {
    expect(readLength(text, 'in')).toEqual({ kind: 'length', value })
  })

  it('reads a decimal comma as a millimetre field is often written (9,5 mm)', () => {
    expect(readLength('9,5', 'mm')).toEqual({ kind: 'length', value: 9.5 })
    expect(readLength('9.5 mm', 'mm')).toEqual({ kind: 'length', value: 9.5 })
  })

  it('does not take "3/8" as 38 or "2 mm" as 2 in: the other unit is named and converted for the form to ask', () => {
    expect(readLength('3/8', 'in')).not.toEqual({ kind: 'length', value: 38 })
    const mm = readLength('2 mm', 'in')
    expect(mm.kind).toBe('other-unit')
    // 2 mm = 0.0787 in (1 in = 25.4 mm exactly, NIST SP 811 B.8), cross-checked with convert-units
    expect(mm).toEqual({ kind: 'other-unit', typed: 2, typedUnit: 'mm', value: Number(convert(2).from('mm').to('in').toFixed(4)) })
    expect(convert(0.375).from('in').to('mm')).toBeCloseTo(9.525, 5)
    expect(readLength('3/8 in', 'mm')).toMatchObject({ value: 9.53 })
  })

  it('refuses what is not a length, with the forms it accepts', () => {
    for (const text of ['abc', '3/0', '1-', '3//8', '--1', '1/2/3', '0x10']) {
      const reading = readLength(text, 'in')
      expect(reading.kind, text).toBe('unreadable')
    }
    expect(readLength('  ', 'in')).toEqual({ kind: 'empty' })
  })

  it('reads every mixed number w-n/d as w + n/d (property)', () => {
    fc.assert(fc.property(fc.integer({ min: 0, max: 99 }), fc.integer({ min: 1, max: 63 }), fc.constantFrom(2, 4, 8, 16, 32, 64), (w, n, d) => {
      const reading = readLength(`${w}-${n}/${d}`, 'in')
      expect(reading).toEqual({ kind: 'length', value: w + n / d })
    }))
  })
})
