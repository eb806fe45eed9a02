import { differenceInCalendarDays } from 'date-fns'
import { parseDay } from '../rules/continuity'
import { mustEvaluate } from './evaluate'
import type { CodeId } from '../rules/types'

export type Standing = 'current' | 'lapsing' | 'lapsed'

export interface ProcessStanding {
  process: string
  code: CodeId
  edition: string
  testDate: string
  lastUse: string
  lapsesOn: string
  daysLeft: number
  standing: Standing
  rule: string
}

export const lapsingSoonDays = 30

/**
 * Where a welder stands for one process today. The most recent passed test starts the chain (QW-322.2(a)
 * renewal restores the process); each logged use keeps it alive only while it is still current, so a use
 * after the qualification lapsed does not revive it (QW-322.1(a)).
 */
export function processStanding(input: {
  process: string
  code: CodeId
  edition: string
  testDate: string
  uses: readonly string[]
  today: string
}): ProcessStanding {
  const lapseAfter = (lastUse: string) => mustEvaluate<{ lapsesOn: string, rule: string }>(
    input.code, 'continuity', 'in', input.edition, { lastUse, on: lastUse })
  let lastUse = input.testDate
  let rule = lapseAfter(lastUse)
  for (const use of [...input.uses].sort()) {
    if (use <= lastUse) continue
    if (use >= rule.lapsesOn || use > input.today) break
    lastUse = use
    rule = lapseAfter(lastUse)
  }
  const lapsesOn = rule.lapsesOn
  const daysLeft = differenceInCalendarDays(parseDay(lapsesOn, 'lapsesOn'), parseDay(input.today, 'today'))
  const standing: Standing = daysLeft <= 0 ? 'lapsed' : daysLeft <= lapsingSoonDays ? 'lapsing' : 'current'
  return { process: input.process, code: input.code, edition: input.edition, testDate: input.testDate, lastUse, lapsesOn, daysLeft, standing, rule: rule.rule }
}

export const standingWords: Record<Standing, string> = {
  current: 'Current',
  lapsing: 'Lapses soon',
  lapsed: 'Lapsed',
}
