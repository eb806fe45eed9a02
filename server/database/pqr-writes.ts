import { and, eq, inArray } from 'drizzle-orm'
import type { Db } from './client'
import { baseMetals, fillerMetals, pqrBendSpecimens, pqrs, pqrTensileSpecimens, signatures, welders } from './schema'
import { contentHash, currentContentFormat, newVerifyCode } from './signing'
import { judgedResults, minimumStrengthOf, pqrColumns, pqrDraftOf, specimensRequired, type PqrRow } from './pqrs'
import { recordAudit } from './audit'
import { isUniqueViolation, settle } from '../utils/outcome'
import { conflict, fieldFailure, frozen, invalid, missing, refused, stale } from '../../shared/types/outcome'
import type { SessionUser } from '../utils/auth'
import type { PqrDraft, PqrResults } from '#shared/schemas/pqr'
import type { Unit } from '#shared/rules/types'

async function checkMetals(db: Db, draft: PqrDraft) {
  const baseIds = [draft.baseMetalId, draft.baseMetalBId].filter((id): id is number => id !== null)
  const fillerIds = draft.layers.map(l => l.fillerMetalId).filter((id): id is number => id !== null)
  const [bases, fillers, welder] = await Promise.all([
    db.select({ id: baseMetals.id }).from(baseMetals).where(inArray(baseMetals.id, baseIds)),
    fillerIds.length ? db.select({ id: fillerMetals.id }).from(fillerMetals).where(inArray(fillerMetals.id, fillerIds)) : Promise.resolve([]),
    draft.welderId !== null ? db.select({ id: welders.id }).from(welders).where(eq(welders.id, draft.welderId)) : Promise.resolve([{ id: 0 }]),
  ])
  if (!bases.some(b => b.id === draft.baseMetalId)) throw fieldFailure('baseMetalId', `No base metal with id ${draft.baseMetalId}`)
  if (draft.baseMetalBId !== null && !bases.some(b => b.id === draft.baseMetalBId)) throw fieldFailure('baseMetalBId', `No base metal with id ${draft.baseMetalBId}`)
  const i = draft.layers.findIndex(l => l.fillerMetalId !== null && !fillers.some(f => f.id === l.fillerMetalId))
  if (i >= 0) throw fieldFailure(`layers.${i}.fillerMetalId`, `No filler metal with id ${draft.layers[i]!.fillerMetalId}`)
  if (!welder.length) throw fieldFailure('welderId', `No welder with id ${draft.welderId}`)
}

/** A certified (or failed) PQR is signed and frozen; a stale version is refused. */
function assertOpen(row: PqrRow, version: number) {
  if (row.status !== 'recorded') throw frozen(`${row.number} is ${row.status} and signed: its record and results are frozen.`)
  if (row.version !== version) throw stale(`${row.number} was changed by someone else (version ${row.version}, you edited ${version}). Reload it.`)
}

export async function createPqr(db: Db, draft: PqrDraft, user: SessionUser) {
  return settle(async () => {
    await checkMetals(db, draft)
    try {
      return await db.transaction(async (tx) => {
        const [row] = await tx.insert(pqrs).values({ ...pqrColumns(draft), status: 'recorded' }).returning()
        await recordAudit(tx, { accountId: user.id, action: 'pqr.create', recordType: 'pqr', recordId: row!.id, after: draft })
        return row!
      })
    }
    catch (error) {
      if (isUniqueViolation(error)) throw conflict(`PQR ${draft.number} exists already.`)
      throw error
    }
  })
}

export async function updatePqr(db: Db, id: number, version: number, draft: PqrDraft, user: SessionUser) {
  return settle(async () => {
    await checkMetals(db, draft)
    try {
      return await db.transaction(async (tx) => {
        const [row] = await tx.select().from(pqrs).where(eq(pqrs.id, id)).for('update')
        if (!row) throw missing('PQR')
        assertOpen(row, version)
        const [saved] = await tx.update(pqrs).set({ ...pqrColumns(draft), version: row.version + 1, updatedAt: new Date() })
          .where(and(eq(pqrs.id, id), eq(pqrs.version, row.version))).returning()
        await recordAudit(tx, { accountId: user.id, action: 'pqr.update', recordType: 'pqr', recordId: id, before: pqrDraftOf(row), after: draft })
        return saved!
      })
    }
    catch (error) {
      if (isUniqueViolation(error)) throw conflict(`PQR ${draft.number} exists already.`)
      throw error
    }
  })
}

