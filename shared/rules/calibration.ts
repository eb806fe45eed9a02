import { addMonths, differenceInCalendarDays, format, parseISO } from 'date-fns'

// Calibration of welding machines and of the meters used to set and check them. No welding code fixes the interval:
// ISO 3834-2 asks that measuring equipment be calibrated or validated and ISO 17662 describes how (from memory);
// ASME IX and AWS D1.1 leave it to the shop's quality manual. Rootface only compares dates the shop recorded.

export interface CalibrationRecord {
  /** The date of the last calibration recorded, or null when none is recorded. */
  calibratedOn: string | null
  /** Months from one calibration to the next, as the shop's quality manual sets it; null when none is recorded. */
  intervalMonths: number | null
}

export type CalibrationState = 'in-calibration' | 'due-soon' | 'out-of-calibration' | 'cannot-tell'

export interface CalibrationStanding {
  state: CalibrationState
  /** The last day the calibration covers (calibration date + interval), or null when Rootface cannot tell. */
  dueOn: string | null
  /** Days from `on` to the due date (negative once past), or null. */
  daysLeft: number | null
  text: string
}

/** Days before the due date when a calibration shows as due soon (common practice: a month's notice). */
export const calibrationNoticeDays = 30

/** The due date: the calibration date plus the interval in calendar months (the end of a shorter month when the day does not exist). */
export function calibrationDueOn(record: CalibrationRecord): string | null {
  if (!record.calibratedOn || record.intervalMonths === null || record.intervalMonths <= 0) return null
  return format(addMonths(parseISO(record.calibratedOn), record.intervalMonths), 'yyyy-MM-dd')
}

/**
 * Where a calibration stands on a day: in calibration through its due date (common practice: due on that day, usable
 * that day), out after it. A day before the recorded calibration, or a record without a date or interval, is "cannot tell".
 */
export function calibrationOn(record: CalibrationRecord, on: string): CalibrationStanding {
  if (!record.calibratedOn) return { state: 'cannot-tell', dueOn: null, daysLeft: null, text: 'Cannot tell: record the calibration date.' }
  const dueOn = calibrationDueOn(record)
  if (!dueOn) return { state: 'cannot-tell', dueOn: null, daysLeft: null, text: 'Cannot tell: record the calibration interval.' }
  if (on < record.calibratedOn) {
    return { state: 'cannot-tell', dueOn, daysLeft: null, text: `Cannot tell: the calibration on record is of ${record.calibratedOn}, after ${on}; record the one before it.` }
  }
  const daysLeft = differenceInCalendarDays(parseISO(dueOn), parseISO(on))
  if (daysLeft < 0) return { state: 'out-of-calibration', dueOn, daysLeft, text: `Out of calibration: due on ${dueOn}.` }
  if (daysLeft <= calibrationNoticeDays) return { state: 'due-soon', dueOn, daysLeft, text: `In calibration, due on ${dueOn} (${daysLeft} day${daysLeft === 1 ? '' : 's'} left).` }
  return { state: 'in-calibration', dueOn, daysLeft, text: `In calibration until ${dueOn}.` }
}

/** Whether a reading taken on a day with this equipment must be flagged: out of calibration, or cannot tell. */
export function readingFlagged(standing: CalibrationStanding): boolean {
  return standing.state === 'out-of-calibration' || standing.state === 'cannot-tell'
}
