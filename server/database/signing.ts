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

/**
 * The content a signature covers: the record's own fields, without bookkeeping (timestamps, version counters).
 * Which fields is fixed per content format, so a later column never changes the hash of an earlier signature:
 * format 1 is the record as it was before process layers; format 2 adds the layers, the process list, base metal B,
 * the coupon's welder and the PQR a welder test came from; format 3 adds a welder test's ISO 9606-1 block (filler type,
 * weld details, examiner, methods of test, 9.3 route). A signature keeps the format it was made with.
 */
export type ContentFormat = 1 | 2 | 3
export const currentContentFormat: ContentFormat = 3

const fieldsOf: Record<SignedRecordType, Record<ContentFormat, string[]>> = {
  'procedure': {
    1: ['id', 'number', 'revision', 'title', 'code', 'edition', 'unit', 'process', 'transfer', 'pNumberA', 'pNumberB', 'thicknessMin', 'thicknessMax',
      'diameterMin', 'positions', 'fNumbers', 'variables'],
    2: [],
    3: [],
  },
  'pqr': {
    1: ['id', 'number', 'testDate', 'code', 'edition', 'unit', 'process', 'transfer', 'couponThickness', 'depositThickness', 'baseMetalId',
      'fillerMetalId', 'toughnessRequired', 'actuals', 'toughness', 'labReportNumber'],
    2: [],
    3: [],
  },
  'welder-test': {
    1: ['id', 'welderId', 'procedureId', 'testDate', 'code', 'edition', 'unit', 'process', 'transfer', 'form', 'weld', 'couponThickness',
      'depositThickness', 'layers', 'outsideDiameter', 'pNumber', 'fNumber', 'backing', 'positions', 'progression', 'visualAccepted', 'visualNotes',
      'examination', 'radiography', 'ranges'],
    2: [],
    3: [],
  },
}
fieldsOf.procedure[2] = [...fieldsOf.procedure[1], 'processes', 'layers']
fieldsOf.pqr[2] = [...fieldsOf.pqr[1], 'processes', 'layers', 'baseMetalBId', 'welderId']
fieldsOf['welder-test'][2] = [...fieldsOf['welder-test'][1], 'processes', 'deposits', 'pqrId']
fieldsOf.procedure[3] = fieldsOf.procedure[2]
fieldsOf.pqr[3] = fieldsOf.pqr[2]
fieldsOf['welder-test'][3] = [...fieldsOf['welder-test'][2], 'iso']

const pick = (row: Record<string, unknown>, keys: string[]) => Object.fromEntries(keys.filter(k => k in row).map(k => [k, row[k]]))
const omit = <T extends Record<string, unknown>>(row: T, keys: string[]) =>
  Object.fromEntries(Object.entries(row).filter(([k]) => !keys.includes(k)))

export async function signedContent(db: Db, type: SignedRecordType, id: number, format: ContentFormat = currentContentFormat): Promise<Record<string, unknown> | null> {
  const keys = fieldsOf[type][format]
  if (type === 'procedure') {
    const [row] = await db.select().from(procedures).where(eq(procedures.id, id))
    if (!row) return null
    const support = await db.select({ number: pqrs.number }).from(procedurePqrs)
      .innerJoin(pqrs, eq(pqrs.id, procedurePqrs.pqrId)).where(eq(procedurePqrs.procedureId, id)).orderBy(asc(pqrs.number))
    return { ...pick(row, keys), supportingPqrs: support.map(s => s.number) }
  }
  if (type === 'pqr') {
    const [row] = await db.select().from(pqrs).where(eq(pqrs.id, id))
    if (!row) return null
    const tensile = await db.select().from(pqrTensileSpecimens).where(eq(pqrTensileSpecimens.pqrId, id)).orderBy(asc(pqrTensileSpecimens.id))
    const bends = await db.select().from(pqrBendSpecimens).where(eq(pqrBendSpecimens.pqrId, id)).orderBy(asc(pqrBendSpecimens.id))
    return { ...pick(row, keys), tensile: tensile.map(s => omit(s, ['id', 'pqrId'])), bends: bends.map(s => omit(s, ['id', 'pqrId'])) }
  }
  const [row] = await db.select().from(welderTests).where(eq(welderTests.id, id))
  if (!row) return null
  const bends = await db.select().from(welderTestBends).where(eq(welderTestBends.testId, id)).orderBy(asc(welderTestBends.id))
  // A welding operator's test also signs who it qualifies and the operator's variables; a welder's test signs what it
  // always did, so signatures made before these columns keep verifying.
  const operator = row.qualifiedAs === 'welding-operator' ? { qualifiedAs: row.qualifiedAs, operator: row.operator } : {}
  return { ...pick(row, keys), ...operator, bends: bends.map(s => omit(s, ['id', 'testId'])) }
}

/** The hash of a record's content in a given format (the current one for a new signature). */
export async function contentHash(db: Db, type: SignedRecordType, id: number, format: ContentFormat = currentContentFormat) {
  const content = await signedContent(db, type, id, format)
  return content ? sha256Hex(canonicalJson(content)) : null
}

export function contentFormatOf(value: number | null | undefined): ContentFormat {
  return value === 1 ? 1 : value === 3 ? 3 : 2
}
