import { differenceInCalendarDays } from 'date-fns'
import { parseDay } from '../rules/continuity-lapse'
import { getRuleSet } from '../rules'
import type { CodeId } from '../rules/types'
import type { Revoked } from './revocation'

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
  /** Set while a revocation holds (QW-322.1(b)): the standing is then 'lapsed' from the revocation day. */
  revoked?: Revoked | null
}

export const lapsingSoonDays = 30

export interface ChainInput {
  process: string
  code: CodeId
  edition: string
  testDate: string
  uses: readonly string[]
}

export interface Chain {
  process: string
  code: CodeId
  edition: string
  testDate: string
  lastUse: string
  lapsesOn: string
  rule: string
  revoked?: Revoked | null
}

/**
 * The continuity chain of one process. The most recent passed test starts it (QW-322.2(a) renewal restores
 * the process); each logged use keeps it alive only while it is still current, so a use after the
 * qualification lapsed does not revive it (QW-322.1(a)). Uses after `until` (a future date) are not counted.
 */
export function continuityChain(input: ChainInput, until = '9999-12-31'): Chain {
  // The rule function itself, not evaluate(): a chain may hold hundreds of uses.
  const rules = getRuleSet(input.code)
  const context = { code: input.code, edition: input.edition, unit: 'in' as const }
  const lapseAfter = (lastUse: string) => rules.continuity({ lastUse, on: lastUse }, context)
  let lastUse = input.testDate
  let rule = lapseAfter(lastUse)
  for (const use of [...input.uses].sort()) {
    if (use <= lastUse) continue
    if (use >= rule.lapsesOn || use > until) break
    lastUse = use
    rule = lapseAfter(lastUse)
  }
  return { process: input.process, code: input.code, edition: input.edition, testDate: input.testDate, lastUse, lapsesOn: rule.lapsesOn, rule: rule.rule }
}

/** Where a chain stands on a day: days left until it lapses, and the word for it. */
export function standingOn(chain: Chain, today: string): ProcessStanding {
  const daysLeft = differenceInCalendarDays(parseDay(chain.lapsesOn, 'lapsesOn'), parseDay(today, 'today'))
  const standing: Standing = daysLeft <= 0 ? 'lapsed' : daysLeft <= lapsingSoonDays ? 'lapsing' : 'current'
  return { ...chain, daysLeft, standing }
}

/** Where a welder stands for one process today. */
export function processStanding(input: ChainInput & { today: string }): ProcessStanding {
  return standingOn(continuityChain(input, input.today), input.today)
}

export const standingWords: Record<Standing, string> = {
  current: 'Current',
  lapsing: 'Lapses soon',
  lapsed: 'Lapsed',
}
