import { and, asc, count, desc, eq, ilike, inArray, lte, max, or, sql } from 'drizzle-orm'
import type { Db } from './client'
import {
  auditEvents, auditorGrants, continuityEntries, issuedSheets, jointExaminations, jointOverrides, jointRepairs, jointWelders, joints, procedures, projectProcedures, projectWelders, projects,
  signatures, welders,
} from './schema'
import { recordAudit } from './audit'
import { auditTokenUse } from './api-tokens'
import { newVerifyCode } from './signing'
import type { SessionUser } from '../utils/auth'
import { allOf, containsPattern, orderOf, pageOf } from '../utils/list'
import { settle } from '../utils/outcome'
import { parseWeldLog } from '../utils/weld-log-csv'
import { fieldFailure, forbidden, frozen, invalid, isFailure, missing, refused, stale, type Failure, type Outcome } from '../../shared/types/outcome'
import { checkJoint, refusalLines, type AssignedProcedure, type Assignment, type JointCheck, type RegisterJoint, type Refusal } from '../../shared/qualification/joint-check'
import type { CandidateRow, ProcedureRow, TestRow } from '../../shared/qualification/joint-coverage'
import { continuityChain } from '../../shared/qualification/process-standing'
import { rejectRateOf, rejectRates, type ExamFact } from '../../shared/qualification/reject-rate'
import type { CodeId, Unit } from '../../shared/rules/types'
import type {
  ExternalWeldedInput, JointExaminationInput, JointInput, JointListQuery, JointPatch, JointRepairInput, JointWeldedInput, JointWelderInput,
} from '../../shared/schemas/joints'

/** The weld register of a project: its joints, who welded them, the check on the weld date, examinations and repairs. */

const asTx = (tx: unknown) => tx as Db
type JointRow = typeof joints.$inferSelect

// Who may read a project's register: as the project (the supervisor any, an auditor the granted ones); the inspector too,
// who records the joints' examinations. Writing the register is the supervisor's; examinations the inspector's and supervisor's.
export async function mayReadRegister(db: Db, user: SessionUser, projectId: number) {
  const [project] = await db.select({ id: projects.id }).from(projects).where(eq(projects.id, projectId))
  if (!project) return false
  if (user.role === 'supervisor' || user.role === 'inspector') return true
  if (user.role !== 'auditor') return false
  // The same grant as the project's own page (mayReadProject in projects.ts)
  const granted = await db.select({ id: auditorGrants.projectId }).from(auditorGrants)
    .where(and(eq(auditorGrants.accountId, user.id), eq(auditorGrants.projectId, projectId)))
  return granted.length > 0
}

async function jointOf(db: Db, user: SessionUser, projectId: number, jointId: number): Promise<Outcome<JointRow>> {
  if (!await mayReadRegister(db, user, projectId)) return missing('Joint')
  const [row] = await db.select().from(joints).where(and(eq(joints.id, jointId), eq(joints.projectId, projectId)))
  return row ?? missing('Joint')
}

const registerJoint = (j: Pick<JointRow, 'unit' | 'weld' | 'pNumberA' | 'pNumberB' | 'thickness' | 'outsideDiameter' | 'positions' | 'progression' | 'backing'>): RegisterJoint => ({
  unit: j.unit as Unit, weld: j.weld as 'groove' | 'fillet', pNumberA: j.pNumberA, pNumberB: j.pNumberB, thickness: j.thickness,
  outsideDiameter: j.outsideDiameter, positions: j.positions, progression: j.progression as 'uphill' | 'downhill' | null, backing: j.backing,
})

interface LayerLike { process?: string, transfer?: string | null, fillers?: { fNumber?: string }[] }

/** The WPS with one coverage row per process: the layer's transfer and F-Nos. where its layers state them. */
export async function assignedProcedure(db: Db, procedureId: number | null): Promise<AssignedProcedure | null> {
  if (procedureId === null) return null
  const [p] = await db.select().from(procedures).where(eq(procedures.id, procedureId))
  if (!p) return null
  const layers = (Array.isArray(p.layers) ? p.layers : []) as LayerLike[]
  const processList = p.processes.length ? p.processes : [p.process]
  const rows: ProcedureRow[] = processList.map((process) => {
    const own = layers.filter(l => l.process === process)
    const fNumbers = [...new Set(own.flatMap(l => (l.fillers ?? []).map(f => f.fNumber).filter((f): f is string => Boolean(f))))]
    return {
      id: p.id, number: p.number, revision: p.revision, title: p.title, code: p.code, edition: p.edition, unit: p.unit, process,
      transfer: own.find(l => l.transfer)?.transfer ?? (process === p.process ? p.transfer : null), p_number_a: p.pNumberA, p_number_b: p.pNumberB,
      thickness_min: p.thicknessMin, thickness_max: p.thicknessMax, diameter_min: p.diameterMin, positions: p.positions,
      f_numbers: fNumbers.length ? fNumbers : p.fNumbers,
    }
  })
  return { id: p.id, number: p.number, revision: p.revision, status: p.status, code: p.code as CodeId, processes: processList, rows }
}

type TestFact = TestRow & { welder_id: number, name: string, stamp: string }

/** What the check needs to know of welders' history: their certified tests and continuity uses per welder × process. */
export interface CandidateFacts {
  /** `welderId|process` → the certified tests of that process made on or before the last day asked, newest first */
  tests: Map<string, TestFact[]>
  /** `welderId|process` → the days of the continuity entries of that process up to the last day asked */
  uses: Map<string, string[]>
}

const factKey = (welderId: number, process: string) => `${welderId}|${process}`

/**
 * Every certified test and continuity use of these welders for these processes up to `upTo`, in two queries however many
 * welders, processes and days the caller then asks about (candidatesFrom picks a day).
 */
