import { and, eq, inArray, max, ne } from 'drizzle-orm'
import type { Db } from './client'
import { pqrs, procedurePqrs, procedures, projectProcedures, readings, signatures, welders } from './schema'
import { contentHash, currentContentFormat, newVerifyCode } from './signing'
import { columnsOf, draftOf, findProcedure, layersOf, prequalifiedOf, readingsOf, supportingPqrIdsOf, supportOf, type ProcedureRow } from './procedures'
import { recordAudit } from './audit'
import { checkReadingEquipment, keepReadingEquipment } from './equipment'
import { todayIso } from '../utils/today'
import { isForeignKeyViolation, isUniqueViolation, settle } from '../utils/outcome'
import { conflict, fieldFailure, frozen, invalid, missing, refused, stale } from '../../shared/types/outcome'
import type { SessionUser } from '../utils/auth'
import { evaluate } from '#shared/rules'
import type { ProcedureDraft, ProcedurePatch } from '#shared/schemas/procedure'
import type { Reading } from '#shared/schemas/reading'
import type { Unit } from '#shared/rules/types'
import { handCheckNeeded } from '#shared/qualification/procedure-support'

async function checkPqrsExist(db: Db, ids: number[]) {
  if (!ids.length) return
  const found = await db.select({ id: pqrs.id }).from(pqrs).where(inArray(pqrs.id, ids))
  const missing = ids.filter(id => !found.some(f => f.id === id))
  if (missing.length) throw fieldFailure('supportingPqrIds', `No PQR with id ${missing.join(', ')}`)
}

async function setSupport(db: Db, procedureId: number, ids: number[]) {
  await db.delete(procedurePqrs).where(eq(procedurePqrs.procedureId, procedureId))
  const unique = [...new Set(ids)]
  if (unique.length) await db.insert(procedurePqrs).values(unique.map(pqrId => ({ procedureId, pqrId })))
}

/** The 409 for an edit of a signed revision or of a version someone else has saved since. */
function assertEditable(row: ProcedureRow, version: number) {
  if (row.status !== 'draft') throw frozen(`${row.number} rev. ${row.revision} is ${row.status} and signed: it cannot change. Make a new revision instead.`)
  if (row.version !== version) throw stale(`${row.number} rev. ${row.revision} was changed by someone else (version ${row.version}, you edited ${version}). Reload it and apply your change again.`)
}

/** A new WPS number starts as a draft at revision 0. */
export async function createDraft(db: Db, draft: ProcedureDraft, user: SessionUser) {
  return settle(async () => {
    await checkPqrsExist(db, draft.supportingPqrIds)
    try {
      return await db.transaction(async (tx) => {
        const [taken] = await tx.select({ id: procedures.id }).from(procedures).where(eq(procedures.number, draft.number)).limit(1)
        if (taken) throw conflict(`WPS ${draft.number} exists already: make a new revision of it instead.`)
        const [row] = await tx.insert(procedures).values({ ...columnsOf(draft), revision: 0, status: 'draft', createdBy: user.id }).returning()
        await setSupport(tx, row!.id, draft.supportingPqrIds)
        await recordAudit(tx, { accountId: user.id, action: 'procedure.create', recordType: 'procedure', recordId: row!.id, after: draft })
        return row!
      })
    }
    catch (error) {
      if (isUniqueViolation(error)) throw conflict(`WPS ${draft.number} exists already.`)
      throw error
    }
  })
}

/** Saves an edited draft; null when there is no such WPS. */
export async function updateDraft(db: Db, id: number, patch: ProcedurePatch, user: SessionUser) {
  return settle(async () => {
    await checkPqrsExist(db, patch.draft.supportingPqrIds)
    try {
      return await db.transaction(async (tx) => {
        const [row] = await tx.select().from(procedures).where(eq(procedures.id, id)).for('update')
        if (!row) throw missing('Procedure')
        assertEditable(row, patch.version)
        if (patch.draft.number !== row.number && row.revision > 0) throw conflict(`A revision keeps its number (${row.number}); start a new WPS for a new number.`)
        const before = draftOf(row, await supportingPqrIdsOf(tx, id))
        const [saved] = await tx.update(procedures).set({ ...columnsOf(patch.draft), version: row.version + 1, updatedAt: new Date() })
          .where(and(eq(procedures.id, id), eq(procedures.version, row.version))).returning()
        if (!saved) throw stale('The draft changed while it was being saved. Reload it.')
        await setSupport(tx, id, patch.draft.supportingPqrIds)
        await recordAudit(tx, { accountId: user.id, action: 'procedure.update', recordType: 'procedure', recordId: id, before, after: patch.draft })
        return saved
      })
    }
    catch (error) {
      if (isUniqueViolation(error)) throw conflict(`WPS ${patch.draft.number} exists already.`)
      throw error
    }
  })
}