/** The inspector's results replace the recorded ones; strength and acceptance come from the rules. */
export async function recordResults(db: Db, id: number, results: PqrResults, user: SessionUser) {
  return settle(async () => {
    return db.transaction(async (tx) => {
      const [row] = await tx.select().from(pqrs).where(eq(pqrs.id, id)).for('update')
      if (!row) throw missing('PQR')
      assertOpen(row, results.version)
      const [base] = row.baseMetalId ? await tx.select().from(baseMetals).where(eq(baseMetals.id, row.baseMetalId)) : []
      if (results.tensile.length && !base?.minTensilePsi) {
        throw fieldFailure('tensile', 'The base metal has no specified minimum tensile strength in the catalogue; add it there first')
      }
      let judged: ReturnType<typeof judgedResults>
      try {
        judged = judgedResults(row, results, base?.minTensilePsi ? minimumStrengthOf(base.minTensilePsi, row.unit as Unit) : 1)
      }
      catch (error) {
        throw invalid('body', [error instanceof Error ? error.message : String(error)], {})
      }
      await tx.delete(pqrTensileSpecimens).where(eq(pqrTensileSpecimens.pqrId, id))
      await tx.delete(pqrBendSpecimens).where(eq(pqrBendSpecimens.pqrId, id))
      if (judged.tensile.length) await tx.insert(pqrTensileSpecimens).values(judged.tensile)
      if (judged.bends.length) await tx.insert(pqrBendSpecimens).values(judged.bends)
      const [saved] = await tx.update(pqrs).set({
        toughness: results.toughness, labReportNumber: results.labReportNumber === undefined ? row.labReportNumber : results.labReportNumber,
        version: row.version + 1, updatedAt: new Date(),
      }).where(eq(pqrs.id, id)).returning()
      await recordAudit(tx, { accountId: user.id, action: 'pqr.results', recordType: 'pqr', recordId: id, after: { tensile: judged.tensile, bends: judged.bends, toughness: results.toughness } })
      return saved!
    })
  })
}

/** The inspector signs the results: certified when every specimen passed, failed otherwise; both are frozen. */
export async function certifyPqr(db: Db, id: number, version: number, user: SessionUser) {
  return settle(async () => {
    return db.transaction(async (tx) => {
      const [row] = await tx.select().from(pqrs).where(eq(pqrs.id, id)).for('update')
      if (!row) throw missing('PQR')
      assertOpen(row, version)
      const tensile = await tx.select().from(pqrTensileSpecimens).where(eq(pqrTensileSpecimens.pqrId, id))
      const bends = await tx.select().from(pqrBendSpecimens).where(eq(pqrBendSpecimens.pqrId, id))
      const needed = specimensRequired(row)
      const needTension = needed?.tension ?? 1
      const needBends = needed ? needed.face + needed.root + needed.side : 1
      if (tensile.length < needTension || bends.length < needBends) {
        throw refused('Results incomplete', `${row.number} needs ${needTension} tension and ${needBends} bend specimens${needed ? ' (Table QW-451.1)' : ''}; ${tensile.length} and ${bends.length} are recorded.`)
      }
      const passed = tensile.every(s => s.accepted) && bends.every(s => s.accepted)
      const now = new Date()
      const [saved] = await tx.update(pqrs).set({ status: passed ? 'certified' : 'failed', version: row.version + 1, updatedAt: now }).where(eq(pqrs.id, id)).returning()
      const sha256 = await contentHash(tx as unknown as Db, 'pqr', id)
      const [signature] = await tx.insert(signatures).values({
        recordType: 'pqr', recordId: id, recordVersion: saved!.version, signerId: user.id, signerName: user.name, meaning: 'certified', sha256: sha256!, verifyCode: newVerifyCode(), contentFormat: currentContentFormat,
      }).returning()
      await recordAudit(tx, { accountId: user.id, action: 'pqr.certify', recordType: 'pqr', recordId: id, before: { status: 'recorded' }, after: { status: saved!.status, sha256 } })
      return { pqr: saved!, signature: signature! }
    })
  })
}
