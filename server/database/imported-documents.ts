import { and, asc, eq } from 'drizzle-orm'
import type { Db } from './client'
import { importedDocuments, pqrs, procedures } from './schema'
import { recordAudit } from './audit'
import { fieldErrors, pick, type Checked } from './records-import'
import type { SessionUser } from '../utils/auth'
import type { ReadSheet } from '../utils/spreadsheets'
import { importedDocumentRowSchema, type ImportedDocumentRow } from '../../shared/schemas/imported-test'

// The register of a shop's existing WPSs and PQRs, brought in by header (number, revision, title, code, processes) as
// recorded: what exists on paper until each is entered in full. Nothing here is checked against the code.

export type DocumentRow = ImportedDocumentRow
type Kind = 'wps' | 'pqr'

const keys = ['number', 'revision', 'title', 'code', 'edition', 'processes', 'documentDate', 'status']

/** Every line checked; a number and revision already imported, already entered in Rootface, or twice in the file is a row error. */
export async function checkDocuments(db: Db, kind: Kind, sheet: ReadSheet, mapping: Record<string, string>): Promise<Checked<DocumentRow>> {
  const imported = await db.select({ number: importedDocuments.number, revision: importedDocuments.revision }).from(importedDocuments).where(eq(importedDocuments.kind, kind))
  const entered = kind === 'wps'
    ? (await db.select({ number: procedures.number, revision: procedures.revision }).from(procedures)).map(r => ({ number: r.number, revision: String(r.revision) }))
    : (await db.select({ number: pqrs.number }).from(pqrs)).map(r => ({ number: r.number, revision: '' }))
  const taken = new Map<string, string>()
  for (const r of imported) taken.set(`${r.number.toLowerCase()}|${r.revision}`, 'imported already')
  for (const r of entered) taken.set(`${r.number.toLowerCase()}|${kind === 'wps' ? r.revision : ''}`, 'entered in Rootface already')
  const seen = new Map<string, number>()
  const out: Checked<DocumentRow> = { rows: [], errors: [] }
  for (const { line, cells } of sheet.rows) {
    const parsed = importedDocumentRowSchema.safeParse(Object.fromEntries(keys.map(k => [k, pick(mapping, cells, k)])))
    if (!parsed.success) {
      out.errors.push(...fieldErrors(line, parsed.error, mapping, cells))
      continue
    }
    const r = parsed.data
    const key = `${r.number.toLowerCase()}|${r.revision}`
    const label = `${r.number}${r.revision ? ` rev. ${r.revision}` : ''}`
    if (taken.has(key) || (kind === 'pqr' && taken.has(`${r.number.toLowerCase()}|`))) {
      out.errors.push({ line, field: 'number', message: `${label} is ${taken.get(key) ?? 'entered in Rootface already'}`, column: mapping.number, value: r.number })
      continue
    }
    if (seen.has(key)) {
      out.errors.push({ line, field: 'number', message: `${label} is on line ${seen.get(key)} too`, column: mapping.number, value: r.number })
      continue
    }
    seen.set(key, line)
    out.rows.push({ line, value: r, shown: Object.fromEntries(keys.map(k => [k, String(r[k as keyof DocumentRow] ?? '')])) })
  }
  return out
}

export async function storeImportedDocuments(db: Db, kind: Kind, rows: DocumentRow[], user: SessionUser) {
  return db.transaction(async (tx) => {
    let stored = 0
    for (let i = 0; i < rows.length; i += 100) {
      stored += (await tx.insert(importedDocuments).values(rows.slice(i, i + 100).map(r => ({ ...r, kind, importedBy: user.id }))).returning({ id: importedDocuments.id })).length
    }
    await recordAudit(tx as unknown as Db, { accountId: user.id, action: 'import', recordType: `imported-${kind}`, after: { count: stored } })
    return stored
  })
}

/** The imported headers of one kind, by number and revision. */
export async function listImportedDocuments(db: Db, kind: Kind) {
  return db.select().from(importedDocuments).where(and(eq(importedDocuments.kind, kind))).orderBy(asc(importedDocuments.number), asc(importedDocuments.revision))
}
