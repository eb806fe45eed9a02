import { and, asc, desc, eq } from 'drizzle-orm'
import type { Db } from './client'
import { accounts, importedTests, standingRefresh } from './schema'
import { recordAudit } from './audit'
import { mayReadWelder } from './welders'
import type { SessionUser } from '../utils/auth'
import type { ImportedTestRow } from '../../shared/schemas/imported-test'
import { conflict, missing } from '../../shared/types/outcome'

// Welder test history brought in from a shop's own records: ranges as recorded there, never recomputed. An inspector
// confirms each against the original record; until then it shows as "imported, not recomputed".

type NewImported = Omit<ImportedTestRow, 'stamp'> & { welderId: number }

/** Stores the rows of one import in one transaction (inside the caller's all-or-nothing commit). */
export async function storeImportedTests(db: Db, rows: NewImported[], user: SessionUser) {
  return db.transaction(async (tx) => {
    let stored = 0
    for (let i = 0; i < rows.length; i += 100) {
      stored += (await tx.insert(importedTests).values(rows.slice(i, i + 100).map(r => ({ ...r, importedBy: user.id }))).returning({ id: importedTests.id })).length
    }
    await recordAudit(tx as unknown as Db, { accountId: user.id, action: 'import', recordType: 'imported-test', after: { count: stored } })
    return stored
  })
}

/** A welder's imported test history as `user` may read it (a welder their own; another's is missing). */
export async function importedTestsOf(db: Db, user: SessionUser, welderId: number) {
  if (!await mayReadWelder(db, user, welderId)) return missing('Welder')
  return db.select({
    id: importedTests.id, code: importedTests.code, edition: importedTests.edition, process: importedTests.process, testDate: importedTests.testDate,
    positions: importedTests.positions, thickness: importedTests.thickness, diameter: importedTests.diameter, otherRanges: importedTests.otherRanges,
    reference: importedTests.reference, state: importedTests.state, confirmedAt: importedTests.confirmedAt, confirmedBy: accounts.name,
  }).from(importedTests).leftJoin(accounts, eq(accounts.id, importedTests.confirmedBy))
    .where(eq(importedTests.welderId, welderId)).orderBy(desc(importedTests.testDate), asc(importedTests.id))
}

/**
 * The inspector confirms an imported test against the original record; a confirmed one stays confirmed (409). Once
 * confirmed it keeps the welder's standing for its process and continuity like a certified test; before, it never does.
 */
export async function confirmImportedTest(db: Db, user: SessionUser, id: number) {
  const [row] = await db.select().from(importedTests).where(eq(importedTests.id, id)).limit(1)
  if (!row) return missing('Imported test')
  if (row.state === 'confirmed') return conflict('This imported test is confirmed already.')
  return db.transaction(async (tx) => {
    const [saved] = await tx.update(importedTests).set({ state: 'confirmed', confirmedBy: user.id, confirmedAt: new Date() })
      .where(and(eq(importedTests.id, id), eq(importedTests.state, 'imported'))).returning()
    if (!saved) return conflict('This imported test is confirmed already.')
    // From now on it feeds the kept standing of its process like a certified test (server/database/standings.ts).
    await tx.insert(standingRefresh).values({ welderId: saved.welderId, process: saved.process }).onConflictDoNothing()
    await recordAudit(tx as unknown as Db, { accountId: user.id, action: 'confirm', recordType: 'imported-test', recordId: id, before: { state: row.state }, after: { state: 'confirmed' } })
    return saved
  })
}
