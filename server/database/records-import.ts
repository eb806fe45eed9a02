import { sql } from 'drizzle-orm'
import type { Db } from './client'
import { welders } from './schema'
import { recordAudit } from './audit'
import { insertEntries } from './continuity'
import type { SessionUser } from '../utils/auth'
import { readSheet, type ReadSheet } from '../utils/spreadsheets'
import { guessMapping, importFields, type ImportKind, type ImportRowError, type RecordsImport } from '../../shared/schemas/records'
import { welderSchema, type WelderInput } from '../../shared/schemas/welder'
import { continuityImportRowSchema } from '../../shared/schemas/continuity-entry'
import { importedTestRowSchema, type ImportedTestRow } from '../../shared/schemas/imported-test'
import { storeImportedTests } from './imported-tests'
import { checkDocuments, storeImportedDocuments, type DocumentRow } from './imported-documents'
import { invalid } from '../../shared/types/outcome'

// Bringing a shop's records in from its own spreadsheets (CSV or XLSX): the columns mapped to Rootface's fields (guessed
// from the headers, changed on the mapping screen), every row checked, a dry run that shows what will be created and
// every row error, and a commit that stores every row in one transaction or nothing at all.

export interface Checked<T> { rows: { line: number, value: T, shown: Record<string, string> }[], errors: ImportRowError[] }

const PREVIEW_ROWS = 200

export function fieldErrors(line: number, error: { flatten: () => { fieldErrors: Record<string, string[] | undefined> } }, mapping: Record<string, string>, cells: Record<string, string>): ImportRowError[] {
  return Object.entries(error.flatten().fieldErrors).map(([field, messages]) => {
    const column = mapping[field]
    return { line, field, message: messages?.[0] ?? 'Invalid', column, value: column === undefined ? undefined : cells[column] ?? '' }
  })
}

export const pick = (mapping: Record<string, string>, cells: Record<string, string>, key: string) => {
  const column = mapping[key]
  const value = column === undefined ? undefined : cells[column]
  return value === '' ? undefined : value
}

async function checkRoster(db: Db, sheet: ReadSheet, mapping: Record<string, string>): Promise<Checked<WelderInput>> {
  const existing = new Set((await db.select({ stamp: sql<string>`lower(${welders.stamp})` }).from(welders)).map(r => r.stamp))
  const seen = new Map<string, number>()
  const out: Checked<WelderInput> = { rows: [], errors: [] }
  for (const { line, cells } of sheet.rows) {
    const parsed = welderSchema.safeParse({
      stamp: pick(mapping, cells, 'stamp'), name: pick(mapping, cells, 'name'), employeeNumber: pick(mapping, cells, 'employeeNumber'),
      email: pick(mapping, cells, 'email'), status: pick(mapping, cells, 'status')?.toLowerCase(),
    })
    if (!parsed.success) {
      out.errors.push(...fieldErrors(line, parsed.error, mapping, cells))
      continue
    }
    const w = parsed.data
    const key = w.stamp.toLowerCase()
    if (existing.has(key)) {
      out.errors.push({ line, field: 'stamp', message: `Stamp ${w.stamp} is already on the roster`, column: mapping.stamp, value: w.stamp })
      continue
    }
    if (seen.has(key)) {
      out.errors.push({ line, field: 'stamp', message: `Stamp ${w.stamp} is on line ${seen.get(key)} too`, column: mapping.stamp, value: w.stamp })
      continue
    }
    seen.set(key, line)
    out.rows.push({ line, value: w, shown: { stamp: w.stamp, name: w.name, employeeNumber: w.employeeNumber ?? '', email: w.email ?? '', status: w.status } })
  }
  return out
}

type TestRow = Omit<ImportedTestRow, 'stamp'> & { welderId: number }

async function checkTests(db: Db, sheet: ReadSheet, mapping: Record<string, string>, today: string): Promise<Checked<TestRow>> {
  const roster = new Map((await db.select({ id: welders.id, stamp: welders.stamp }).from(welders)).map(w => [w.stamp.toLowerCase(), w]))
  const out: Checked<TestRow> = { rows: [], errors: [] }
  const keys = ['stamp', 'process', 'code', 'edition', 'testDate', 'positions', 'thickness', 'diameter', 'otherRanges', 'reference']
  for (const { line, cells } of sheet.rows) {
    const parsed = importedTestRowSchema.safeParse(Object.fromEntries(keys.map(k => [k, pick(mapping, cells, k)])))
    if (!parsed.success) {
      out.errors.push(...fieldErrors(line, parsed.error, mapping, cells))
      continue
    }
    const { stamp, ...r } = parsed.data
    const welder = roster.get(stamp.toLowerCase())
    if (!welder) {
      out.errors.push({ line, field: 'stamp', message: `No welder with stamp ${stamp} on the roster`, column: mapping.stamp, value: stamp })
      continue
    }
    if (r.testDate > today) {
      out.errors.push({ line, field: 'testDate', message: `${r.testDate} is after today`, column: mapping.testDate, value: r.testDate })
      continue
    }
    out.rows.push({
      line, value: { ...r, welderId: welder.id },
      shown: { stamp: welder.stamp, process: r.process, code: r.code, edition: r.edition ?? '', testDate: r.testDate, positions: r.positions ?? '', thickness: r.thickness ?? '', diameter: r.diameter ?? '', otherRanges: r.otherRanges ?? '', reference: r.reference ?? '' },
    })
  }
  return out
}

