import dayjs from 'dayjs'
import { describe, expect, it } from 'vitest'
import { continuityChain, standingOn } from '../../../../shared/qualification/process-standing'
import { revocationInForce, revokedChain, type Revocation } from '../../../../shared/qualification/revocation'

// ASME BPVC IX QW-322.1(b): with a specific reason to question the welder's ability, the qualifications supporting that
// welding are revoked; QW-322.2(b): a revoked qualification is restored only by requalifying (a new test). The day
// arithmetic (lapsed from the revocation day, a new test on or after it restores) is this module's convention.
const revocation = (over: Partial<Revocation> = {}): Revocation => ({
  id: 1, process: 'SMAW', revokedOn: '2026-05-10', reason: 'Root cracks on two production joints', revokedBy: 'An inspector', basisTestId: 7, ...over,
})
const chain = continuityChain({ process: 'SMAW', code: 'asme-ix', edition: '2023', testDate: '2026-01-15', uses: ['2026-04-01'] })

describe('revocation in force (QW-322.1(b), QW-322.2(b))', () => {
  it('holds from its day when no later test exists', () => {
    expect(revocationInForce([revocation()], [{ id: 7, testDate: '2026-01-15' }])?.id).toBe(1)
  })

  it('does not hold before its day', () => {
    expect(revocationInForce([revocation()], [{ id: 7, testDate: '2026-01-15' }], '2026-05-09')).toBeNull()
  })

  it('a new certified test on or after the revocation day lifts it (QW-322.2(b))', () => {
    expect(revocationInForce([revocation()], [{ id: 7, testDate: '2026-01-15' }, { id: 9, testDate: '2026-05-10' }])).toBeNull()
  })

  it('the questioned test itself never lifts it, even when dated the revocation day', () => {
    expect(revocationInForce([revocation({ revokedOn: '2026-01-15' })], [{ id: 7, testDate: '2026-01-15' }])?.id).toBe(1)
  })

  it('a test dated before the revocation day does not lift it', () => {
    expect(revocationInForce([revocation()], [{ id: 8, testDate: '2026-05-09' }, { id: 7, testDate: '2026-01-15' }])?.id).toBe(1)
  })

  it('the newest revocation decides: a second revocation after a requalification holds again', () => {
    const second = revocation({ id: 2, revokedOn: '2026-09-01', basisTestId: 9 })
    expect(revocationInForce([revocation(), second], [{ id: 9, testDate: '2026-06-01' }, { id: 7, testDate: '2026-01-15' }])?.id).toBe(2)
  })
})

describe('a revoked chain lapses at once', () => {
  it('lapses on the revocation day, not six months after the last use', () => {
    const cut = revokedChain(chain, revocation())
    expect(chain.lapsesOn).toBe(dayjs('2026-04-01').add(6, 'month').format('YYYY-MM-DD')) // QW-322.1(a), cross-checked with dayjs
    expect(cut.lapsesOn).toBe('2026-05-10')
    expect(standingOn(cut, '2026-05-10').standing).toBe('lapsed')
    expect(standingOn(cut, '2026-05-09').standing).toBe('lapsing')
    expect(cut.revoked).toEqual({ on: '2026-05-10', reason: 'Root cracks on two production joints', by: 'An inspector', clause: 'ASME IX QW-322.1(b)' })
    expect(cut.rule).toContain('QW-322.1(b)')
  })

  it('keeps an earlier continuity lapse date when the chain had already lapsed', () => {
    const cut = revokedChain(chain, revocation({ revokedOn: '2026-12-01' }))
    expect(cut.lapsesOn).toBe('2026-10-01')
  })
})
