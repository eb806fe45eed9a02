import { addDays, differenceInCalendarDays, format } from 'date-fns'
import { parseDay } from '../rules/continuity-lapse'
import type { Standing } from './process-standing'

export interface LapseWeek {
  from: string
  lapsed: number
  lapsing: number
  current: number
  /** Up to five "KB-03 SMAW" labels, soonest first */
  sample: string[]
}

export interface LapseWeeks { from: string, weeksBack: number, weeks: LapseWeek[], before: number, after: number }

/** Lapse dates counted per week, from `weeksBack` weeks before today to `weeksAhead` after: the dashboard's timeline. */
export function lapseWeeks(items: { welderStamp: string, process: string, lapsesOn: string, standing: Standing }[], today: string, weeksBack = 13, weeksAhead = 26): LapseWeeks {
  const start = addDays(parseDay(today, 'today'), -weeksBack * 7)
  const weeks: LapseWeek[] = Array.from({ length: weeksBack + weeksAhead }, (_, i) => ({ from: format(addDays(start, i * 7), 'yyyy-MM-dd'), lapsed: 0, lapsing: 0, current: 0, sample: [] }))
  let before = 0
  let after = 0
  for (const item of [...items].sort((a, b) => a.lapsesOn.localeCompare(b.lapsesOn))) {
    const index = Math.floor(differenceInCalendarDays(parseDay(item.lapsesOn, 'lapsesOn'), start) / 7)
    if (index < 0) before++
    else if (index >= weeks.length) after++
    else {
      const week = weeks[index]!
      week[item.standing]++
      if (week.sample.length < 5) week.sample.push(`${item.welderStamp} ${item.process}`)
    }
  }
  return { from: format(start, 'yyyy-MM-dd'), weeksBack, weeks, before, after }
}
