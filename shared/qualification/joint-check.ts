import { judgeProcedures, judgeWelders, type CandidateRow, type ProcedureRow, type ResolvedJoint } from './joint-coverage'
import type { CoverAnswer } from '../rules/results'
import type { CodeId, Unit } from '../rules/types'

/**
 * The check of a production joint at assignment and at completion: the assigned WPS must cover the joint for each
 * process welded on it, and each welder must hold a certified test that covers the joint for their process and be
 * current for that process on the weld date (ASME IX QW-322.1(a); AWS D1.1 and ISO 9606-1 keep their own periods in
 * the continuity rule). "Cannot tell" is a refusal like "no": the screen shows what to record.
 */

/** The stored joint, as the register keeps it. */
export interface RegisterJoint {
  unit: Unit
  weld: 'groove' | 'fillet'
  pNumberA: string | null
  pNumberB: string | null
  thickness: number | null
  outsideDiameter: number | null
  positions: string[]
  progression: 'uphill' | 'downhill' | null
  backing: boolean | null
}

/** A WPS as the register knows it: status, its processes, and one coverage row per process (transfer and F-Nos. per layer). */
export interface AssignedProcedure {
  id: number
  number: string
  revision: number
  status: string
  code: CodeId
  processes: string[]
  /** Per process: the WPS's ranges for that process's layer. */
  rows: ProcedureRow[]
}

export interface Assignment {
  welderId: number
  stamp: string
  active: boolean
  process: string
  layer: string | null
  fNumber: number | null
  /** The welder's certified tests of the process made on or before the day, with their continuity chain up to that day; null: none. */
  candidate: CandidateRow | null
}

export interface Refusal {
  /** 'wps' for the procedure, 'welder' for a welder × process */
  subject: 'wps' | 'welder'
  process?: string
  welderId?: number
  stamp?: string
  answer: CoverAnswer | 'missing' | 'lapsed'
  reasons: { clause: string, text: string }[]
}

export interface JointFinding {
  subject: 'wps' | 'welder'
  process: string
  welderId?: number
  stamp?: string
  answer: CoverAnswer | 'missing' | 'lapsed'
  lapsesOn?: string
  reasons: { clause: string, text: string, met: boolean }[]
}

export interface JointCheck {
  ok: boolean
  on: string
  findings: JointFinding[]
  refusals: Refusal[]
}

/** The joint as the coverage rules take it, for one process (the WPS's code; P-No. A or B; the welder's F-No.). */
export function resolvedFor(joint: RegisterJoint, code: CodeId, process: string, transfer: string | null, pNumber: string | null, fNumber: number | null): ResolvedJoint {
  const form = joint.outsideDiameter !== null ? 'pipe' : 'plate'
  const value = {
    code, process, unit: joint.unit, form, weld: joint.weld, positions: joint.positions as ('F' | 'H' | 'V' | 'O')[],
    transfer: transfer ?? undefined, pNumber: pNumber ?? undefined, thickness: joint.thickness ?? undefined,
    outsideDiameter: joint.outsideDiameter ?? undefined, progression: joint.progression ?? undefined,
    backing: joint.backing ?? undefined, fNumber: fNumber ?? undefined,
  }
  return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as unknown as ResolvedJoint
}

/** Both base metals of a dissimilar joint are judged; one P-No. when they are the same or only one is stated. */
const pNumbersOf = (joint: RegisterJoint) => [...new Set([joint.pNumberA, joint.pNumberB].filter((p): p is string => Boolean(p)).map(p => p.toUpperCase()))]

const worst = (answers: CoverAnswer[]): CoverAnswer => (answers.includes('not-covered') ? 'not-covered' : answers.includes('cannot-tell') ? 'cannot-tell' : 'covered')

