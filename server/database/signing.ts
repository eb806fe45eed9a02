import { createHash, randomBytes } from 'node:crypto'
import { asc, eq } from 'drizzle-orm'
import type { Db } from './client'
import { pqrBendSpecimens, pqrs, pqrTensileSpecimens, procedurePqrs, procedures, welderTestBends, welderTests } from './schema'

export type SignedRecordType = 'procedure' | 'pqr' | 'welder-test'

/** JSON with sorted keys, so the same content always hashes the same. */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value ?? null)
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`
}

export function sha256Hex(text: string) {
  return createHash('sha256').update(text, 'utf8').digest('hex')
}

const alphabet = 'ABCDEFGHJKMNPQRSTVWXYZ23456789'
/** A short code for the sheet and its QR code: 10 characters, about 49 bits. */
export function newVerifyCode() {
  return [...randomBytes(10)].map(b => alphabet[b % alphabet.length]).join('')
}

// The content a signature covers: the record's own fields, without bookkeeping (timestamps, version counters).
const omit = <T extends Record<string, unknown>>(row: T, keys: string[]) =>
  Object.fromEntries(Object.entries(row).filter(([k]) => !keys.includes(k)))
const bookkeeping = ['version', 'createdAt', 'updatedAt', 'approvedAt', 'certifiedAt', 'status', 'createdBy']

export async function signedContent(db: Db, type: SignedRecordType, id: number): Promise<Record<string, unknown> | null> {
  if (type === 'procedure') {
    const [row] = await db.select().from(procedures).where(eq(procedures.id, id))
    if (!row) return null
    const support = await db.select({ number: pqrs.number }).from(procedurePqrs)
      .innerJoin(pqrs, eq(pqrs.id, procedurePqrs.pqrId)).where(eq(procedurePqrs.procedureId, id)).orderBy(asc(pqrs.number))
    return { ...omit(row, bookkeeping), supportingPqrs: support.map(s => s.number) }
  }
  if (type === 'pqr') {
    const [row] = await db.select().from(pqrs).where(eq(pqrs.id, id))
    if (!row) return null
    const tensile = await db.select().from(pqrTensileSpecimens).where(eq(pqrTensileSpecimens.pqrId, id)).orderBy(asc(pqrTensileSpecimens.id))
    const bends = await db.select().from(pqrBendSpecimens).where(eq(pqrBendSpecimens.pqrId, id)).orderBy(asc(pqrBendSpecimens.id))
    return { ...omit(row, bookkeeping), tensile: tensile.map(s => omit(s, ['id', 'pqrId'])), bends: bends.map(s => omit(s, ['id', 'pqrId'])) }
  }
  const [row] = await db.select().from(welderTests).where(eq(welderTests.id, id))
  if (!row) return null
  const bends = await db.select().from(welderTestBends).where(eq(welderTestBends.testId, id)).orderBy(asc(welderTestBends.id))
  return { ...omit(row, [...bookkeeping, 'inspectorId']), bends: bends.map(s => omit(s, ['id', 'testId'])) }
}

export async function contentHash(db: Db, type: SignedRecordType, id: number) {
  const content = await signedContent(db, type, id)
  return content ? sha256Hex(canonicalJson(content)) : null
}
