import { and, asc, count, desc, eq, ilike, inArray, or, sql } from 'drizzle-orm'
import type { Db } from './client'
import { equipment, readingEquipment, readings } from './schema'
import { recordAudit } from './audit'
import { allOf, containsPattern, orderOf, pageOf } from '../utils/list'
import { isUniqueViolation, settle } from '../utils/outcome'
import type { SessionUser } from '../utils/auth'
import type { Equipment, EquipmentListQuery, EquipmentPatch } from '../../shared/schemas/equipment'
import { calibrationNoticeDays, calibrationOn, readingFlagged, type CalibrationStanding } from '../../shared/rules/calibration'
import { equipmentKindWords, type EquipmentKind } from '../../shared/vocabulary/equipment-kinds'
import { fieldFailure, missing, stale } from '../../shared/types/outcome'

// The equipment register: welding machines and the meters used to set and check them, with their calibration. Staff
// keep it; a welder reads it to name the machine and meters of a production reading. An auditor sees none of it.

type Row = typeof equipment.$inferSelect
const tagTaken = fieldFailure('tag', 'Another machine or meter has this tag')
const staleFailure = stale('Someone changed this entry since you opened it; reload and try again.')

/** The due date as SQL, for sorting and the due list: calibration date + interval months. */
const dueOnSql = sql<string | null>`(${equipment.calibratedOn} + make_interval(months => ${equipment.intervalMonths}))::date`

function described(row: Row, today: string) {
  return { ...row, kindWords: equipmentKindWords[row.kind as EquipmentKind] ?? row.kind, calibration: calibrationOn(row, today) }
}

/** Whether the user may read the register (and so a certificate attached to an entry). */
export async function mayReadEquipment(db: Db, user: SessionUser, id: number) {
  if (user.role === 'auditor') return false
  const [row] = await db.select({ id: equipment.id }).from(equipment).where(eq(equipment.id, id)).limit(1)
  return !!row
}

export async function listEquipment(db: Db, query: EquipmentListQuery, today: string) {
  const pattern = query.q ? containsPattern(query.q) : ''
  const where = allOf([
    query.q && or(ilike(equipment.tag, pattern), ilike(equipment.description, pattern), ilike(equipment.serialNumber, pattern)),
    query.kind && eq(equipment.kind, query.kind),
    query.state && eq(equipment.state, query.state),
  ])
  const sort = query.sort === 'dueOn' ? sql`${dueOnSql} ${sql.raw(query.dir)} nulls first` : orderOf(equipment[query.sort], query.dir)
  const page = await pageOf(query, ({ limit, offset }) => db.select().from(equipment).where(where).orderBy(sort, asc(equipment.id)).limit(limit).offset(offset),
    () => db.select({ total: count() }).from(equipment).where(where))
  return { ...page, items: page.items.map(r => described(r, today)) }
}

/** One entry, with the last readings taken with it. */
export async function equipmentPage(db: Db, id: number, today: string) {
  const [row] = await db.select().from(equipment).where(eq(equipment.id, id)).limit(1)
  if (!row) return missing('Equipment')
  const used = await db.select({ readingId: readings.id, procedureId: readings.procedureId, takenAt: readings.takenAt, calibrationState: readingEquipment.calibrationState, dueOn: readingEquipment.dueOn })
    .from(readingEquipment).innerJoin(readings, eq(readings.id, readingEquipment.readingId))
    .where(eq(readingEquipment.equipmentId, id)).orderBy(desc(readings.takenAt)).limit(50)
  return { ...described(row, today), readings: used }
}

export async function createEquipment(db: Db, input: Equipment, user: SessionUser) {
  return settle(async () => {
    try {
      return await db.transaction(async (tx) => {
        const [row] = await tx.insert(equipment).values(input).returning()
        await recordAudit(tx as unknown as Db, { accountId: user.id, action: 'create', recordType: 'equipment', recordId: row!.id, after: row })
        return row!
      })
    }
    catch (error) {
      if (isUniqueViolation(error)) throw tagTaken
      throw error
    }
  })
}

