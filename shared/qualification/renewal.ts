import type { Basis, CodeId } from '../rules/types'

export interface Renewal { clause: string, text: string, basis: Basis }

/** How a lapsed process qualification is renewed, in plain words with its clause. */
export const renewalOf: Record<CodeId, Renewal> = {
  'asme-ix': {
    clause: 'ASME IX QW-322.2(a)',
    text: 'Weld one test coupon with this process, in any position, thickness or diameter, and have it examined as QW-301 and QW-302 require (bends or radiography). Passing it restores every range the earlier tests qualified for this process.',
    basis: 'verified',
  },
  'aws-d1.1': {
    clause: 'AWS D1.1, welder qualification period (from memory)',
    text: 'Requalify with a test coupon for this process; the code allows the renewal test on a thinner plate than the original. Confirm the plate and the tests with the edition your contract names.',
    basis: 'memory',
  },
  'aws-d1.3': {
    clause: 'AWS D1.3, qualification period (from memory)',
    text: 'Requalify with a test weld for this process as the original test was made. Confirm with the edition your contract names.',
    basis: 'memory',
  },
  'iso-9606-1': {
    clause: 'ISO 9606-1, 9.2 and 9.3 (from memory)',
    text: 'After six months without welding in this process the certificate is no longer valid: a new test is needed. Confirm with the examiner or examining body.',
    basis: 'memory',
  },
}
