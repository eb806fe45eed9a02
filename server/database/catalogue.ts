import { and, asc, eq, ne } from 'drizzle-orm'
import type { Db } from './client'
import { baseMetals, fillerMetals, pqrs } from './schema'
import { recordAudit } from './audit'
import { isUniqueViolation, settle } from '../utils/outcome'
import { conflict, missing } from '../../shared/types/outcome'
import type { BaseMetalInput, FillerMetalInput } from '../../shared/schemas/catalogue'

// The base and filler metals the WPS and PQR forms pick from. An entry a signed PQR relies on stays as signed: a
// correction is a new entry.

type BaseMetal = typeof baseMetals.$inferSelect
type FillerMetal = typeof fillerMetals.$inferSelect

export const listBaseMetals = (db: Db) =>
  db.select().from(baseMetals).orderBy(asc(baseMetals.pNumber), asc(baseMetals.specification), asc(baseMetals.grade))

export const listFillerMetals = (db: Db) =>
  db.select().from(fillerMetals).orderBy(asc(fillerMetals.fNumber), asc(fillerMetals.specification), asc(fillerMetals.classification))

const baseName = (m: { specification: string, grade: string }) => `${m.specification} ${m.grade}`
const fillerName = (m: { specification: string, classification: string }) => `${m.specification} ${m.classification}`

async function inserted<T>(work: () => Promise<T>, taken: string) {
  return settle(async () => {
    try {
      return await work()
    }
    catch (error) {
      if (isUniqueViolation(error)) throw conflict(`${taken} is in the catalogue already.`)
      throw error
    }
  })
}

export async function addBaseMetal(db: Db, input: BaseMetalInput, accountId: number) {
  return inserted(() => db.transaction(async (tx) => {
    const [row] = await tx.insert(baseMetals).values(input).returning()
    await recordAudit(tx, { accountId, action: 'base-metal.create', recordType: 'base-metal', recordId: row!.id, after: row })
    return row!
  }), baseName(input))
}

export async function addFillerMetal(db: Db, input: FillerMetalInput, accountId: number) {
  return inserted(() => db.transaction(async (tx) => {
    const [row] = await tx.insert(fillerMetals).values(input).returning()
    await recordAudit(tx, { accountId, action: 'filler-metal.create', recordType: 'filler-metal', recordId: row!.id, after: row })
    return row!
  }), fillerName(input))
}

const signedWith = (byMetal: 'baseMetalId' | 'fillerMetalId', id: number) =>
  and(eq(pqrs[byMetal], id), ne(pqrs.status, 'recorded'))

export async function updateBaseMetal(db: Db, id: number, patch: Partial<BaseMetalInput>, accountId: number) {
  return inserted(() => db.transaction(async (tx): Promise<BaseMetal> => {
    const [row] = await tx.select().from(baseMetals).where(eq(baseMetals.id, id)).for('update')
    if (!row) throw missing('Base metal')
    const [signed] = await tx.select({ number: pqrs.number }).from(pqrs).where(signedWith('baseMetalId', id)).limit(1)
    if (signed) throw conflict(`${signed.number} is signed with ${baseName(row)}: add a new catalogue entry instead of changing this one.`)
    const [saved] = await tx.update(baseMetals).set(patch).where(eq(baseMetals.id, id)).returning()
    await recordAudit(tx, { accountId, action: 'base-metal.update', recordType: 'base-metal', recordId: id, before: row, after: saved })
    return saved!
  }), 'That specification and grade')
}

export async function updateFillerMetal(db: Db, id: number, patch: Partial<FillerMetalInput>, accountId: number) {
  return inserted(() => db.transaction(async (tx): Promise<FillerMetal> => {
    const [row] = await tx.select().from(fillerMetals).where(eq(fillerMetals.id, id)).for('update')
    if (!row) throw missing('Filler metal')
    const [signed] = await tx.select({ number: pqrs.number }).from(pqrs).where(signedWith('fillerMetalId', id)).limit(1)
    if (signed) throw conflict(`${signed.number} is signed with ${fillerName(row)}: add a new catalogue entry instead of changing this one.`)
    const [saved] = await tx.update(fillerMetals).set(patch).where(eq(fillerMetals.id, id)).returning()
    await recordAudit(tx, { accountId, action: 'filler-metal.update', recordType: 'filler-metal', recordId: id, before: row, after: saved })
    return saved!
  }), 'That specification and classification')
}
