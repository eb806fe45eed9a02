import { describe, expect, it } from 'vitest'
import dayjs from 'dayjs'
import isoWeek from 'dayjs/plugin/isoWeek'
import { isoWeekOf, reminderStepFor } from '../../../../shared/mail/reminder-steps'

dayjs.extend(isoWeek)

describe('reminderStepFor', () => {
  // Issue 7: one reminder each 30, 14 and 7 days before a qualification lapses.
  it('puts each day left in the nearest step at or above it', () => {
    expect(reminderStepFor(30)).toBe(30)
    expect(reminderStepFor(15)).toBe(30)
    expect(reminderStepFor(14)).toBe(14)
    expect(reminderStepFor(8)).toBe(14)
    expect(reminderStepFor(7)).toBe(7)
    expect(reminderStepFor(1)).toBe(7)
  })

  it('is silent before 30 days and once lapsed', () => {
    expect(reminderStepFor(31)).toBeNull()
    expect(reminderStepFor(0)).toBeNull()
    expect(reminderStepFor(-5)).toBeNull()
  })
})

describe('isoWeekOf', () => {
  // ISO 8601 week numbering, cross-checked with dayjs' isoWeek plugin.
  it.each(['2026-12-01', '2026-12-28', '2027-01-01', '2027-01-03', '2027-01-04', '2020-12-31', '2021-01-01'])('%s', (day) => {
    const d = dayjs(day)
    expect(isoWeekOf(day)).toBe(`${d.isoWeekYear()}-W${String(d.isoWeek()).padStart(2, '0')}`)
  })

  it('puts 1 January 2027 (a Friday) in week 53 of 2026 (ISO 8601)', () => {
    expect(isoWeekOf('2027-01-01')).toBe('2026-W53')
  })
})