export async function candidateFacts(db: Db, welderIds: number[], processes: string[], upTo: string): Promise<CandidateFacts> {
  const facts: CandidateFacts = { tests: new Map(), uses: new Map() }
  const ids = [...new Set(welderIds)]
  const list = [...new Set(processes)]
  if (!ids.length || !list.length) return facts
  const idList = sql.join(ids.map(id => sql`${id}`), sql`, `)
  const processList = sql.join(list.map(process => sql`${process}`), sql`, `)
  const tests = await db.execute(sql`
    select t.id, t.welder_id, t.test_date::text as test_date, t.code, t.edition, t.unit, p.process::text as process,
           case when d.e is null then t.transfer else d.e->>'transfer' end as transfer, t.form, t.weld, t.coupon_thickness,
           case when d.e is null then t.deposit_thickness else (d.e->>'depositThickness')::float8 end as deposit_thickness, t.layers,
           t.outside_diameter, t.p_number, t.f_number, t.backing, t.positions, t.progression, w.name, w.stamp
    from welder_tests t
      join welders w on w.id = t.welder_id
      join (select unnest(array[${processList}]::text[]) as process) p on t.process = p.process or p.process = any(t.processes)
      left join lateral (select e from jsonb_array_elements(t.deposits) e where e->>'process' = p.process limit 1) d on true
    where t.status = 'certified' and t.test_date <= ${upTo}::date and t.welder_id in (${idList})
    order by t.test_date desc, t.id desc`) as unknown as { rows: TestFact[] }
  for (const row of tests.rows) {
    const key = factKey(Number(row.welder_id), row.process)
    const positions = Array.isArray(row.positions) ? row.positions : String(row.positions).replace(/^\{|\}$/g, '').split(',').filter(Boolean)
    facts.tests.set(key, [...(facts.tests.get(key) ?? []), { ...row, positions }])
  }
  const uses = await db.select({ welderId: continuityEntries.welderId, process: continuityEntries.process, weldedOn: continuityEntries.weldedOn }).from(continuityEntries)
    .where(and(inArray(continuityEntries.welderId, ids), inArray(continuityEntries.process, list), lte(continuityEntries.weldedOn, upTo)))
  for (const use of uses) {
    const key = factKey(use.welderId, use.process)
    facts.uses.set(key, [...(facts.uses.get(key) ?? []), use.weldedOn])
  }
  return facts
}

/**
 * Each welder's certified tests of a process made on or before `on`, and the continuity chain of that process as it
 * stood on `on` (the newest such test starts it, uses up to that day keep it): where the welder stood that day.
 */
export function candidatesFrom(facts: CandidateFacts, welderIds: number[], process: string, on: string): Map<number, CandidateRow> {
  const result = new Map<number, CandidateRow>()
  for (const id of new Set(welderIds)) {
    const tests = (facts.tests.get(factKey(id, process)) ?? []).filter(t => t.test_date <= on)
    const newest = tests[0]
    if (!newest) continue
    const uses = (facts.uses.get(factKey(id, process)) ?? []).filter(day => day <= on)
    // The newest test on or before the day starts the chain (QW-322.2(a) renewal restores the process).
    const chain = continuityChain({ process, code: newest.code as CodeId, edition: newest.edition, testDate: newest.test_date, uses }, on)
    result.set(id, { id, name: newest.name, stamp: newest.stamp, tests: tests.map(({ welder_id: _w, name: _n, stamp: _s, ...test }) => test), chain })
  }
  return result
}

/** Where each of these welders stood in a process on a day (see candidatesFrom). */
export async function candidatesOn(db: Db, welderIds: number[], process: string, on: string): Promise<Map<number, CandidateRow>> {
  return candidatesFrom(await candidateFacts(db, welderIds, [process], on), welderIds, process, on)
}

/** What a check reads from the database, fetched once for many joints (a weld log import) or for one. */
export interface CheckContext {
  procedures: Map<number, AssignedProcedure | null>
  roster: Map<number, { stamp: string, status: string }>
  facts: CandidateFacts
}

/** The WPSs, the welders and their history that checks of these crews up to `upTo` need: a handful of queries in all. */
export async function checkContext(db: Db, procedureIds: (number | null)[], crews: JointWelderInput[][], upTo: string): Promise<CheckContext> {
  const procedureMap = new Map<number, AssignedProcedure | null>()
  for (const id of new Set(procedureIds)) {
    if (id !== null) procedureMap.set(id, await assignedProcedure(db, id))
  }
  const all = crews.flat()
  const ids = [...new Set(all.map(c => c.welderId))]
  const rows = ids.length ? await db.select({ id: welders.id, stamp: welders.stamp, status: welders.status }).from(welders).where(inArray(welders.id, ids)) : []
  const facts = await candidateFacts(db, ids, all.map(c => c.process), upTo)
  return { procedures: procedureMap, roster: new Map(rows.map(r => [r.id, r])), facts }
}

/** The check of one joint from a fetched context (no query). */
export function checkWith(context: CheckContext, joint: RegisterJoint, procedureId: number | null, crew: JointWelderInput[], on: string): JointCheck {
  const procedure = procedureId === null ? null : context.procedures.get(procedureId) ?? null
  const assignments: Assignment[] = crew.map((c) => {
    const w = context.roster.get(c.welderId)
    return {
      welderId: c.welderId, stamp: w?.stamp ?? `#${c.welderId}`, active: w?.status === 'active', process: c.process, layer: c.layer,
      fNumber: c.fNumber, candidate: candidatesFrom(context.facts, [c.welderId], c.process, on).get(c.welderId) ?? null,
    }
  })
  return checkJoint({ joint, procedure, assignments, on })
}

/** The check of a joint's WPS and welders on a day (assignment: today; completion and repair: the weld date). */
export async function checkAssignment(db: Db, joint: RegisterJoint, procedureId: number | null, crew: JointWelderInput[], on: string): Promise<JointCheck> {
  return checkWith(await checkContext(db, [procedureId], [crew], on), joint, procedureId, crew, on)
}

/** A refused check passes only with a supervisor's written reason; it is kept with the joint (printed) and audited. */
function gate(user: SessionUser, check: JointCheck, override: string | undefined): Failure | null {
  if (check.ok) return null
  if (override === undefined) {
    return refused('The check refuses this joint', refusalLines(check.refusals).join(' | '), { refusals: check.refusals, findings: check.findings, on: check.on })
  }
  if (user.role !== 'supervisor') return forbidden('Only the quality manager may let a refused joint through')
  return null
}

async function storeOverride(tx: Db, user: SessionUser, jointId: number, stage: 'assignment' | 'completion' | 'repair', check: JointCheck, reason: string | undefined) {
  if (check.ok || reason === undefined) return
  const [row] = await tx.insert(jointOverrides).values({ jointId, stage, reason, refusals: check.refusals, accountId: user.id, accountName: user.name }).returning()
  await recordAudit(tx, { accountId: user.id, action: 'override', recordType: 'joint', recordId: jointId, after: { stage, reason, refusals: refusalLines(check.refusals), overrideId: row!.id } })
}