export function checkJoint(input: { joint: RegisterJoint, procedure: AssignedProcedure | null, assignments: Assignment[], on: string }): JointCheck {
  const { joint, procedure, assignments, on } = input
  const findings: JointFinding[] = []
  const processes = [...new Set(assignments.map(a => a.process))]
  const pNumbers = pNumbersOf(joint)
  const pList = pNumbers.length ? pNumbers : [null]

  if (!procedure) {
    findings.push({ subject: 'wps', process: processes.join(', '), answer: 'missing', reasons: [{ clause: 'QW-200.1', text: 'No WPS is assigned: a production joint is welded to a qualified WPS.', met: false }] })
  }
  else if (procedure.status !== 'approved') {
    findings.push({ subject: 'wps', process: processes.join(', '), answer: 'not-covered', reasons: [{ clause: 'WPS status', text: `WPS ${procedure.number} rev. ${procedure.revision} is ${procedure.status}, not approved.`, met: false }] })
  }
  else {
    for (const process of processes.length ? processes : procedure.processes) {
      const row = procedure.rows.find(r => r.process === process)
      if (!row) {
        findings.push({ subject: 'wps', process, answer: 'not-covered', reasons: [{ clause: 'QW-401', text: `WPS ${procedure.number} has no ${process} layer.`, met: false }] })
        continue
      }
      const fNumbers = [...new Set(assignments.filter(a => a.process === process).map(a => a.fNumber))]
      const verdicts = pList.flatMap(p => (fNumbers.length ? fNumbers : [null]).map(f => judgeProcedures([row], resolvedFor(joint, procedure.code, process, row.transfer, p, f))[0]!))
      const answer: CoverAnswer = verdicts.every(v => v.covered) ? 'covered' : verdicts.some(v => v.reasons.some(r => !r.met && r.state !== 'not-recorded')) ? 'not-covered' : 'cannot-tell'
      const reasons = dedupe(verdicts.flatMap(v => v.reasons.map(r => ({ clause: r.clause, text: r.text, met: r.met }))))
      findings.push({ subject: 'wps', process, answer, reasons })
    }
  }

  for (const a of assignments) {
    const base = { subject: 'welder' as const, process: a.process, welderId: a.welderId, stamp: a.stamp }
    if (!a.active) {
      findings.push({ ...base, answer: 'missing', reasons: [{ clause: 'roster', text: `${a.stamp} is not active on the roster.`, met: false }] })
      continue
    }
    if (!a.candidate || !a.candidate.tests.length) {
      findings.push({ ...base, answer: 'missing', reasons: [{ clause: 'QW-301', text: `${a.stamp} has no certified ${a.process} test made on or before ${on}.`, met: false }] })
      continue
    }
    const code = procedure?.code ?? (a.candidate.tests[0]!.code as CodeId)
    const transfer = procedure?.rows.find(r => r.process === a.process)?.transfer ?? null
    const judged = pList.map(p => judgeWelders([a.candidate!], resolvedFor(joint, code, a.process, transfer, p, a.fNumber), on)[0]!)
    const answer = worst(judged.map(j => j.answer))
    const standing = judged[0]!.standing
    const reasons = dedupe(judged.flatMap(j => j.reasons.map(r => ({ clause: r.clause, text: r.text, met: r.met }))))
    if (standing.standing === 'lapsed') {
      findings.push({ ...base, answer: 'lapsed', lapsesOn: standing.lapsesOn, reasons: [{ clause: 'QW-322.1(a)', text: `${a.stamp}'s ${a.process} qualification lapsed on ${standing.lapsesOn} (last use ${standing.lastUse}); it is not current on ${on}.`, met: false }, ...reasons] })
      continue
    }
    findings.push({ ...base, answer, lapsesOn: standing.lapsesOn, reasons })
  }

  const refusals: Refusal[] = findings.filter(f => f.answer !== 'covered').map(f => ({
    subject: f.subject, process: f.process, welderId: f.welderId, stamp: f.stamp, answer: f.answer,
    reasons: f.reasons.filter(r => !r.met).map(({ clause, text }) => ({ clause, text })),
  }))
  if (!assignments.length) refusals.push({ subject: 'welder', answer: 'missing', reasons: [{ clause: 'register', text: 'No welder is named on the joint.' }] })
  return { ok: refusals.length === 0, on, findings, refusals }
}

function dedupe<T extends { clause: string, text: string }>(list: T[]): T[] {
  const seen = new Set<string>()
  return list.filter(r => (seen.has(`${r.clause}|${r.text}`) ? false : (seen.add(`${r.clause}|${r.text}`), true)))
}

/** One line per refusal, for the 422 message, the audit trail and the printed override. */
export function refusalLines(refusals: Refusal[]): string[] {
  return refusals.map((r) => {
    const who = r.subject === 'wps' ? `WPS${r.process ? ` (${r.process})` : ''}` : `${r.stamp ?? 'welder'}${r.process ? ` ${r.process}` : ''}`
    const word = r.answer === 'cannot-tell' ? 'cannot tell' : r.answer === 'lapsed' ? 'not current' : r.answer === 'missing' ? 'missing' : 'not covered'
    return `${who}: ${word}: ${r.reasons.map(x => x.text).join(' ')}`
  })
}
