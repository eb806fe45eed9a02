import { createRequire } from 'node:module'
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { convertLength, formatLength, fromMicro, inchFraction, printed, toMicro } from '../../../../shared/rules/units'

type Convert = (value: number) => { from: (unit: string) => { to: (unit: string) => number } }
const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b)
const convert = createRequire(import.meta.url)('convert-units') as Convert

// Table boundaries printed in ASME BPVC IX Tables QW-451.1, QW-452.1, QW-452.3 and QW-461.9.
const inchBoundaries = ['1/16', '1/8', '3/16', '1/4', '3/8', '1/2', '5/8', '3/4', '1', '1-1/2', '2-1/4', '2-7/8', '6', '8', '24']
const mmBoundaries = [0.8, 1.5, 3, 3.175, 4.8, 5, 6, 10, 13, 16, 19, 25, 38, 57, 73, 150, 200, 610]

describe('units: exact micro-units at table boundaries', () => {
  it('reads inch fractions exactly (ASME BPVC IX Table QW-452.3: 2-7/8 in)', () => {
    expect(inchFraction('2-7/8')).toBe(2_875_000)
    expect(inchFraction('3/8')).toBe(375_000)
    expect(inchFraction('1-1/2')).toBe(1_500_000)
    expect(inchFraction('3/32')).toBe(93_750)
  })

  it('decimal inputs land on the same integer as the fraction', () => {
    expect(toMicro(0.375)).toBe(inchFraction('3/8'))
    expect(toMicro(2.875)).toBe(inchFraction('2-7/8'))
    expect(toMicro(0.1 + 0.2)).toBe(toMicro(0.3))
    expect(toMicro(3.175)).toBe(3_175_000)
  })

  it('pairs each inch limit with the SI value the code prints, not a conversion (ASME IX: 1/8 in with 3 mm)', () => {
    const eighth = printed('1/8', 3)
    expect(eighth.mm).toBe(3_000_000)
    // 1/8 in is 3.175 mm by convert-units; the code's 3 mm differs from it by 0.175 mm
    expect(convert(fromMicro(eighth.in)).from('in').to('mm') - fromMicro(eighth.mm)).toBeCloseTo(0.175, 6)
  })

  it('prints fractions the way the tables do', () => {
    expect(formatLength(inchFraction('2-7/8'), 'in')).toBe('2-7/8 in')
    expect(formatLength(inchFraction('3/16'), 'in')).toBe('3/16 in')
    expect(formatLength(inchFraction('8'), 'in')).toBe('8 in')
    expect(formatLength(toMicro(0.1345), 'in')).toBe('0.1345 in')
    expect(formatLength(toMicro(3.175), 'mm')).toBe('3.175 mm')
  })

  // convert-units goes through feet and metres and agrees to about 3e-8 relative.
  it('agrees with an independent units library (convert-units) at every boundary', () => {
    for (const fraction of inchBoundaries) {
      const inches = fromMicro(inchFraction(fraction))
      expect(relative(convertLength(inches, 'in', 'mm'), convert(inches).from('in').to('mm'))).toBeLessThan(1e-7)
    }
    for (const mm of mmBoundaries) {
      expect(relative(convertLength(mm, 'mm', 'in'), convert(mm).from('mm').to('in'))).toBeLessThan(1e-7)
    }
  })

  it('property: inch boundaries (1/64 in steps) survive a round trip through mm exactly', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 64 * 100 }), (sixtyFourths) => {
      const inches = sixtyFourths / 64
      expect(convertLength(convertLength(inches, 'in', 'mm'), 'mm', 'in')).toBe(inches)
    }))
  })

  it('property: mm boundaries (0.1 mm steps) survive a round trip through inches at micro-unit precision', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 20_000 }), (tenths) => {
      const mm = tenths / 10
      expect(toMicro(convertLength(convertLength(mm, 'mm', 'in'), 'in', 'mm'))).toBe(toMicro(mm))
    }))
  })

  it('property: toMicro and fromMicro round-trip any value given to 6 decimals', () => {
    fc.assert(fc.property(fc.integer({ min: 0, max: 10_000_000_000 }), (micro) => {
      expect(toMicro(fromMicro(micro))).toBe(micro)
    }))
  })
})