async function crewFailure(db: Db, projectId: number, input: Pick<JointInput, 'procedureId' | 'welders'>): Promise<Failure | null> {
  if (input.procedureId !== null) {
    const [p] = await db.select({ status: procedures.status }).from(procedures).where(eq(procedures.id, input.procedureId))
    if (!p) return fieldFailure('procedureId', 'Choose an existing WPS')
    const [linked] = await db.select({ id: projectProcedures.procedureId }).from(projectProcedures)
      .where(and(eq(projectProcedures.projectId, projectId), eq(projectProcedures.procedureId, input.procedureId)))
    if (!linked) return fieldFailure('procedureId', 'Attach this WPS to the project first')
  }
  const ids = [...new Set(input.welders.map(w => w.welderId))]
  if (ids.length) {
    const found = await db.select({ id: welders.id }).from(welders).where(inArray(welders.id, ids))
    if (found.length !== ids.length) return fieldFailure('welders', 'Choose welders on the roster')
  }
  return null
}

const columnsOf = (input: JointInput) => ({
  mark: input.mark, jointType: input.jointType, weld: input.weld, unit: input.unit, pNumberA: input.pNumberA, pNumberB: input.pNumberB,
  thickness: input.thickness, outsideDiameter: input.outsideDiameter, positions: input.positions, progression: input.progression,
  backing: input.backing, rtPercent: input.rtPercent, utPercent: input.utPercent, mt: input.mt, pt: input.pt, procedureId: input.procedureId,
})

async function markTaken(db: Db, projectId: number, mark: string, except?: number) {
  const rows = await db.select({ id: joints.id }).from(joints).where(and(eq(joints.projectId, projectId), eq(joints.mark, mark)))
  return rows.some(r => r.id !== except)
}

/** A new joint; when a WPS or welders are assigned, the check runs on `today` and refuses with reasons (or an override). */
export async function createJoint(db: Db, user: SessionUser, projectId: number, input: JointInput, today: string) {
  const [project] = await db.select({ id: projects.id }).from(projects).where(eq(projects.id, projectId))
  if (!project) return missing('Project')
  const bad = await crewFailure(db, projectId, input)
  if (bad) return bad
  if (await markTaken(db, projectId, input.mark)) return fieldFailure('mark', 'This project has a joint of this mark already')
  const check = input.welders.length ? await checkAssignment(db, registerJoint(input), input.procedureId, input.welders, today) : null
  const stop = check && gate(user, check, input.override)
  if (stop) return stop
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(joints).values({ ...columnsOf(input), projectId, createdBy: user.id }).returning()
    if (input.welders.length) await tx.insert(jointWelders).values(input.welders.map(w => ({ ...w, jointId: row!.id, repair: 0 })))
    await recordAudit(asTx(tx), { accountId: user.id, action: 'create', recordType: 'joint', recordId: row!.id, after: { ...row, welders: input.welders } })
    if (check) await storeOverride(asTx(tx), user, row!.id, 'assignment', check, input.override)
    return { ...row!, check }
  })
}

/** Edits an open joint (a welded joint is part of the record: repairs and examinations are added to it instead). */
export async function updateJoint(db: Db, user: SessionUser, projectId: number, jointId: number, input: JointPatch, today: string) {
  const before = await jointOf(db, user, projectId, jointId)
  if ('fail' in before) return before
  if (before.weldedOn) return frozen('This joint is marked welded; add a repair or an examination instead')
  if (before.version !== input.version) return stale('Someone changed this joint since you opened it; reload and try again.')
  const bad = await crewFailure(db, projectId, input)
  if (bad) return bad
  if (await markTaken(db, projectId, input.mark, jointId)) return fieldFailure('mark', 'This project has a joint of this mark already')
  const check = input.welders.length ? await checkAssignment(db, registerJoint(input), input.procedureId, input.welders, today) : null
  const stop = check && gate(user, check, input.override)
  if (stop) return stop
  return settle(() => db.transaction(async (tx) => {
    const [row] = await tx.update(joints).set({ ...columnsOf(input), version: before.version + 1, updatedAt: new Date() })
      .where(and(eq(joints.id, jointId), eq(joints.version, input.version))).returning()
    if (!row) throw stale('Someone changed this joint since you opened it; reload and try again.')
    await tx.delete(jointWelders).where(and(eq(jointWelders.jointId, jointId), eq(jointWelders.repair, 0)))
    if (input.welders.length) await tx.insert(jointWelders).values(input.welders.map(w => ({ ...w, jointId, repair: 0 })))
    await recordAudit(asTx(tx), { accountId: user.id, action: 'update', recordType: 'joint', recordId: jointId, before, after: { ...row, welders: input.welders } })
    if (check) await storeOverride(asTx(tx), user, jointId, 'assignment', check, input.override)
    return { ...row, check }
  }))
}

export async function deleteJoint(db: Db, user: SessionUser, projectId: number, jointId: number) {
  const before = await jointOf(db, user, projectId, jointId)
  if ('fail' in before) return before
  if (before.weldedOn) return frozen('A welded joint stays in the register')
  await db.transaction(async (tx) => {
    await tx.delete(joints).where(eq(joints.id, jointId))
    await recordAudit(asTx(tx), { accountId: user.id, action: 'delete', recordType: 'joint', recordId: jointId, before })
  })
  return { ok: true as const }
}

const crewOf = async (db: Db, jointId: number, repair: number): Promise<JointWelderInput[]> =>
  (await db.select({ welderId: jointWelders.welderId, process: jointWelders.process, layer: jointWelders.layer, fNumber: jointWelders.fNumber })
    .from(jointWelders).where(and(eq(jointWelders.jointId, jointId), eq(jointWelders.repair, repair))).orderBy(asc(jointWelders.id)))
    .map(w => ({ ...w, process: w.process as JointWelderInput['process'], layer: w.layer as JointWelderInput['layer'] }))

/** One continuity entry per welder and process on the weld date, naming the joint (QW-322.1(a): the use keeps the process current). */
async function postContinuity(tx: Db, user: SessionUser, jointId: number, crew: JointWelderInput[], weldedOn: string, reference: string) {
  const uses = [...new Map(crew.map(c => [`${c.welderId}|${c.process}`, { welderId: c.welderId, process: c.process }])).values()]
  if (!uses.length) return 0
  await tx.insert(continuityEntries).values(uses.map(u => ({ ...u, weldedOn, reference, jointId, recordedBy: user.id })))
  await recordAudit(tx, { accountId: user.id, action: 'from-joint', recordType: 'continuity', recordId: null, after: { jointId, weldedOn, uses } })
  return uses.length
}