interface ContinuityRow { welderId: number, process: string, weldedOn: string, reference: string }

async function checkContinuity(db: Db, sheet: ReadSheet, mapping: Record<string, string>, today: string): Promise<Checked<ContinuityRow>> {
  const roster = new Map((await db.select({ id: welders.id, stamp: welders.stamp }).from(welders)).map(w => [w.stamp.toLowerCase(), w]))
  const seen = new Set<string>()
  const out: Checked<ContinuityRow> = { rows: [], errors: [] }
  for (const { line, cells } of sheet.rows) {
    const parsed = continuityImportRowSchema.safeParse({
      stamp: pick(mapping, cells, 'stamp'), process: pick(mapping, cells, 'process'), weldedOn: pick(mapping, cells, 'weldedOn'), reference: pick(mapping, cells, 'reference'),
    })
    if (!parsed.success) {
      out.errors.push(...fieldErrors(line, parsed.error, mapping, cells))
      continue
    }
    const r = parsed.data
    const welder = roster.get(r.stamp.toLowerCase())
    if (!welder) {
      out.errors.push({ line, field: 'stamp', message: `No welder with stamp ${r.stamp} on the roster`, column: mapping.stamp, value: r.stamp })
      continue
    }
    if (r.weldedOn > today) {
      out.errors.push({ line, field: 'weldedOn', message: `${r.weldedOn} is after today`, column: mapping.weldedOn, value: r.weldedOn })
      continue
    }
    const key = `${welder.id}|${r.process}|${r.weldedOn}|${r.reference}`
    if (seen.has(key)) {
      out.errors.push({ line, field: 'row', message: 'The same entry appears twice in the file' })
      continue
    }
    seen.add(key)
    out.rows.push({ line, value: { welderId: welder.id, process: r.process, weldedOn: r.weldedOn, reference: r.reference }, shown: { stamp: welder.stamp, process: r.process, weldedOn: r.weldedOn, reference: r.reference } })
  }
  return out
}

async function storeRoster(db: Db, rows: WelderInput[], user: SessionUser) {
  return db.transaction(async (tx) => {
    let stored = 0
    for (let i = 0; i < rows.length; i += 100) {
      stored += (await tx.insert(welders).values(rows.slice(i, i + 100)).returning({ id: welders.id })).length
    }
    await recordAudit(tx as unknown as Db, { accountId: user.id, action: 'import', recordType: 'welder', after: { count: stored, first: rows[0]?.stamp, last: rows.at(-1)?.stamp } })
    return stored
  })
}

/**
 * Reads the file, maps its columns, checks every row. Without `commit` it answers the dry run (headers, the mapping used,
 * the rows to be created, every row error); with `commit` it stores every row, or nothing while any row is wrong.
 */
export async function importRecords(db: Db, user: SessionUser, kind: ImportKind, input: RecordsImport, today: string) {
  let sheet: ReadSheet
  try {
    sheet = await readSheet(input.content, input.format)
  }
  catch {
    return invalid('body', [`The file could not be read as ${input.format.toUpperCase()}`], { content: [`Not a readable ${input.format.toUpperCase()} file`] })
  }
  const fields = importFields[kind]
  const mapping = input.mapping ?? guessMapping(kind, sheet.headers)
  const errors: ImportRowError[] = []
  for (const [key, column] of Object.entries(mapping)) {
    if (!fields.some(f => f.key === key)) errors.push({ line: 1, field: 'mapping', message: `Rootface has no field ${key} here` })
    else if (!sheet.headers.includes(column)) errors.push({ line: 1, field: 'mapping', message: `The file has no column ${column}` })
  }
  for (const f of fields) if (f.required && !mapping[f.key]) errors.push({ line: 1, field: 'mapping', message: `Choose the column that holds ${f.label.toLowerCase()}` })
  if (!sheet.rows.length) errors.push({ line: 1, field: 'file', message: 'The file has no rows under its header line' })
  const checked = errors.length
    ? { rows: [], errors: [] }
    : kind === 'roster'
      ? await checkRoster(db, sheet, mapping)
      : kind === 'tests'
        ? await checkTests(db, sheet, mapping, today)
        : kind === 'continuity' ? await checkContinuity(db, sheet, mapping, today) : await checkDocuments(db, kind === 'wps-headers' ? 'wps' : 'pqr', sheet, mapping)
  errors.push(...checked.errors)
  errors.sort((a, b) => a.line - b.line)
  const summary = {
    kind, headers: sheet.headers, mapping, fields, lines: sheet.rows.length, total: checked.rows.length, errors,
    preview: checked.rows.slice(0, PREVIEW_ROWS).map(r => ({ line: r.line, ...r.shown })),
  }
  if (!input.commit) return { ...summary, stored: 0 }
  if (errors.length) return invalid('body', [`${errors.length} row error${errors.length === 1 ? '' : 's'}: nothing was imported`], {}, errors)
  const stored = kind === 'roster'
    ? await storeRoster(db, (checked as Checked<WelderInput>).rows.map(r => r.value), user)
    : kind === 'tests'
      ? await storeImportedTests(db, (checked as Checked<TestRow>).rows.map(r => r.value), user)
      : kind !== 'continuity'
        ? await storeImportedDocuments(db, kind === 'wps-headers' ? 'wps' : 'pqr', (checked as Checked<DocumentRow>).rows.map(r => r.value), user)
        : await insertEntries(db, (checked as Checked<ContinuityRow>).rows.map(r => r.value), user.id, 'import')
  return { ...summary, preview: [], stored }
}
