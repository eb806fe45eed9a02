import dayjs from 'dayjs'
import customParseFormat from 'dayjs/plugin/customParseFormat.js'
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { calendarDay, continuityImportRowSchema } from '../../../../shared/schemas/continuity-entry'
import { calendarDate, daySchema, hasLoneSurrogate, isCalendarDay, optionalText, requiredText } from '../../../../shared/schemas/fields'
import { continuityQuerySchema } from '../../../../shared/schemas/sheet'

dayjs.extend(customParseFormat)

// Cross-check with dayjs in strict mode (not the code under test): a day exists when strict parsing accepts it.
const dayjsSays = (text: string) => dayjs(text, 'YYYY-MM-DD', true).isValid()

describe('real calendar dates (ISO 8601:2019, 4.3.2; Gregorian leap-year rule)', () => {
  it.each([
    ['2026-13-45', false], // month 13 does not exist
    ['2026-02-30', false], // February has at most 29 days
    ['2026-02-29', false], // 2026 is not a leap year (not divisible by 4)
    ['2028-02-29', true], // 2028 is (divisible by 4, not by 100)
    ['1900-02-29', false], // divisible by 100, not by 400
    ['2000-02-29', true], // divisible by 400
    ['2026-04-31', false], // April has 30 days
    ['2026-12-31', true],
    ['2026-00-10', false],
    ['2026-01-00', false],
  ])('%s is a calendar day: %s (dayjs agrees)', (text, real) => {
    expect(isCalendarDay(text)).toBe(real)
    expect(dayjsSays(text)).toBe(real)
  })

  it('agrees with dayjs on any YYYY-MM-DD made of digits', () => {
    const two = (n: number) => String(n).padStart(2, '0')
    fc.assert(fc.property(fc.integer({ min: 1000, max: 9999 }), fc.integer({ min: 0, max: 99 }), fc.integer({ min: 0, max: 99 }), (y, m, d) => {
      const text = `${y}-${two(m)}-${two(d)}`
      expect(isCalendarDay(text)).toBe(dayjsSays(text))
    }))
  })

  it('every shared date field refuses 2026-13-45 and 2026-02-30 with a message, and takes 2026-02-28', () => {
    for (const schema of [daySchema, calendarDay, calendarDate('from')]) {
      for (const bad of ['2026-13-45', '2026-02-30']) {
        const result = schema.safeParse(bad)
        expect(result.success).toBe(false)
        expect(result.error?.issues[0]?.message).toMatch(/date/i)
      }
      expect(schema.safeParse('2026-02-28').success).toBe(true)
    }
    expect(continuityQuerySchema.safeParse({ from: '2026-13-45' }).success).toBe(false)
  })
})

describe('lone surrogates in text (Unicode 15, 3.9 D91: a lone surrogate is ill-formed UTF-16)', () => {
  it('finds lone high and low surrogates and lets paired ones (emoji) through', () => {
    expect(hasLoneSurrogate('A\uD800B')).toBe(true)
    expect(hasLoneSurrogate('A\uDC00B')).toBe(true)
    expect(hasLoneSurrogate('end\uD83D')).toBe(true)
    expect(hasLoneSurrogate('weld 🔥 ok')).toBe(false)
    expect(hasLoneSurrogate('Łódź ≤ 3 mm')).toBe(false)
  })

  it('the text helpers refuse them with a field message', () => {
    const required = requiredText('the title').safeParse('A\uD800B')
    expect(required.success).toBe(false)
    expect(required.error?.issues[0]?.message).toContain('broken character')
    expect(optionalText('Note').safeParse('x\uDC00').success).toBe(false)
    expect(requiredText('the title').safeParse('weld 🔥').success).toBe(true)
  })

  it('an imported CSV row with one is a row error, not a stored text', () => {
    const row = continuityImportRowSchema.safeParse({ stamp: 'KB-03', process: 'GMAW', weldedOn: '2026-01-05', reference: 'job\uD800' })
    expect(row.success).toBe(false)
    expect(row.error?.flatten().fieldErrors.reference?.[0]).toContain('broken character')
  })
})
