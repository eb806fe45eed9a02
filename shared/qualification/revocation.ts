import type { CodeId } from '../rules/types'
import type { Chain } from './process-standing'

/**
 * A welder × process qualification revoked for a specific reason (ASME IX QW-322.1(b); AWS D1.1:2020 6.2.3;
 * ISO 9606-1:2017 9.3). A revocation is its own record: the certified tests it questions stay as signed.
 */
export interface Revocation {
  id: number
  process: string
  revokedOn: string
  reason: string
  revokedBy: string
  /** The certified test the qualification stood on when it was revoked (null: none was certified). */
  basisTestId: number | null
}

export interface Revoked { on: string, reason: string, by: string, clause: string }

/** The clause each code revokes under, and what restores the qualification. */
export const revocationClause: Record<CodeId, { revoke: string, restore: string }> = {
  'asme-ix': { revoke: 'ASME IX QW-322.1(b)', restore: 'ASME IX QW-322.2(b): requalify by a new test' },
  'aws-d1.1': { revoke: 'AWS D1.1 6.2.3 (specific reason to question)', restore: 'AWS D1.1 6.2.3: requalify by a new test' },
  'aws-d1.3': { revoke: 'AWS D1.3 (specific reason to question; check the edition)', restore: 'AWS D1.3: requalify by a new test' },
  'iso-9606-1': { revoke: 'ISO 9606-1 clause 9 (specific reason to question the welder\'s skill; check the edition)', restore: 'ISO 9606-1: a new qualification test' },
}

/**
 * The revocation of one process that holds on `day`: the newest revocation made on or before it, unless a certified
 * test of the process other than the one it questioned was welded on or after the revocation day and on or before
 * `day` (QW-322.2(b): requalification by a new test). Null when none holds.
 */
export function revocationInForce(revocations: readonly Revocation[], tests: readonly { id: number, testDate: string }[], day = '9999-12-31'): Revocation | null {
  const newest = revocations.filter(r => r.revokedOn <= day)
    .sort((a, b) => b.revokedOn.localeCompare(a.revokedOn) || b.id - a.id)[0]
  if (!newest) return null
  const requalified = tests.some(t => t.id !== newest.basisTestId && t.testDate >= newest.revokedOn && t.testDate <= day)
  return requalified ? null : newest
}

/**
 * A continuity chain cut by a revocation: uses logged on or after the revocation day do not keep it alive, and it
 * lapses on the revocation day itself (at once, not six months later).
 */
export function revokedChain(chain: Chain, revocation: Revocation): Chain {
  const revoke = revocationClause[chain.code].revoke
  const lapsesOn = chain.lapsesOn < revocation.revokedOn ? chain.lapsesOn : revocation.revokedOn
  return {
    ...chain,
    lapsesOn,
    rule: `Revoked on ${revocation.revokedOn} (${revoke}): ${revocation.reason}`,
    revoked: { on: revocation.revokedOn, reason: revocation.reason, by: revocation.revokedBy, clause: revoke },
  }
}
