import dayjs from 'dayjs'
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { calibrationDueOn, calibrationOn, readingFlagged } from '../../../../shared/rules/calibration'

// Calibration intervals are the shop's (quality manual); ISO 3834-2 asks for calibrated measuring equipment and
// ISO 17662 says how (from memory). The due date is "calibration date + interval" (common practice); dates are
// cross-checked with dayjs, not with date-fns the code uses.
describe('calibration of machines and meters', () => {
  it('is due the interval in calendar months after the calibration (common practice)', () => {
    expect(calibrationDueOn({ calibratedOn: '2026-01-15', intervalMonths: 12 })).toBe(dayjs('2026-01-15').add(12, 'month').format('YYYY-MM-DD'))
    // 31 January + 1 month: the end of February (dayjs clamps the same way)
    expect(calibrationDueOn({ calibratedOn: '2026-01-31', intervalMonths: 1 })).toBe(dayjs('2026-01-31').add(1, 'month').format('YYYY-MM-DD'))
  })

  it('is in calibration through the due date and out the day after (common practice)', () => {
    const record = { calibratedOn: '2026-03-01', intervalMonths: 6 }
    const due = dayjs('2026-03-01').add(6, 'month')
    expect(calibrationOn(record, due.format('YYYY-MM-DD')).state).toBe('due-soon')
    const after = calibrationOn(record, due.add(1, 'day').format('YYYY-MM-DD'))
    expect(after.state).toBe('out-of-calibration')
    expect(readingFlagged(after)).toBe(true)
    expect(after.daysLeft).toBe(-1)
    const early = calibrationOn(record, '2026-03-02')
    expect(early.state).toBe('in-calibration')
    expect(readingFlagged(early)).toBe(false)
  })

  it('shows due soon from 30 days before the due date (common practice: a month\'s notice)', () => {
    const record = { calibratedOn: '2026-03-01', intervalMonths: 12 }
    const due = dayjs('2026-03-01').add(12, 'month')
    expect(calibrationOn(record, due.subtract(30, 'day').format('YYYY-MM-DD')).state).toBe('due-soon')
    expect(calibrationOn(record, due.subtract(31, 'day').format('YYYY-MM-DD')).state).toBe('in-calibration')
  })

  it('never says "in calibration" without a recorded date and interval, nor before the recorded calibration', () => {
    expect(calibrationOn({ calibratedOn: null, intervalMonths: 12 }, '2026-05-01').state).toBe('cannot-tell')
    expect(calibrationOn({ calibratedOn: '2026-01-01', intervalMonths: null }, '2026-05-01').state).toBe('cannot-tell')
    const before = calibrationOn({ calibratedOn: '2026-06-01', intervalMonths: 12 }, '2026-05-01')
    expect(before.state).toBe('cannot-tell')
    expect(readingFlagged(before)).toBe(true)
  })

  it('property: a day past the due date is never in calibration, whatever the date and interval', () => {
    const day = fc.date({ min: new Date('2000-01-01'), max: new Date('2090-12-31'), noInvalidDate: true }).map(d => dayjs(d).format('YYYY-MM-DD'))
    fc.assert(fc.property(day, fc.integer({ min: 1, max: 120 }), fc.integer({ min: 1, max: 4000 }), (calibratedOn, months, late) => {
      const on = dayjs(calibratedOn).add(months, 'month').add(late, 'day').format('YYYY-MM-DD')
      const s = calibrationOn({ calibratedOn, intervalMonths: months }, on)
      return s.state === 'out-of-calibration' && readingFlagged(s)
    }))
  })
})
