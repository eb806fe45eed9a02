import { confirmationChain, revalidationEnd, type IsoRoute, type IsoValidityRecord } from '../rules/iso-9606-1/validity'
import type { CodeId } from '../rules/types'
import { isoProcessIds, isIsoWelderCode } from '../vocabulary/iso'
import type { Chain } from './process-standing'

/**
 * Standings are kept per welder × process, and the process names are the code family's own: ASME/AWS tests and
 * continuity entries name SMAW, GMAW…; ISO 9606-1 tests name ISO 4063 numbers (111, 135…). A test counts only for a
 * process of its own family, so an ISO certificate never extends an ASME continuity chain, nor the reverse.
 */
export function sameFamily(code: string, process: string): boolean {
  return isIsoWelderCode(code) === (isoProcessIds as readonly string[]).includes(process)
}

/**
 * The chain of an ISO 9606-1 certificate for one process: the test starts it, each 9.2 confirmation made in time keeps
 * it six more months, and the 9.3 route ends it (a: 3 years; b: 2 years, extended by production welds tested; c: none).
 * It lapses on the earlier date. Continuity entries (ASME/AWS uses) do not count.
 */
export function isoChain(test: { process: string, code: CodeId, edition: string, testDate: string, route: IsoRoute }, records: readonly IsoValidityRecord[]): Chain {
  const until = '9999-12-31'
  const chain = confirmationChain(test.testDate, records.filter(r => r.kind === 'confirmation').map(r => r.on), until)
  const end = revalidationEnd(test.testDate, test.route, records.filter(r => r.kind === 'production-welds').map(r => r.on), until)
  const byConfirmation = end.expiresOn === null || chain.confirmationDue <= end.expiresOn
  const lapsesOn = byConfirmation ? chain.confirmationDue : end.expiresOn!
  const rule = byConfirmation
    ? `ISO 9606-1 9.2: lapses without a six-monthly confirmation before ${chain.confirmationDue} (9.3 ${test.route})${end.expiresOn ? `; valid until ${end.expiresOn} by 9.3 ${test.route})` : ''}`
    : `ISO 9606-1 9.3 ${test.route}): valid until ${end.expiresOn}${test.route === 'b' ? ' unless two production welds are tested in its last 6 months' : ' (retest)'}`
  return { process: test.process, code: test.code, edition: test.edition, testDate: test.testDate, lastUse: chain.lastConfirmed, lapsesOn, rule }
}
