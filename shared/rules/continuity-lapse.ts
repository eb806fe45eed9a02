import { addDays, addMonths, format } from 'date-fns'
import type { Basis, Reason } from './types'
import { refuse } from './refusal'

/**
 * How a code's "six months" is counted. The codes give no date arithmetic; these are the
 * conventions of SOURCES.md A4:
 * - 'lapses-on-anniversary': "6 months or more" (ASME IX QW-322.1(a)): lapsed from last use + 6 months.
 * - 'lapses-day-after-anniversary': "a period exceeding six months" (AWS D1.1): still current on the
 *   six-month anniversary, lapsed from the next day.
 * Month ends clamp (date-fns addMonths): Aug 31 + 6 months = Feb 28 (29 in a leap year).
 */
export type ContinuityConvention = 'lapses-on-anniversary' | 'lapses-day-after-anniversary'

export interface ContinuityRule {
  clause: string
  ruleText: string
  convention: ContinuityConvention
  basis: Basis
}

export interface ContinuityInput {
  lastUse: string
  on: string
}

export interface ContinuityResult {
  lapsesOn: string
  current: boolean
  lastCurrentDay: string
  rule: string
  convention: string
  reasons: Reason[]
}

/** A calendar date from YYYY-MM-DD, refusing dates that do not exist (2026-02-30). */
export function parseDay(text: string, field: string): Date {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text)
  if (!match) refuse(`${field}: expected a date as YYYY-MM-DD, got "${text}"`)
  const year = Number(match[1])
  const month = Number(match[2])
  const day = Number(match[3])
  const date = new Date(year, month - 1, day)
  if (date.getFullYear() !== year || date.getMonth() !== month - 1 || date.getDate() !== day) {
    refuse(`${field}: ${text} is not a calendar date`)
  }
  return date
}

export function formatDay(date: Date): string {
  return format(date, 'yyyy-MM-dd')
}

const conventionText: Record<ContinuityConvention, string> = {
  'lapses-on-anniversary': 'Lapses on the day six calendar months after the last use (month ends clamp: '
    + 'Aug 31 + 6 months = Feb 28 or 29); current on every day before it.',
  'lapses-day-after-anniversary': 'Still current on the six-month anniversary of the last use (month ends '
    + 'clamp: Aug 31 + 6 months = Feb 28 or 29); lapses the day after.',
}

/** The first day a process qualification is no longer current, and whether it is current on `on`. */
export function continuity(input: ContinuityInput, rule: ContinuityRule): ContinuityResult {
  const lastUse = parseDay(input.lastUse, 'lastUse')
  const on = parseDay(input.on, 'on')
  if (on < lastUse) refuse(`on: ${input.on} is before lastUse ${input.lastUse}`)
  const anniversary = addMonths(lastUse, 6)
  const lapses = rule.convention === 'lapses-on-anniversary' ? anniversary : addDays(anniversary, 1)
  const lapsesOn = formatDay(lapses)
  const lastCurrentDay = formatDay(addDays(lapses, -1))
  const current = input.on < lapsesOn
  return {
    lapsesOn,
    current,
    lastCurrentDay,
    rule: rule.ruleText,
    convention: conventionText[rule.convention],
    reasons: [
      { clause: rule.clause, text: rule.ruleText, basis: rule.basis },
      {
        clause: 'date convention (Rootface)',
        text: current
          ? `Last use ${input.lastUse}: current on ${input.on}; last current day ${lastCurrentDay}, lapses on ${lapsesOn}.`
          : `Last use ${input.lastUse}: lapsed on ${lapsesOn} (last current day ${lastCurrentDay}), so not current on ${input.on}.`,
        basis: 'convention',
      },
    ],
  }
}