const referenceOf = async (db: Db, projectId: number, mark: string, repair = 0) => {
  const [p] = await db.select({ number: projects.number }).from(projects).where(eq(projects.id, projectId))
  return `${p?.number ?? 'project'} joint ${mark}${repair ? ` R${repair}` : ''}`
}

const summaryOf = (check: JointCheck) => check.findings.filter(f => f.subject === 'welder').map(f => ({ welderId: f.welderId, stamp: f.stamp, process: f.process, answer: f.answer, lapsesOn: f.lapsesOn ?? null }))

/** Marks a joint welded on a day: the check on that day (refused with reasons, or overridden), then continuity is posted. */
export async function markWelded(db: Db, user: SessionUser, projectId: number, jointId: number, input: JointWeldedInput, today: string, welded?: JointWelderInput[]) {
  const before = await jointOf(db, user, projectId, jointId)
  if ('fail' in before) return before
  if (before.weldedOn) return frozen(`This joint was marked welded on ${before.weldedOn}`)
  if (before.version !== input.version) return stale('Someone changed this joint since you opened it; reload and try again.')
  if (input.weldedOn > today) return fieldFailure('weldedOn', 'The date is after today')
  // A production system reports who welded it; otherwise the welders assigned in the register did
  const crew = welded ?? await crewOf(db, jointId, 0)
  if (!crew.length) return fieldFailure('welders', 'Name the welders of this joint first')
  const check = await checkAssignment(db, registerJoint(before), before.procedureId, crew, input.weldedOn)
  const stop = gate(user, check, input.override)
  if (stop) return stop
  const reference = await referenceOf(db, projectId, before.mark)
  return settle(() => db.transaction(async (tx) => {
    const [row] = await tx.update(joints).set({ weldedOn: input.weldedOn, completionCheck: summaryOf(check), version: before.version + 1, updatedAt: new Date() })
      .where(and(eq(joints.id, jointId), eq(joints.version, input.version))).returning()
    if (!row) throw stale('Someone changed this joint since you opened it; reload and try again.')
    if (welded) {
      await tx.delete(jointWelders).where(and(eq(jointWelders.jointId, jointId), eq(jointWelders.repair, 0)))
      await tx.insert(jointWelders).values(welded.map(w => ({ ...w, jointId, repair: 0 })))
    }
    await storeOverride(asTx(tx), user, jointId, 'completion', check, input.override)
    const posted = await postContinuity(asTx(tx), user, jointId, crew, input.weldedOn, reference)
    await recordAudit(asTx(tx), { accountId: user.id, action: 'welded', recordType: 'joint', recordId: jointId, before: { weldedOn: null }, after: { weldedOn: input.weldedOn, posted } })
    return { ...row, check, posted }
  }))
}

/** A repair R1, R2...: its welders are checked on the repair date like the original ones, and their continuity is posted. */
export async function addRepair(db: Db, user: SessionUser, projectId: number, jointId: number, input: JointRepairInput, today: string) {
  const joint = await jointOf(db, user, projectId, jointId)
  if ('fail' in joint) return joint
  if (!joint.weldedOn) return frozen('Mark the joint welded before repairing it')
  if (input.weldedOn > today) return fieldFailure('weldedOn', 'The date is after today')
  if (input.weldedOn < joint.weldedOn) return fieldFailure('weldedOn', `The repair cannot be before the weld (${joint.weldedOn})`)
  const bad = await crewFailure(db, projectId, { procedureId: null, welders: input.welders })
  if (bad) return bad
  const [last] = await db.select({ n: max(jointRepairs.repair) }).from(jointRepairs).where(eq(jointRepairs.jointId, jointId))
  const repair = (last?.n ?? 0) + 1
  if (repair > 9) return fieldFailure('cause', 'A joint takes at most nine repairs')
  const check = await checkAssignment(db, registerJoint(joint), joint.procedureId, input.welders, input.weldedOn)
  const stop = gate(user, check, input.override)
  if (stop) return stop
  const reference = await referenceOf(db, projectId, joint.mark, repair)
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(jointRepairs).values({ jointId, repair, cause: input.cause, weldedOn: input.weldedOn }).returning()
    await tx.insert(jointWelders).values(input.welders.map(w => ({ ...w, jointId, repair })))
    await storeOverride(asTx(tx), user, jointId, 'repair', check, input.override)
    const posted = await postContinuity(asTx(tx), user, jointId, input.welders, input.weldedOn, reference)
    await recordAudit(asTx(tx), { accountId: user.id, action: 'repair', recordType: 'joint', recordId: jointId, after: { ...row, welders: input.welders, posted } })
    return { ...row!, check, posted }
  })
}

/** An examination result of the weld or of one of its repairs (inspector or supervisor). */
export async function addExamination(db: Db, user: SessionUser, projectId: number, jointId: number, input: JointExaminationInput, today: string) {
  const joint = await jointOf(db, user, projectId, jointId)
  if ('fail' in joint) return joint
  if (!joint.weldedOn) return frozen('Mark the joint welded before recording its examinations')
  if (input.examinedOn > today) return fieldFailure('examinedOn', 'The date is after today')
  if (input.examinedOn < joint.weldedOn) return fieldFailure('examinedOn', `The examination cannot be before the weld (${joint.weldedOn})`)
  if (input.repair > 0) {
    const [r] = await db.select({ id: jointRepairs.id }).from(jointRepairs).where(and(eq(jointRepairs.jointId, jointId), eq(jointRepairs.repair, input.repair)))
    if (!r) return fieldFailure('repair', `This joint has no repair R${input.repair}`)
  }
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(jointExaminations).values({ ...input, jointId, recordedBy: user.id }).returning()
    await recordAudit(asTx(tx), { accountId: user.id, action: 'examination', recordType: 'joint', recordId: jointId, after: row })
    return row!
  })
}

/** The joint's state in the register: open, welded, rejected (its latest weld or repair has a rejected result), repaired. */
const statusSql = sql<string>`case
  when ${joints.weldedOn} is null then 'open'
  when exists (select 1 from joint_examinations x where x.joint_id = ${joints.id} and not x.accepted
    and x.repair = (select coalesce(max(r.repair), 0) from joint_repairs r where r.joint_id = ${joints.id})) then 'rejected'
  when exists (select 1 from joint_repairs r where r.joint_id = ${joints.id}) then 'repaired'
  else 'welded' end`

const jointSortColumns = { mark: joints.mark, weldedOn: joints.weldedOn, procedure: procedures.number }