/** A WPS backed by PQRs: approvable when they support it, or by hand for a code whose support rules are not carried. */
async function supportGate(tx: Db, row: ProcedureRow) {
  const { check } = await supportOf(tx, row, await supportingPqrIdsOf(tx, row.id))
  const byHand = handCheckNeeded(check)
  if (check.blockers.length || (!check.supported && !byHand)) {
    const reasons = [...check.blockers, ...check.violations.map(v => `${v.clause}: ${v.text}`)]
    throw refused('Not supported', `${row.number} rev. ${row.revision} cannot be approved: ${reasons.join(' ')}`, { blockers: check.blockers, violations: check.violations })
  }
  return byHand
}

/**
 * A prequalified AWS D1.1 WPS: approvable without a PQR when no limit fails; limits not carried (check by hand) need
 * the signed statement.
 */
async function prequalifiedGate(tx: Db, row: ProcedureRow) {
  const check = await prequalifiedOf(tx, row)
  if (!check) throw refused('Not prequalified', `${row.number} rev. ${row.revision} is marked prequalified, but only AWS D1.1 WPSs are checked as prequalified here.`, {})
  const failures = check.items.filter(i => i.state === 'fail')
  if (failures.length) {
    const reasons = failures.map(i => `${i.table}: ${i.text}${i.required ? ` Required: ${i.required}.` : ''}`)
    throw refused('Not prequalified', `${row.number} rev. ${row.revision} is outside the prequalification limits: ${reasons.join(' ')}`, { failures })
  }
  return check.byHand > 0
}

/** Approval: the supervisor signs the draft, which freezes it, and the earlier approved revision is superseded. */
export async function approveProcedure(db: Db, id: number, version: number, user: SessionUser, handCheck?: string | null) {
  return settle(async () => {
    return db.transaction(async (tx) => {
      const [row] = await tx.select().from(procedures).where(eq(procedures.id, id)).for('update')
      if (!row) throw missing('Procedure')
      assertEditable(row, version)
      const byHand = row.prequalified ? await prequalifiedGate(tx, row) : await supportGate(tx, row)
      if (byHand) {
        if (!handCheck || handCheck.length < 10) {
          throw fieldFailure('handCheck', row.prequalified
            ? 'Some prequalification limits are not carried here: say how you checked them by hand (at least 10 characters)'
            : 'Some of this code\'s support variables are not compared here: say how they were checked against the PQRs (at least 10 characters)')
        }
        // The statement is part of what the signature covers.
        await tx.update(procedures).set({ variables: { ...(row.variables as Record<string, unknown>), handCheck } }).where(eq(procedures.id, id))
      }
      const older = await tx.update(procedures).set({ status: 'superseded', updatedAt: new Date() })
        .where(and(eq(procedures.number, row.number), eq(procedures.status, 'approved'), ne(procedures.id, id)))
        .returning({ id: procedures.id, revision: procedures.revision })
      for (const o of older) {
        await recordAudit(tx, { accountId: user.id, action: 'procedure.supersede', recordType: 'procedure', recordId: o.id, before: { status: 'approved' }, after: { status: 'superseded', by: id } })
      }
      const now = new Date()
      const [approved] = await tx.update(procedures).set({ status: 'approved', approvedAt: now, updatedAt: now, version: row.version + 1 })
        .where(eq(procedures.id, id)).returning()
      const sha256 = await contentHash(tx as unknown as Db, 'procedure', id)
      const [signature] = await tx.insert(signatures).values({
        recordType: 'procedure', recordId: id, recordVersion: approved!.version, signerId: user.id, signerName: user.name,
        meaning: 'approved', sha256: sha256!, verifyCode: newVerifyCode(), contentFormat: currentContentFormat,
      }).returning()
      await recordAudit(tx, { accountId: user.id, action: 'procedure.approve', recordType: 'procedure', recordId: id, before: { status: 'draft' }, after: { status: 'approved', sha256, superseded: older.map(o => o.id), handCheck: byHand ? handCheck : undefined } })
      return { procedure: approved!, signature: signature!, superseded: older }
    })
  })
}

