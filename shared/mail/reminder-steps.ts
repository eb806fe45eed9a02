import { getISOWeek, getISOWeekYear } from 'date-fns'

/** Days before a qualification lapses on which its welder is reminded (common practice: a month, two weeks, a week). */
export const reminderSteps = [30, 14, 7] as const
export type ReminderStep = typeof reminderSteps[number]

/** How far ahead the supervisor's weekly digest looks. */
export const digestWindowDays = 60

/**
 * The reminder step a qualification with `daysLeft` days to go is in: the nearest step at or above it.
 * A job that missed a day still sends the step it is in (20 days left: the 30-day reminder), never an earlier one,
 * and nothing once the qualification has lapsed.
 */
export function reminderStepFor(daysLeft: number): ReminderStep | null {
  if (daysLeft <= 0) return null
  const steps = [...reminderSteps].sort((a, b) => a - b)
  return steps.find(step => daysLeft <= step) ?? null
}

/** '2026-W49': the ISO week of a day, so the weekly digest goes out once per week whatever day the job first runs. */
export function isoWeekOf(day: string): string {
  const date = new Date(`${day}T12:00:00Z`)
  return `${getISOWeekYear(date)}-W${String(getISOWeek(date)).padStart(2, '0')}`
}