/** A project's register, paged, sorted and filtered on the server. */
export async function listJoints(db: Db, user: SessionUser, projectId: number, query: JointListQuery) {
  if (!await mayReadRegister(db, user, projectId)) return missing('Project')
  const where = allOf([
    eq(joints.projectId, projectId),
    query.q && or(ilike(joints.mark, containsPattern(query.q)), ilike(procedures.number, containsPattern(query.q))),
    query.status && sql`${statusSql} = ${query.status}`,
    query.welderId && sql`exists (select 1 from joint_welders jw where jw.joint_id = ${joints.id} and jw.welder_id = ${query.welderId})`,
  ])
  return pageOf(query, ({ limit, offset }) => db.select({
    id: joints.id, mark: joints.mark, jointType: joints.jointType, weld: joints.weld, unit: joints.unit, pNumberA: joints.pNumberA, pNumberB: joints.pNumberB,
    thickness: joints.thickness, outsideDiameter: joints.outsideDiameter, positions: joints.positions, weldedOn: joints.weldedOn,
    rtPercent: joints.rtPercent, utPercent: joints.utPercent, procedureId: joints.procedureId, procedureNumber: procedures.number,
    procedureRevision: procedures.revision, status: statusSql,
    welders: sql<string>`(select string_agg(distinct w.stamp || ' ' || jw.process, ', ') from joint_welders jw join welders w on w.id = jw.welder_id where jw.joint_id = ${joints.id} and jw.repair = 0)`,
    overridden: sql<boolean>`exists (select 1 from joint_overrides o where o.joint_id = ${joints.id})`,
  }).from(joints).leftJoin(procedures, eq(procedures.id, joints.procedureId)).where(where)
    .orderBy(orderOf(jointSortColumns[query.sort], query.dir), joints.id).limit(limit).offset(offset),
  () => db.select({ total: count() }).from(joints).leftJoin(procedures, eq(procedures.id, joints.procedureId)).where(where))
}

/** One joint with its welders (per repair), repairs, examinations, overrides and the continuity it posted. */
export async function jointPage(db: Db, user: SessionUser, projectId: number, jointId: number) {
  const joint = await jointOf(db, user, projectId, jointId)
  if ('fail' in joint) return joint
  const crew = await db.select({ id: jointWelders.id, welderId: jointWelders.welderId, stamp: welders.stamp, name: welders.name, process: jointWelders.process, layer: jointWelders.layer, fNumber: jointWelders.fNumber, repair: jointWelders.repair })
    .from(jointWelders).innerJoin(welders, eq(welders.id, jointWelders.welderId)).where(eq(jointWelders.jointId, jointId)).orderBy(asc(jointWelders.repair), asc(jointWelders.id))
  const repairs = await db.select().from(jointRepairs).where(eq(jointRepairs.jointId, jointId)).orderBy(asc(jointRepairs.repair))
  const examinations = await db.select().from(jointExaminations).where(eq(jointExaminations.jointId, jointId)).orderBy(asc(jointExaminations.examinedOn), asc(jointExaminations.id))
  const overrides = await db.select().from(jointOverrides).where(eq(jointOverrides.jointId, jointId)).orderBy(asc(jointOverrides.at))
  const continuity = await db.select({ id: continuityEntries.id, welderId: continuityEntries.welderId, process: continuityEntries.process, weldedOn: continuityEntries.weldedOn, reference: continuityEntries.reference })
    .from(continuityEntries).where(eq(continuityEntries.jointId, jointId)).orderBy(asc(continuityEntries.weldedOn), asc(continuityEntries.id))
  const [procedure] = joint.procedureId === null ? [] : await db.select({ id: procedures.id, number: procedures.number, revision: procedures.revision, title: procedures.title, status: procedures.status }).from(procedures).where(eq(procedures.id, joint.procedureId))
  const [project] = await db.select({ id: projects.id, number: projects.number, name: projects.name }).from(projects).where(eq(projects.id, projectId))
  return { joint, project: project!, procedure: procedure ?? null, welders: crew, repairs, examinations, overrides: user.role === 'auditor' ? overrides.map(({ accountId: _a, ...o }) => o) : overrides, continuity }
}

/** The check of a joint as it stands, on a day (the register's "check now" and the joint tag). */
export async function checkJointOn(db: Db, user: SessionUser, projectId: number, jointId: number, on: string) {
  const joint = await jointOf(db, user, projectId, jointId)
  if ('fail' in joint) return joint
  const [last] = await db.select({ n: max(jointRepairs.repair) }).from(jointRepairs).where(eq(jointRepairs.jointId, jointId))
  return checkAssignment(db, registerJoint(joint), joint.procedureId, await crewOf(db, jointId, last?.n ?? 0), on)
}

/** What the register's form offers: the project's WPSs and welders. */
export async function registerChoices(db: Db, user: SessionUser, projectId: number) {
  if (!await mayReadRegister(db, user, projectId)) return missing('Project')
  const procs = await db.select({ id: procedures.id, number: procedures.number, revision: procedures.revision, title: procedures.title, status: procedures.status, processes: procedures.processes, process: procedures.process })
    .from(projectProcedures).innerJoin(procedures, eq(procedures.id, projectProcedures.procedureId)).where(eq(projectProcedures.projectId, projectId)).orderBy(asc(procedures.number), desc(procedures.revision))
  const roster = await db.select({ id: welders.id, stamp: welders.stamp, name: welders.name, status: welders.status }).from(welders).orderBy(asc(welders.stamp))
  return { procedures: procs, welders: roster }
}

/** Certified tests exist for these welders (used by the weld-log import to name unknown stamps). */
export async function rosterByStamp(db: Db) {
  return db.select({ id: welders.id, stamp: welders.stamp, status: welders.status }).from(welders)
}

/** The volumetric results of the welds each welder made (a repair's results go to its repair welders). */
async function examFacts(db: Db, welderIds?: number[]): Promise<ExamFact[]> {
  const rows = await db.selectDistinct({
    welderId: jointWelders.welderId, jointId: jointExaminations.jointId, repair: jointExaminations.repair, method: jointExaminations.method,
    examinedOn: jointExaminations.examinedOn, accepted: jointExaminations.accepted, lengthExamined: jointExaminations.lengthExamined,
    defectLength: jointExaminations.defectLength, id: jointExaminations.id,
  }).from(jointExaminations)
    .innerJoin(jointWelders, and(eq(jointWelders.jointId, jointExaminations.jointId), eq(jointWelders.repair, jointExaminations.repair)))
    .where(allOf([inArray(jointExaminations.method, ['RT', 'UT']), welderIds && inArray(jointWelders.welderId, welderIds)]))
  return rows.map(({ id: _id, ...r }) => ({ ...r, method: r.method as 'RT' | 'UT' }))
}

