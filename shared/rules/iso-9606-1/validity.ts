import { addMonths, addYears, differenceInCalendarDays } from 'date-fns'
import type { Reason } from '../types'
import { formatDay, parseDay } from '../continuity-lapse'
import { refuse } from '../refusal'

/**
 * How long an ISO 9606-1 certificate stays valid: the six-monthly confirmation of clause 9.2 and the revalidation
 * route of clause 9.3 chosen for the certificate.
 * - 9.2: every six months the employer's welding coordinator (or the examiner) confirms that the welder has worked
 *   within the range of qualification; without it the qualification lapses, whatever the 9.3 route (SOURCES.md F-C).
 * - 9.3 a): retest every 3 years; b): every 2 years, extended by 2 years each time two production welds made in the
 *   last 6 months of validity are tested (volumetric or destructive); c): no end date while the 9.2 confirmations
 *   continue and the manufacturer (ISO 3834-2) keeps evidence of acceptable quality (EN ISO 9606-1:2017).
 * Day boundaries are this program's convention, as for continuity: a confirmation counts when it is made before the
 * six-month date, and the qualification lapses on that date (month ends clamp: Aug 31 + 6 months = Feb 28 or 29).
 */
export type IsoRoute = 'a' | 'b' | 'c'

export interface IsoValidityRecord {
  kind: 'confirmation' | 'production-welds'
  on: string
}

export interface IsoValidityInput {
  testDate: string
  route: IsoRoute
  records: readonly IsoValidityRecord[]
  today: string
}

export interface IsoValidity {
  route: IsoRoute
  /** The last 9.2 confirmation that kept the chain alive (the test date when none). */
  lastConfirmed: string
  /** The day the next 9.2 confirmation is due by (the qualification lapses on it without one). */
  confirmationDue: string
  /** The 9.3 end of validity; null for route c. */
  expiresOn: string | null
  /** For route b: the first day production welds tested count toward the next extension. */
  productionWindowFrom: string | null
  /** The day the certificate lapses: the earlier of the confirmation due date and the 9.3 end. */
  lapsesOn: string
  lapsedBy: 'confirmation' | 'revalidation'
  daysLeft: number
  current: boolean
  /** Confirmations or production-weld records that came too late or too early and were not counted. */
  ignored: IsoValidityRecord[]
  reasons: Reason[]
}

const day = (d: Date) => formatDay(d)

/** The 9.2 chain: each confirmation made before the six-month date keeps the certificate alive for six more months. */
export function confirmationChain(testDate: string, confirmations: readonly string[], until: string) {
  let last = parseDay(testDate, 'testDate')
  const ignored: string[] = []
  let broken = false
  for (const text of [...confirmations].sort()) {
    const on = parseDay(text, 'confirmation')
    if (on <= last) continue
    if (broken || on >= addMonths(last, 6) || text > until) {
      broken = broken || on >= addMonths(last, 6)
      ignored.push(text)
      continue
    }
    last = on
  }
  return { lastConfirmed: day(last), confirmationDue: day(addMonths(last, 6)), ignored }
}

/** The 9.3 end of validity by route; for b, each production-weld record in the last 6 months of validity adds 2 years. */
export function revalidationEnd(testDate: string, route: IsoRoute, productionWelds: readonly string[], until: string) {
  const start = parseDay(testDate, 'testDate')
  const ignored: string[] = []
  if (route === 'c') return { expiresOn: null, windowFrom: null, ignored: [...productionWelds] }
  if (route === 'a') return { expiresOn: day(addYears(start, 3)), windowFrom: null, ignored: [...productionWelds] }
  let end = addYears(start, 2)
  for (const text of [...productionWelds].sort()) {
    const on = parseDay(text, 'production welds')
    if (text <= until && on >= addMonths(end, -6) && on < end) end = addYears(end, 2)
    else ignored.push(text)
  }
  return { expiresOn: day(end), windowFrom: day(addMonths(end, -6)), ignored }
}

/** Where an ISO 9606-1 certificate stands on `today` (9.2 and 9.3). */
export function isoValidity(input: IsoValidityInput): IsoValidity {
  if (!['a', 'b', 'c'].includes(input.route)) refuse(`route: ISO 9606-1 9.3 routes are a, b and c; got "${input.route}"`)
  const today = parseDay(input.today, 'today')
  const confirmations = input.records.filter(r => r.kind === 'confirmation').map(r => r.on)
  const welds = input.records.filter(r => r.kind === 'production-welds').map(r => r.on)
  const chain = confirmationChain(input.testDate, confirmations, input.today)
  const end = revalidationEnd(input.testDate, input.route, welds, input.today)
  const byConfirmation = end.expiresOn === null || chain.confirmationDue <= end.expiresOn
  const lapsesOn = byConfirmation ? chain.confirmationDue : end.expiresOn!
  const daysLeft = differenceInCalendarDays(parseDay(lapsesOn, 'lapsesOn'), today)
  const reasons: Reason[] = [
    { clause: 'ISO 9606-1, 9.2', text: `Confirmed last on ${chain.lastConfirmed}; the next six-monthly confirmation is due before ${chain.confirmationDue} (without it the qualification lapses whatever the 9.3 route).`, basis: 'partial' },
    input.route === 'a'
      ? { clause: 'ISO 9606-1, 9.3 a)', text: `Retest every 3 years: valid until ${end.expiresOn}.`, basis: 'verified' }
      : input.route === 'b'
        ? { clause: 'ISO 9606-1, 9.3 b)', text: `Every 2 years: valid until ${end.expiresOn}; two production welds tested (volumetric or destructive) from ${end.windowFrom} extend it by 2 years.`, basis: 'verified' }
        : { clause: 'ISO 9606-1, 9.3 c)', text: 'No end date while the 9.2 confirmations continue and the manufacturer, verified to ISO 3834-2, keeps evidence that the welder makes welds of acceptable quality: check by hand.', basis: 'verified' },
    { clause: 'ISO 9606-1, 9.2 and 9.3 (day count)', text: 'A confirmation counts when made before the six-month date; the certificate lapses on that date (this program\'s convention).', basis: 'convention' },
  ]
  const ignored = [
    ...chain.ignored.map(on => ({ kind: 'confirmation' as const, on })),
    ...(input.route === 'b' ? end.ignored.map(on => ({ kind: 'production-welds' as const, on })) : []),
  ]
  if (ignored.length) reasons.push({ clause: 'ISO 9606-1, 9.2 and 9.3', text: `Not counted: ${ignored.map(r => `${r.kind} of ${r.on}`).join(', ')} (after a lapse, outside the window, or after today).`, basis: 'convention' })
  return {
    route: input.route, lastConfirmed: chain.lastConfirmed, confirmationDue: chain.confirmationDue, expiresOn: end.expiresOn,
    productionWindowFrom: end.windowFrom, lapsesOn, lapsedBy: byConfirmation ? 'confirmation' : 'revalidation',
    daysLeft, current: daysLeft > 0, ignored, reasons,
  }
}
