import { describe, expect, it } from 'vitest'
import { groupedCode, printable, rangeText } from '../../../../server/sheets/format'

describe('sheet text', () => {
  it('prints markup as the characters it is, and drops direction overrides that could disguise text', () => {
    expect(printable('<b>Zoë</b> & <script>')).toBe('<b>Zoë</b> & <script>')
    expect(printable('KB\u202E-10')).toBe('KB-10')
    expect(printable('a\u0007b')).toBe('a\uFFFDb')
  })

  it('prints ranges as the code prints lengths, with the open ends in words', () => {
    // ASME BPVC IX Table QW-451.1 prints inch limits as fractions (1/16 in, 3/8 in)
    expect(rangeText({ min: 0.0625, max: 0.375 }, 'in')).toBe('1/16 in to 3/8 in')
    expect(rangeText({ min: 2.875, max: null }, 'in')).toBe('2-7/8 in and over')
    expect(rangeText({ min: null, max: null }, 'mm')).toBe('all')
    expect(rangeText({ min: 1.5, max: 12 }, 'mm')).toBe('1.5 mm to 12 mm')
  })

  it('groups a ten-character code for reading aloud', () => {
    expect(groupedCode('ABCDE23456')).toBe('ABCDE-23456')
  })
})