/** One welder's reject rate and trend (staff any welder; a welder their own, 404 otherwise). */
export async function welderRejectRate(db: Db, user: SessionUser, welderId: number, today: string) {
  if (user.role === 'welder' && user.welderId !== welderId) return missing('Welder')
  const [w] = await db.select({ id: welders.id }).from(welders).where(eq(welders.id, welderId))
  if (!w) return missing('Welder')
  return rejectRateOf(welderId, await examFacts(db, [welderId]), today)
}

/** The dashboard's reject rates: every welder with examined welds, flagged ones first. */
export async function rejectBoard(db: Db, today: string) {
  const rates = rejectRates(await examFacts(db), today)
  const roster = await db.select({ id: welders.id, stamp: welders.stamp, name: welders.name }).from(welders)
  return rates.map(r => ({ ...r, stamp: roster.find(w => w.id === r.welderId)?.stamp ?? '', name: roster.find(w => w.id === r.welderId)?.name ?? '' }))
    .sort((a, b) => Number(b.flagged) - Number(a.flagged) || (b.rate ?? 0) - (a.rate ?? 0) || a.stamp.localeCompare(b.stamp))
}

/** The whole register of a project for its packet: each joint with its WPS, welders and the check kept at completion, results, overrides. */
export async function registerForPacket(db: Db, projectId: number) {
  const rows = await db.select({
    id: joints.id, mark: joints.mark, jointType: joints.jointType, weld: joints.weld, unit: joints.unit, pNumberA: joints.pNumberA, pNumberB: joints.pNumberB,
    thickness: joints.thickness, outsideDiameter: joints.outsideDiameter, positions: joints.positions, weldedOn: joints.weldedOn,
    completionCheck: joints.completionCheck, procedureNumber: procedures.number, procedureRevision: procedures.revision,
  }).from(joints).leftJoin(procedures, eq(procedures.id, joints.procedureId)).where(eq(joints.projectId, projectId)).orderBy(asc(joints.mark), asc(joints.id))
  if (!rows.length) return []
  const ids = rows.map(r => r.id)
  const crew = await db.select({ jointId: jointWelders.jointId, stamp: welders.stamp, process: jointWelders.process, repair: jointWelders.repair, welderId: jointWelders.welderId })
    .from(jointWelders).innerJoin(welders, eq(welders.id, jointWelders.welderId)).where(inArray(jointWelders.jointId, ids)).orderBy(asc(jointWelders.repair), asc(jointWelders.id))
  const exams = await db.select({ jointId: jointExaminations.jointId, repair: jointExaminations.repair, method: jointExaminations.method, reportNumber: jointExaminations.reportNumber, accepted: jointExaminations.accepted, defectType: jointExaminations.defectType, defectLength: jointExaminations.defectLength })
    .from(jointExaminations).where(inArray(jointExaminations.jointId, ids)).orderBy(asc(jointExaminations.examinedOn), asc(jointExaminations.id))
  const overrides = await db.select({ jointId: jointOverrides.jointId, stage: jointOverrides.stage, reason: jointOverrides.reason, accountName: jointOverrides.accountName, at: jointOverrides.at, refusals: jointOverrides.refusals })
    .from(jointOverrides).where(inArray(jointOverrides.jointId, ids)).orderBy(asc(jointOverrides.at), asc(jointOverrides.id))
  const repairs = await db.select({ jointId: jointRepairs.jointId, repair: jointRepairs.repair, weldedOn: jointRepairs.weldedOn }).from(jointRepairs).where(inArray(jointRepairs.jointId, ids))
  return rows.map(r => ({
    ...r,
    completionCheck: (r.completionCheck ?? null) as { welderId?: number, stamp?: string, process: string, answer: string, lapsesOn: string | null }[] | null,
    welders: crew.filter(c => c.jointId === r.id),
    examinations: exams.filter(e => e.jointId === r.id),
    overrides: overrides.filter(o => o.jointId === r.id).map(o => ({ ...o, at: o.at.toISOString().slice(0, 10), refusals: refusalLines(o.refusals as Refusal[]) })),
    repairs: repairs.filter(x => x.jointId === r.id).sort((a, b) => a.repair - b.repair),
  }))
}
export type PacketRegister = Awaited<ReturnType<typeof registerForPacket>>

/**
 * The issue of a register with this content (an issued sheet of kind 'weld-register'): the same project and content
 * keep one code; a changed register gets a new one (the old code then verifies as changed).
 */
export async function issueRegister(db: Db, projectId: number, sha256: string, user: Pick<SessionUser, 'id' | 'name'>) {
  const match = and(eq(issuedSheets.kind, 'weld-register'), eq(issuedSheets.projectId, projectId), eq(issuedSheets.sha256, sha256))
  const [known] = await db.select().from(issuedSheets).where(match).limit(1)
  if (known) return known
  for (;;) {
    const code = newVerifyCode()
    const [a] = await db.select({ id: signatures.id }).from(signatures).where(eq(signatures.verifyCode, code)).limit(1)
    const [b] = await db.select({ id: issuedSheets.id }).from(issuedSheets).where(eq(issuedSheets.verifyCode, code)).limit(1)
    if (a || b) continue
    const [row] = await db.insert(issuedSheets).values({ kind: 'weld-register', projectId, sha256, verifyCode: code, issuedBy: user.id, issuerName: user.name }).onConflictDoNothing().returning()
    if (row) return row
  }
}

/** The project of an issued weld register (the issued sheet of kind 'weld-register' its code names). */
export async function registerProjectOf(db: Db, projectId: number) {
  const [project] = await db.select({ number: projects.number, name: projects.name }).from(projects).where(eq(projects.id, projectId)).limit(1)
  return project
}

/** How many joints a project's register holds. */
export async function jointCountOf(db: Db, projectId: number) {
  const [row] = await db.select({ n: count() }).from(joints).where(eq(joints.projectId, projectId))
  return row?.n ?? 0
}

/**
 * A joint reported welded by another shop system (API token): found by project number and mark, its welders by stamp
 * (F-No. and layer from the register's assignment when the report leaves them out), then checked and posted as by hand.
 */
