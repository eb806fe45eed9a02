import { addDays, format, parseISO } from 'date-fns'
import type { Db } from '../database/client'
import { canonicalJson, sha256Hex } from '../database/signing'
import { loadCertifiedTests, loadRevocations, loadUses, welderOf, type CertifiedTest } from '../database/sheet-records'
import { continuityChain, processStanding, standingOn as chainStandingOn, type ProcessStanding } from '#shared/qualification/process-standing'
import { revocationInForce, revokedChain, type Revocation } from '#shared/qualification/revocation'
import type { CodeId } from '#shared/rules/types'

export interface Period { from: string, to: string }

// What a log is built from is read in server/database/sheet-records.ts; packet.ts still imports these two from here.
export { loadCertifiedTests, loadRevocations, loadUses }

interface Use { process: string, weldedOn: string }

/** A test counts for each process it qualifies: every process of a combination coupon (GTAW root, SMAW fill). */
// A welding operator's machine qualification is kept apart (shared/vocabulary/qualified-as.ts) and never holds a manual one.
const holds = (t: CertifiedTest, process: string) => t.qualifiedAs !== 'welding-operator' && (t.processes?.length ? t.processes.includes(process) : t.process === process)

/**
 * Where the welder stands for a process on a day, from the latest certified test on or before it (null: none yet).
 * The standing itself is the shared rule's (processStanding → standingOn in shared/qualification/process-standing.ts).
 */
function standingFromLatestTest(tests: CertifiedTest[], uses: Use[], process: string, day: string, revocations: readonly Revocation[] = []): ProcessStanding | null {
  const held = tests.filter(t => holds(t, process) && t.testDate <= day).sort((a, b) => b.testDate.localeCompare(a.testDate))
  const test = held[0]
  if (!test) return null
  // A revocation in force on that day cuts the chain on its day (QW-322.1(b)) until a new test (QW-322.2(b)).
  const revocation = revocationInForce(revocations.filter(r => r.process === process), held, day)
  if (revocation) {
    const chain = continuityChain({ process, code: test.code as CodeId, edition: test.edition, testDate: test.testDate, uses: uses.filter(u => u.process === process && u.weldedOn < revocation.revokedOn).map(u => u.weldedOn) }, day)
    return chainStandingOn(revokedChain(chain, revocation), day)
  }
  return processStanding({
    process, code: test.code as CodeId, edition: test.edition, testDate: test.testDate,
    uses: uses.filter(u => u.process === process).map(u => u.weldedOn), today: day,
  })
}

// 'no-test': not yet qualified on those days (the first certified test came later); 'never-held': no certified test of
// the process at all up to the end of the period, which the summary lists once, not as a lapse.
// 'revoked': a revocation held (QW-322.1(b)); `reason` is the inspector's.
export interface Gap { process: string, from: string, to: string, why: 'lapsed' | 'revoked' | 'no-test' | 'never-held', reason?: string }

/**
 * The spans of a period on which a welder was not current for a process. processStanding is the rule; this only
 * asks it at the days where the answer can change: a lapse date, or the next certified test after a lapse.
 */
export function gapsInPeriod(tests: CertifiedTest[], uses: Use[], process: string, period: Period, revocations: readonly Revocation[] = []): Gap[] {
  if (!tests.some(t => holds(t, process))) return [{ process, from: period.from, to: period.to, why: 'never-held' }]
  const gaps: Gap[] = []
  let day = period.from
  let guard = 0
  while (day <= period.to && guard++ < 10_000) {
    const standing = standingFromLatestTest(tests, uses, process, day, revocations)
    if (standing && standing.standing !== 'lapsed') {
      // current until the day it lapses, or until a revocation made before then (QW-322.1(b))
      const revoked = revocations.filter(r => r.process === process && r.revokedOn > day).map(r => r.revokedOn).sort()[0]
      day = revoked && revoked < standing.lapsesOn ? revoked : standing.lapsesOn
      continue
    }
    // Not current from `day` until the next certified test of the process.
    const next = tests.filter(t => holds(t, process) && t.testDate > day).map(t => t.testDate).sort()[0]
    const until = next && next <= period.to ? format(addDays(parseISO(next), -1), 'yyyy-MM-dd') : period.to
    gaps.push(standing?.revoked
      ? { process, from: day, to: until, why: 'revoked', reason: standing.revoked.reason }
      : { process, from: day, to: until, why: standing ? 'lapsed' : 'no-test' })
    if (!next) break
    day = next
  }
  return gaps.filter(g => g.from <= g.to)
}

export async function loadContinuityLog(db: Db, welderId: number, period: Period) {
  const welder = await welderOf(db, welderId)
  if (!welder) return null
  const [tests, uses, revocations] = await Promise.all([loadCertifiedTests(db, welderId, period.to), loadUses(db, welderId, period.to), loadRevocations(db, welderId, period.to)])
  const processes = [...new Set([...tests.flatMap(t => (t.processes?.length ? t.processes : [t.process])), ...uses.map(u => u.process)])].sort()
  const inPeriod = uses.filter(u => u.weldedOn >= period.from)
  const standings = processes.map(p => ({ process: p, standing: standingFromLatestTest(tests, uses, p, period.to, revocations), gaps: gapsInPeriod(tests, uses, p, period, revocations) }))
  // What the issued sheet vouches for: the welder, the period, the tests and the uses it prints.
  const content = {
    welder: { id: welder.id, name: welder.name, stamp: welder.stamp },
    period,
    tests: tests.map(t => ({ id: t.id, process: t.process, testDate: t.testDate, procedure: t.procedure })),
    uses: inPeriod.map(u => ({ id: u.id, process: u.process, weldedOn: u.weldedOn, reference: u.reference, recordedBy: u.recordedBy })),
  }
  return { welder, period, tests, uses: inPeriod, standings, sha256: sha256Hex(canonicalJson(content)) }
}
export type ContinuityLog = NonNullable<Awaited<ReturnType<typeof loadContinuityLog>>>