/** A change to an approved WPS: a copy as a draft at the next revision; the approved one stays as signed. */
export async function reviseProcedure(db: Db, id: number, version: number, user: SessionUser) {
  return settle(async () => {
    return db.transaction(async (tx) => {
      const [row] = await tx.select().from(procedures).where(eq(procedures.id, id)).for('update')
      if (!row) throw missing('Procedure')
      if (row.status !== 'approved') throw conflict(`Only the approved revision is revised; ${row.number} rev. ${row.revision} is ${row.status}.`)
      if (row.version !== version) throw stale(`${row.number} rev. ${row.revision} changed since you loaded it. Reload it.`)
      const [openDraft] = await tx.select({ revision: procedures.revision }).from(procedures)
        .where(and(eq(procedures.number, row.number), eq(procedures.status, 'draft'))).limit(1)
      if (openDraft) throw conflict(`${row.number} rev. ${openDraft.revision} is a draft already: edit that one.`)
      const [top] = await tx.select({ revision: max(procedures.revision) }).from(procedures).where(eq(procedures.number, row.number))
      const { id: _id, createdAt: _c, updatedAt: _u, approvedAt: _a, version: _v, status: _s, revision: _r, createdBy: _b, ...copy } = row
      const [draft] = await tx.insert(procedures).values({ ...copy, revision: (top?.revision ?? row.revision) + 1, status: 'draft', version: 1, createdBy: user.id }).returning()
      await setSupport(tx, draft!.id, await supportingPqrIdsOf(tx, id))
      await recordAudit(tx, { accountId: user.id, action: 'procedure.revise', recordType: 'procedure', recordId: draft!.id, after: { from: id, revision: draft!.revision } })
      return draft!
    })
  })
}

/** The WPS window each production reading on one layer (the first unless named) is held to. */
export function readingWindow(row: ProcedureRow, layerIndex = 0) {
  const layer = layersOf(row)[layerIndex] ?? layersOf(row)[0]!
  const pick = (w: { min: unknown, max: unknown } | undefined) => {
    const min = typeof w?.min === 'number' ? w.min : null
    const max = typeof w?.max === 'number' ? w.max : null
    return min === null && max === null ? undefined : { min, max }
  }
  return Object.fromEntries(Object.entries({
    volts: pick(layer.volts), amps: pick(layer.amps), wireFeedSpeed: pick(layer.wireFeed),
    travelSpeed: pick(layer.travelSpeed), ctwd: pick(layer.ctwd), gasFlow: pick(layer.gas.flow),
  }).filter(([, v]) => v !== undefined))
}

/** The readings kept against a WPS with its windows per layer; a welder reads their own, of approved revisions only. */
export async function readingsPage(db: Db, user: SessionUser, id: number) {
  const row = await findProcedure(db, id)
  if (!row || (user.role === 'welder' && row.status !== 'approved')) return missing('Procedure')
  const items = await readingsOf(db, id, user.role === 'welder' ? (user.welderId ?? -1) : null)
  const layers = layersOf(row).map((l, i) => ({ index: i, name: l.name, process: l.process, window: readingWindow(row, i) }))
  return { window: readingWindow(row), layers, unit: row.unit, items }
}

/**
 * Check one set of readings against the window and heat-input limit of an approved WPS, and keep it against the WPS and
 * the welder. A welder sees only approved revisions (missing otherwise).
 */
export async function recordReading(db: Db, id: number, input: Reading, user: SessionUser) {
  return settle(() => recordReadingOn(db, id, input, user))
}

