import { format } from 'date-fns'

/**
 * The one way a moment is written on screens: ISO 8601 date and 24-hour time (2026-03-14 09:05), the same order as the
 * dates of the records (yyyy-MM-dd), so no screen mixes "14 Mar 2026", "14/03/2026" and "2026-03-14".
 */
export function dateTimeText(at: string | Date | null | undefined): string {
  if (at === null || at === undefined || at === '') return '—'
  const moment = at instanceof Date ? at : new Date(at)
  return Number.isNaN(moment.getTime()) ? '—' : format(moment, 'yyyy-MM-dd HH:mm')
}
