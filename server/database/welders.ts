import { and, count, desc, eq, ilike, ne, or, sql } from 'drizzle-orm'
import { allOf, containsPattern, orderOf, pageOf } from '../utils/list'
import { standingsOf } from './standings'
import { todayIso } from '../utils/today'
import type { WelderListQuery } from '../../shared/schemas/list-queries'
import type { Db } from './client'
import { accounts, continuityEntries, welders, welderTests } from './schema'
import type { WelderInput, WelderPatch } from '../../shared/schemas/welder'
import type { welderStatuses } from '../../shared/vocabulary/records'
import { recordAudit } from './audit'
import type { SessionUser } from '../utils/auth'
import { auditorMayReadWelder } from './projects'
import { isUniqueViolation, settle } from '../utils/outcome'
import { fieldFailure, missing, stale } from '../../shared/types/outcome'

const stampTakenFailure = (stamp: string) => fieldFailure('stamp', `Stamp ${stamp} is already on the roster`)

async function stampTaken(db: Db, stamp: string, exceptId?: number) {
  const [hit] = await db.select({ id: welders.id }).from(welders)
    .where(and(sql`lower(${welders.stamp}) = lower(${stamp})`, exceptId ? ne(welders.id, exceptId) : undefined)).limit(1)
  return Boolean(hit)
}

/** A new roster entry; a stamp already on the roster (any case) is a field failure on `stamp`. */
export async function insertWelder(db: Db, input: WelderInput, accountId: number) {
  if (await stampTaken(db, input.stamp)) return stampTakenFailure(input.stamp)
  try {
    return await db.transaction(async (tx) => {
      const [row] = await tx.insert(welders).values(input).returning()
      await recordAudit(tx as unknown as Db, { accountId, action: 'create', recordType: 'welder', recordId: row!.id, after: row })
      return row!
    })
  }
  catch (error) {
    if (isUniqueViolation(error)) return stampTakenFailure(input.stamp)
    throw error
  }
}

/** A changed roster entry; missing, stale, or a field failure on a taken stamp. */
export async function updateWelder(db: Db, id: number, patch: WelderPatch, accountId: number) {
  const { version, ...changes } = patch
  if (changes.stamp && await stampTaken(db, changes.stamp, id)) return stampTakenFailure(changes.stamp)
  try {
    return await settle(() => db.transaction(async (tx) => {
      const [before] = await tx.select().from(welders).where(eq(welders.id, id)).for('update')
      if (!before) throw missing('Welder')
      if (before.version !== version) throw stale(`Someone saved this welder after you opened it (version ${before.version}, yours ${version}). Reload and enter your change again.`)
      const [row] = await tx.update(welders).set({ ...changes, version: before.version + 1, updatedAt: new Date() }).where(eq(welders.id, id)).returning()
      await recordAudit(tx as unknown as Db, { accountId, action: 'update', recordType: 'welder', recordId: id, before, after: row })
      return row!
    }))
  }
  catch (error) {
    if (isUniqueViolation(error)) return stampTakenFailure(changes.stamp ?? '')
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
      qualifiedAs: welderTests.qualifiedAs,
    }).from(welderTests).where(eq(welderTests.welderId, id)).orderBy(desc(welderTests.testDate), desc(welderTests.id)),
    db.select({ id: continuityEntries.id, process: continuityEntries.process, weldedOn: continuityEntries.weldedOn, reference: continuityEntries.reference, recordedBy: accounts.name })
      .from(continuityEntries).leftJoin(accounts, eq(accounts.id, continuityEntries.recordedBy))
      .where(eq(continuityEntries.welderId, id)).orderBy(desc(continuityEntries.weldedOn), desc(continuityEntries.id)).limit(500),
  ])
  const { calendarToken: _secret, cardToken: _cardSecret, ...visible } = welder
  return { welder: visible, account: account[0] ?? null, tests, continuity }
}

/**
 * Who may read a welder's page, continuity log and sheets: staff any; a welder themself; an auditor a welder on a
 * granted project (on `projectId` when given).
 */
export async function mayReadWelder(db: Db, user: SessionUser, welderId: number, projectId?: number) {
  if (user.role === 'supervisor' || user.role === 'inspector') return true
  if (user.role === 'welder') return user.welderId === welderId
  return auditorMayReadWelder(db, user, welderId, projectId)
}

/** The roster, paged, with where each welder stands per process today. */
export async function listWelders(db: Db, query: WelderListQuery) {
  const pattern = query.q ? containsPattern(query.q) : ''
  const where = allOf([
    query.q && or(ilike(welders.name, pattern), ilike(welders.stamp, pattern), ilike(welders.employeeNumber, pattern)),
    query.status && eq(welders.status, query.status),
  ])
  const page = await pageOf(query, ({ limit, offset }) => db.select({
    id: welders.id, name: welders.name, stamp: welders.stamp, employeeNumber: welders.employeeNumber, status: welders.status,
    email: welders.email, version: welders.version, createdAt: welders.createdAt, updatedAt: welders.updatedAt,
  }).from(welders).where(where).orderBy(orderOf(welders[query.sort], query.dir), welders.id).limit(limit).offset(offset),
  () => db.select({ total: count() }).from(welders).where(where))
  const standings = await standingsOf(db, page.items.map(w => w.id), todayIso())
  return { ...page, items: page.items.map(w => ({ ...w, standings: standings.get(w.id) ?? [] })) }
}

/** A welder's page with where they stand today; a welder reads only their own. */
export async function welderPage(db: Db, user: SessionUser, id: number) {
  if (user.role === 'welder' && user.welderId !== id) return missing('Welder')
  const history = await welderHistory(db, id)
  if (!history) return missing('Welder')
  const today = todayIso()
  const standings = (await standingsOf(db, [id], today)).get(id) ?? []
  // The roster's status column holds one of welderStatuses (shared/vocabulary/records.ts; the roster schema checks it).
  return { ...history, welder: { ...history.welder, status: history.welder.status as typeof welderStatuses[number] }, standings, today }
}