export async function weldedFromSystem(db: Db, user: SessionUser, input: ExternalWeldedInput, today: string) {
  const [found] = await db.select({ id: joints.id, projectId: joints.projectId, version: joints.version }).from(joints)
    .innerJoin(projects, eq(projects.id, joints.projectId)).where(and(eq(projects.number, input.project), eq(joints.mark, input.mark)))
  if (!found) return missing('Joint')
  const roster = await db.select({ id: welders.id, stamp: welders.stamp }).from(welders).where(inArray(welders.stamp, input.welders.map(w => w.stamp)))
  const unknown = input.welders.filter(w => !roster.some(r => r.stamp === w.stamp)).map(w => w.stamp)
  if (unknown.length) return fieldFailure('welders', `Not on the roster: ${unknown.join(', ')}`)
  const assigned = await crewOf(db, found.id, 0)
  const crew: JointWelderInput[] = input.welders.map((w) => {
    const welderId = roster.find(r => r.stamp === w.stamp)!.id
    const known = assigned.find(a => a.welderId === welderId && a.process === w.process)
    return { welderId, process: w.process, layer: w.layer ?? known?.layer ?? null, fNumber: w.fNumber ?? known?.fNumber ?? null }
  })
  return markWelded(db, user, found.projectId, found.id, { weldedOn: input.weldedOn, version: found.version }, today, crew)
}

/** A joint reported welded by another shop system, as a route calls it: every use of the key is audited, refused or not. */
export async function weldedByKey(db: Db, token: { id: number, name: string, createdBy: number }, user: SessionUser, input: ExternalWeldedInput, today: string) {
  const result = await weldedFromSystem(db, user, input, today)
  await auditTokenUse(db, token, 'joint-welded', isFailure(result) ? { refused: result.fail, project: input.project, mark: input.mark } : { jointId: result.id, posted: result.posted })
  return result
}

/**
 * A weld log file for a project: each mark an open joint of the project, its lines the welders who welded it on one day.
 * Every joint is checked on its day as when marked welded by hand; without `commit` the preview and the row errors, with
 * it every joint in one transaction, or nothing when any line is wrong.
 */
export async function importWeldLog(db: Db, user: SessionUser, projectId: number, csv: string, commit: boolean, today: string) {
  if (!await mayReadRegister(db, user, projectId)) return missing('Project')
  const { rows, errors } = parseWeldLog(csv)
  const roster = await db.select({ id: welders.id, stamp: welders.stamp }).from(welders)
  const byStamp = new Map(roster.map(w => [w.stamp.toLowerCase(), w.id]))
  const marks = [...new Set(rows.map(r => r.mark))]
  const found = marks.length ? await db.select().from(joints).where(and(eq(joints.projectId, projectId), inArray(joints.mark, marks))) : []
  const reference = await referenceOf(db, projectId, '')
  // The register's crews of every joint named, in one query; then the WPSs, welders and their history, once for all
  const open = found.filter(j => !j.weldedOn)
  const assignedRows = open.length
    ? await db.select({ jointId: jointWelders.jointId, welderId: jointWelders.welderId, process: jointWelders.process, layer: jointWelders.layer, fNumber: jointWelders.fNumber })
        .from(jointWelders).where(and(inArray(jointWelders.jointId, open.map(j => j.id)), eq(jointWelders.repair, 0))).orderBy(asc(jointWelders.id))
    : []
  const assignedOf = new Map<number, JointWelderInput[]>()
  for (const { jointId, ...w } of assignedRows) {
    assignedOf.set(jointId, [...(assignedOf.get(jointId) ?? []), { ...w, process: w.process as JointWelderInput['process'], layer: w.layer as JointWelderInput['layer'] }])
  }
  const byMark = new Map(found.map(j => [j.mark, j]))
  const linesOf = new Map<string, typeof rows>()
  for (const r of rows) linesOf.set(r.mark, [...(linesOf.get(r.mark) ?? []), r])
  const checked: { joint: JointRow, weldedOn: string, crew: JointWelderInput[], lines: number[] }[] = []
  for (const mark of marks) {
    const lines = linesOf.get(mark)!
    const joint = byMark.get(mark)
    const first = lines[0]!
    if (!joint) {
      errors.push({ line: first.line, field: 'mark', message: `No joint ${mark} in this project's register`, value: mark })
      continue
    }
    if (joint.weldedOn) {
      errors.push({ line: first.line, field: 'mark', message: `Joint ${mark} was marked welded on ${joint.weldedOn}`, value: mark })
      continue
    }
    const days = [...new Set(lines.map(l => l.weldedOn))]
    if (days.length > 1) {
      errors.push({ line: lines[1]!.line, field: 'weldedOn', message: `Joint ${mark} is given two dates (${days.join(', ')}); a repair is entered on the joint's page` })
      continue
    }
    if (first.weldedOn > today) {
      errors.push({ line: first.line, field: 'weldedOn', message: `${first.weldedOn} is after today`, value: first.weldedOn })
      continue
    }
    const unknown = lines.filter(l => !byStamp.has(l.stamp.toLowerCase()))
    for (const l of unknown) errors.push({ line: l.line, field: 'stamp', message: `No welder with stamp ${l.stamp} on the roster`, value: l.stamp })
    if (unknown.length) continue
    const assigned = assignedOf.get(joint.id) ?? []
    const crew = lines.map((l) => {
      const welderId = byStamp.get(l.stamp.toLowerCase())!
      const known = assigned.find(a => a.welderId === welderId && a.process === l.process)
      return { welderId, process: l.process, layer: l.layer ?? known?.layer ?? null, fNumber: l.fNumber ?? known?.fNumber ?? null }
    })
    checked.push({ joint, weldedOn: first.weldedOn, crew, lines: lines.map(l => l.line) })
  }
  const lastDay = checked.reduce((day, c) => (c.weldedOn > day ? c.weldedOn : day), '0000-01-01')
  const context = await checkContext(db, checked.map(c => c.joint.procedureId), checked.map(c => c.crew), lastDay)
  const plan: { joint: JointRow, weldedOn: string, crew: JointWelderInput[], check: JointCheck, lines: number[] }[] = []
  for (const c of checked) {
    const check = checkWith(context, registerJoint(c.joint), c.joint.procedureId, c.crew, c.weldedOn)
    if (!check.ok) {
      for (const line of refusalLines(check.refusals)) errors.push({ line: c.lines[0]!, field: 'check', message: `${c.joint.mark}: ${line}` })
      continue
    }
    plan.push({ ...c, check })
  }
  errors.sort((a, b) => a.line - b.line)
  const preview = plan.slice(0, 200).map(p => ({ mark: p.joint.mark, weldedOn: p.weldedOn, welders: p.crew.map(c => `${roster.find(r => r.id === c.welderId)?.stamp} ${c.process}`).join(', ') }))
  const summary = { total: rows.length, joints: marks.length, errors, preview }
  if (!commit) return { ...summary, stored: 0 }
  if (errors.length) return invalid('body', [`${errors.length} row error${errors.length === 1 ? '' : 's'}: nothing was imported`], {}, errors)
  const stored = await db.transaction(async (tx) => {
    // In slices of 250 joints, a few statements each: the joints, their crews, the continuity each posts, the audit
    for (let i = 0; i < plan.length; i += 250) {
      const slice = plan.slice(i, i + 250)
      const ids = slice.map(p => p.joint.id)
      const values = sql.join(slice.map(p => sql`(${p.joint.id}::int, ${p.weldedOn}::date, ${JSON.stringify(summaryOf(p.check))}::jsonb, ${p.joint.version + 1}::int)`), sql`, `)
      await tx.execute(sql`update joints set welded_on = v.welded_on, completion_check = v.completion_check, version = v.version, updated_at = now()
        from (values ${values}) as v(id, welded_on, completion_check, version) where joints.id = v.id`)
      await tx.delete(jointWelders).where(and(inArray(jointWelders.jointId, ids), eq(jointWelders.repair, 0)))
      await tx.insert(jointWelders).values(slice.flatMap(p => p.crew.map(c => ({ ...c, jointId: p.joint.id, repair: 0 }))))
      const posted = slice.map(p => ({ p, uses: [...new Map(p.crew.map(c => [`${c.welderId}|${c.process}`, { welderId: c.welderId, process: c.process }])).values()] }))
      await tx.insert(continuityEntries).values(posted.flatMap(({ p, uses }) => uses.map(u => ({ ...u, weldedOn: p.weldedOn, reference: `${reference}${p.joint.mark}`, jointId: p.joint.id, recordedBy: user.id }))))
      // The same audit row per joint as marking it welded by hand (postContinuity), written together
      await tx.insert(auditEvents).values(posted.map(({ p, uses }) => ({ accountId: user.id, action: 'from-joint', recordType: 'continuity', recordId: null, before: null, after: { jointId: p.joint.id, weldedOn: p.weldedOn, uses } })))
    }
    await recordAudit(asTx(tx), { accountId: user.id, action: 'import', recordType: 'joint', recordId: null, after: { projectId, joints: plan.map(p => p.joint.id) } })
    return plan.length
  })
  return { ...summary, preview: [], stored }
}