export async function updateEquipment(db: Db, id: number, input: EquipmentPatch, user: SessionUser) {
  return settle(async () => {
    const [before] = await db.select().from(equipment).where(eq(equipment.id, id)).limit(1)
    if (!before) throw missing('Equipment')
    if (before.version !== input.version) throw staleFailure
    const { version, ...values } = input
    try {
      return await db.transaction(async (tx) => {
        const [row] = await tx.update(equipment).set({ ...values, version: version + 1, updatedAt: new Date() })
          .where(and(eq(equipment.id, id), eq(equipment.version, version))).returning()
        if (!row) throw staleFailure
        await recordAudit(tx as unknown as Db, { accountId: user.id, action: 'update', recordType: 'equipment', recordId: id, before, after: row })
        return row
      })
    }
    catch (error) {
      if (isUniqueViolation(error)) throw tagTaken
      throw error
    }
  })
}

/** In-service entries whose calibration is due within `windowDays`, past due, or cannot be told; soonest first. */
export async function calibrationsDue(db: Db, today: string, windowDays = calibrationNoticeDays) {
  const rows = await db.select().from(equipment).where(eq(equipment.state, 'in-service')).orderBy(asc(equipment.tag))
  return rows.map(r => ({ id: r.id, tag: r.tag, kind: r.kind, kindWords: equipmentKindWords[r.kind as EquipmentKind] ?? r.kind, description: r.description, calibration: calibrationOn(r, today) }))
    .filter(r => r.calibration.daysLeft === null || r.calibration.daysLeft <= windowDays)
    .sort((a, b) => (a.calibration.dueOn ?? '').localeCompare(b.calibration.dueOn ?? '') || a.tag.localeCompare(b.tag))
}

export interface ReadingEquipmentCheck {
  equipmentId: number
  tag: string
  kindWords: string
  calibration: CalibrationStanding
  flagged: boolean
  text: string
}

/**
 * Where the calibration of each named machine and meter stood on the day of a reading; a field failure names an id not
 * in the register or out of service. Called before the reading is stored.
 */
export async function checkReadingEquipment(db: Db, ids: number[], takenOn: string): Promise<ReadingEquipmentCheck[]> {
  if (!ids.length) return []
  const rows = await db.select().from(equipment).where(inArray(equipment.id, ids))
  const byId = new Map(rows.map(r => [r.id, r]))
  return ids.map((id) => {
    const row = byId.get(id)
    if (!row) throw fieldFailure('equipmentIds', `No machine or meter with id ${id} in the register`)
    if (row.state !== 'in-service') throw fieldFailure('equipmentIds', `${row.tag} is out of service`)
    const calibration = calibrationOn(row, takenOn)
    const flagged = readingFlagged(calibration)
    const kindWords = equipmentKindWords[row.kind as EquipmentKind] ?? row.kind
    return { equipmentId: id, tag: row.tag, kindWords, calibration, flagged, text: `${kindWords} ${row.tag}: ${calibration.text}` }
  })
}

/** Keeps which equipment a stored reading was taken with (inside the reading's transaction). */
export async function keepReadingEquipment(tx: Db, readingId: number, checks: ReadingEquipmentCheck[]) {
  for (const c of checks) {
    await tx.insert(readingEquipment).values({ readingId, equipmentId: c.equipmentId, calibrationState: c.calibration.state, dueOn: c.calibration.dueOn })
  }
}

/** The equipment of each reading in a list, for the readings table. */
export async function equipmentOfReadings(db: Db, readingIds: number[]) {
  const result = new Map<number, { equipmentId: number, tag: string, calibrationState: string, dueOn: string | null }[]>()
  if (!readingIds.length) return result
  const rows = await db.select({ readingId: readingEquipment.readingId, equipmentId: readingEquipment.equipmentId, tag: equipment.tag, calibrationState: readingEquipment.calibrationState, dueOn: readingEquipment.dueOn })
    .from(readingEquipment).innerJoin(equipment, eq(equipment.id, readingEquipment.equipmentId)).where(inArray(readingEquipment.readingId, readingIds))
  for (const r of rows) {
    const list = result.get(r.readingId) ?? []
    list.push({ equipmentId: r.equipmentId, tag: r.tag, calibrationState: r.calibrationState, dueOn: r.dueOn })
    result.set(r.readingId, list)
  }
  return result
}
