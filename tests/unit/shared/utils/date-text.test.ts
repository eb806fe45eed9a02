import dayjs from 'dayjs'
import { describe, expect, it } from 'vitest'
import { dateTimeText } from '../../../../shared/utils/date-text'

// One date format on every screen: ISO 8601 (yyyy-MM-dd, 24-hour time), cross-checked with dayjs, not date-fns.
describe('dateTimeText', () => {
  it('writes a moment as yyyy-MM-dd HH:mm in local time (ISO 8601 order)', () => {
    const at = '2026-03-14T09:05:00Z'
    expect(dateTimeText(at)).toBe(dayjs(at).format('YYYY-MM-DD HH:mm'))
    expect(dateTimeText(new Date(at))).toMatch(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2}$/)
  })

  it('a missing or unreadable moment is a dash, never "Invalid Date"', () => {
    expect(dateTimeText(null)).toBe('—')
    expect(dateTimeText('')).toBe('—')
    expect(dateTimeText('not a date')).toBe('—')
  })
})
