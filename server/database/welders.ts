import { and, desc, eq, ne, sql } from 'drizzle-orm'
import type { Db } from './client'
import { accounts, continuityEntries, welders, welderTests } from './schema'
import type { WelderInput, WelderPatch } from '../../shared/schemas/welder'
import { recordAudit } from '../utils/audit'
import { conflict } from '../utils/errors'

export class DuplicateStamp extends Error {
  constructor(readonly stamp: string) {
    super(`Stamp ${stamp} is already on the roster`)
  }
}

const isUniqueViolation = (error: unknown) => {
  const e = error as { code?: string, cause?: { code?: string } }
  return e?.code === '23505' || e?.cause?.code === '23505'
}

async function stampTaken(db: Db, stamp: string, exceptId?: number) {
  const [hit] = await db.select({ id: welders.id }).from(welders)
    .where(and(sql`lower(${welders.stamp}) = lower(${stamp})`, exceptId ? ne(welders.id, exceptId) : undefined)).limit(1)
  return Boolean(hit)
}

export async function insertWelder(db: Db, input: WelderInput, accountId: number) {
  if (await stampTaken(db, input.stamp)) throw new DuplicateStamp(input.stamp)
  try {
    return await db.transaction(async (tx) => {
      const [row] = await tx.insert(welders).values(input).returning()
      await recordAudit(tx as unknown as Db, { accountId, action: 'create', recordType: 'welder', recordId: row!.id, after: row })
      return row!
    })
  }
  catch (error) {
    if (isUniqueViolation(error)) throw new DuplicateStamp(input.stamp)
    throw error
  }
}

/** Null when the welder does not exist; 409 when the version is stale. */
export async function updateWelder(db: Db, id: number, patch: WelderPatch, accountId: number) {
  const { version, ...changes } = patch
  if (changes.stamp && await stampTaken(db, changes.stamp, id)) throw new DuplicateStamp(changes.stamp)
  try {
    return await db.transaction(async (tx) => {
      const [before] = await tx.select().from(welders).where(eq(welders.id, id)).for('update')
      if (!before) return null
      if (before.version !== version) throw conflict(`Someone saved this welder after you opened it (version ${before.version}, yours ${version}). Reload and enter your change again.`)
      const [row] = await tx.update(welders).set({ ...changes, version: before.version + 1, updatedAt: new Date() }).where(eq(welders.id, id)).returning()
      await recordAudit(tx as unknown as Db, { accountId, action: 'update', recordType: 'welder', recordId: id, before, after: row })
      return row!
    })
  }
  catch (error) {
    if (isUniqueViolation(error)) throw new DuplicateStamp(changes.stamp ?? '')
    throw error
  }
}

/** A welder's page: roster entry, linked account, every test (failed ones too) and the continuity log, newest first. */
export async function welderHistory(db: Db, id: number) {
  const [welder] = await db.select().from(welders).where(eq(welders.id, id)).limit(1)
  if (!welder) return null
  const [account, tests, continuity] = await Promise.all([
    db.select({ id: accounts.id, email: accounts.email, name: accounts.name, active: accounts.active }).from(accounts).where(eq(accounts.welderId, id)).limit(1),
    db.select({
      id: welderTests.id, testDate: welderTests.testDate, process: welderTests.process, transfer: welderTests.transfer, form: welderTests.form,
      weld: welderTests.weld, positions: welderTests.positions, status: welderTests.status, unit: welderTests.unit,
      couponThickness: welderTests.couponThickness, outsideDiameter: welderTests.outsideDiameter, code: welderTests.code,
    }).from(welderTests).where(eq(welderTests.welderId, id)).orderBy(desc(welderTests.testDate), desc(welderTests.id)),
    db.select({ id: continuityEntries.id, process: continuityEntries.process, weldedOn: continuityEntries.weldedOn, reference: continuityEntries.reference, recordedBy: accounts.name })
      .from(continuityEntries).leftJoin(accounts, eq(accounts.id, continuityEntries.recordedBy))
      .where(eq(continuityEntries.welderId, id)).orderBy(desc(continuityEntries.weldedOn), desc(continuityEntries.id)).limit(500),
  ])
  const { calendarToken: _secret, ...visible } = welder
  return { welder: visible, account: account[0] ?? null, tests, continuity }
}