/**
 * A joint's tag, as opened from its QR code: the joint, its WPS, and "may I weld it today": for a welder their own check
 * on this joint today (their assigned processes, or every process of the WPS when not assigned); for staff the whole check.
 * Who may open it: staff; a welder on the joint or on its project's crew; an auditor of the granted project. Others: 404.
 */
export async function jointTag(db: Db, user: SessionUser, jointId: number, today: string) {
  const [joint] = await db.select().from(joints).where(eq(joints.id, jointId))
  if (!joint) return missing('Joint')
  const assigned = await crewOf(db, jointId, 0)
  if (user.role === 'welder') {
    const own = user.welderId ?? -1
    const onCrew = await db.select({ id: projectWelders.welderId }).from(projectWelders).where(and(eq(projectWelders.projectId, joint.projectId), eq(projectWelders.welderId, own)))
    if (!onCrew.length && !assigned.some(a => a.welderId === own)) return missing('Joint')
  }
  else if (!await mayReadRegister(db, user, joint.projectId)) return missing('Joint')
  const procedure = await assignedProcedure(db, joint.procedureId)
  let crew = assigned
  if (user.role === 'welder') {
    const own = assigned.filter(a => a.welderId === user.welderId)
    crew = own.length ? own : (procedure?.processes ?? []).map(process => ({ welderId: user.welderId!, process: process as JointWelderInput['process'], layer: null, fNumber: assigned.find(a => a.process === process)?.fNumber ?? null }))
  }
  const check = joint.weldedOn && user.role !== 'welder' ? null : await checkAssignment(db, registerJoint(joint), joint.procedureId, crew, today)
  const [project] = await db.select({ id: projects.id, number: projects.number, name: projects.name }).from(projects).where(eq(projects.id, joint.projectId))
  const [wps] = joint.procedureId === null ? [] : await db.select({ id: procedures.id, number: procedures.number, revision: procedures.revision, title: procedures.title, status: procedures.status }).from(procedures).where(eq(procedures.id, joint.procedureId))
  const stamps = assigned.length ? await db.select({ id: welders.id, stamp: welders.stamp }).from(welders).where(inArray(welders.id, assigned.map(a => a.welderId))) : []
  // The results recorded so far (the inspector records the visual result from the tag itself)
  const examinations = await db.select({ id: jointExaminations.id, repair: jointExaminations.repair, method: jointExaminations.method, reportNumber: jointExaminations.reportNumber, examinedOn: jointExaminations.examinedOn, accepted: jointExaminations.accepted })
    .from(jointExaminations).where(eq(jointExaminations.jointId, jointId)).orderBy(asc(jointExaminations.examinedOn), asc(jointExaminations.id))
  return {
    today, project: project!, procedure: wps ?? null, examinations,
    joint: { id: joint.id, mark: joint.mark, jointType: joint.jointType, weld: joint.weld, unit: joint.unit, pNumberA: joint.pNumberA, pNumberB: joint.pNumberB, thickness: joint.thickness, outsideDiameter: joint.outsideDiameter, positions: joint.positions, progression: joint.progression, weldedOn: joint.weldedOn, rtPercent: joint.rtPercent, utPercent: joint.utPercent },
    welders: assigned.map(a => ({ ...a, stamp: stamps.find(s => s.id === a.welderId)?.stamp ?? '' })),
    check,
  }
}

/** The projects whose registers the user may read, with how many joints each holds and how many are welded. */
export async function registerProjects(db: Db, user: SessionUser) {
  const granted = user.role === 'auditor' ? (await db.select({ id: auditorGrants.projectId }).from(auditorGrants).where(eq(auditorGrants.accountId, user.id))).map(g => g.id) : null
  if (granted && !granted.length) return []
  return db.select({
    id: projects.id, number: projects.number, name: projects.name,
    // Qualified by hand: inside the subquery an interpolated column would render as a bare "id" and name the joint's own id.
    joints: sql<number>`(select count(*)::int from joints j where j.project_id = "projects"."id")`,
    welded: sql<number>`(select count(*)::int from joints j where j.project_id = "projects"."id" and j.welded_on is not null)`,
  }).from(projects).where(granted ? inArray(projects.id, granted) : undefined).orderBy(asc(projects.number))
}