async function recordReadingOn(db: Db, id: number, input: Reading, user: SessionUser) {
  const row = await findProcedure(db, id)
  if (!row || (user.role === 'welder' && row.status !== 'approved')) throw missing('Procedure')
  if (row.status !== 'approved') throw conflict(`Readings are taken against an approved WPS; ${row.number} rev. ${row.revision} is ${row.status}.`)
  const welderId = user.role === 'welder' ? user.welderId : input.welderId
  if (welderId !== null && user.role !== 'welder') {
    const [w] = await db.select({ id: welders.id }).from(welders).where(eq(welders.id, welderId)).limit(1)
    if (!w) throw fieldFailure('welderId', `No welder with id ${welderId}`)
  }
  const values = Object.fromEntries((['volts', 'amps', 'wireFeedSpeed', 'travelSpeed', 'ctwd', 'gasFlow'] as const)
    .filter(k => typeof input[k] === 'number').map(k => [k, input[k] as number]))
  const unit = row.unit as Unit
  const layers = layersOf(row)
  const layerIndex = input.layer ?? 0
  if (layerIndex >= layers.length) throw fieldFailure('layer', `This WPS has ${layers.length} layer${layers.length === 1 ? '' : 's'}`)
  const checked = evaluate({ code: row.code, check: 'readings', unit, edition: row.edition, input: { window: readingWindow(row, layerIndex), readings: values } })
  if ('error' in checked) throw invalid('body', [String(checked.error)], {})
  const result = checked as unknown as { within: boolean, checks: { parameter: string, value: number, within: boolean, text: string }[] }
  let heat: { value: number, perUnit: string, limit: number | null, within: boolean, clause: string, text: string } | null = null
  if (values.volts !== undefined && values.amps !== undefined && values.travelSpeed !== undefined) {
    const h = evaluate({ code: row.code, check: 'heat-input', unit, edition: row.edition, input: { volts: values.volts, amps: values.amps, travelSpeed: values.travelSpeed } })
    if (!('error' in h)) {
      const hi = h as unknown as { heatInput: number, perUnit: string, reasons: { clause: string, text: string }[] }
      const limit = layers[layerIndex]!.heatInputMax ?? null
      const within = typeof limit !== 'number' || hi.heatInput <= limit
      heat = {
        value: hi.heatInput, perUnit: hi.perUnit, limit: typeof limit === 'number' ? limit : null, within, clause: hi.reasons[0]?.clause ?? '',
        text: `${hi.reasons[0]?.text ?? ''}${typeof limit === 'number' ? (within ? ` Within the WPS limit of ${limit} ${hi.perUnit}.` : ` Over the WPS limit of ${limit} ${hi.perUnit}: a nonconformance.`) : ''}`,
      }
    }
  }
  const outOfWindow = !result.within || (heat !== null && !heat.within)
  // The machine and meters named, each with where its calibration stood on the day the reading was taken.
  const equipmentChecks = await checkReadingEquipment(db, input.equipmentIds ?? [], input.takenAt ? input.takenAt.slice(0, 10) : todayIso())
  const calibrationFlag = equipmentChecks.some(c => c.flagged)
  return db.transaction(async (tx) => {
    const [saved] = await tx.insert(readings).values({
      procedureId: row.id, welderId, takenAt: input.takenAt ? new Date(input.takenAt) : new Date(),
      values: { readings: values, checks: result.checks, heatInput: heat, reference: input.reference ?? null, layer: layerIndex, layerName: layers[layerIndex]!.name, process: layers[layerIndex]!.process }, outOfWindow, calibrationFlag, recordedBy: user.id,
    }).returning()
    await keepReadingEquipment(tx as unknown as Db, saved!.id, equipmentChecks)
    await recordAudit(tx, { accountId: user.id, action: 'reading.record', recordType: 'procedure', recordId: row.id, after: { reading: saved!.id, outOfWindow, calibrationFlag } })
    return { ...saved!, within: !outOfWindow, checks: result.checks, heatInput: heat, equipment: equipmentChecks }
  })
}

export { findProcedure }

/** Discards a draft that was never signed; signed revisions stay for good. Null when there is no such WPS. */
export async function discardDraft(db: Db, id: number, version: number, user: SessionUser) {
  return settle(async () => {
    try {
      return await discardInTransaction(db, id, version, user)
    }
    catch (error) {
      // Another record (a welder test, a project) still points at the draft.
      if (isForeignKeyViolation(error)) throw conflict('Another record refers to this draft, so it stays. Edit it instead.')
      throw error
    }
  })
}

async function discardInTransaction(db: Db, id: number, version: number, user: SessionUser) {
  return db.transaction(async (tx) => {
    const [row] = await tx.select().from(procedures).where(eq(procedures.id, id)).for('update')
    if (!row) throw missing('Procedure')
    assertEditable(row, version)
    const [onProject] = await tx.select({ projectId: projectProcedures.projectId }).from(projectProcedures).where(eq(projectProcedures.procedureId, id)).limit(1)
    if (onProject) throw conflict(`${row.number} rev. ${row.revision} is listed on a project: take it off the project first.`)
    const before = draftOf(row, await supportingPqrIdsOf(tx, id))
    await tx.delete(procedures).where(eq(procedures.id, id))
    await recordAudit(tx, { accountId: user.id, action: 'procedure.discard', recordType: 'procedure', recordId: id, before: { ...before, revision: row.revision } })
    return row
  })
}
