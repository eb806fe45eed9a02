import { readdirSync, readFileSync, statSync } from 'node:fs'
import { join, relative } from 'node:path'
import { describe, expect, it } from 'vitest'

// The house layout (DEVELOPERS.md "Where a query goes"): every database query lives in server/database/, and shared/
// stays pure (it imports only zod, date-fns and its own files), so the same rules run in the browser, the server and
// the rules CLI. These checks read the source tree; a file that breaks the layout fails here with its path.

const root = join(import.meta.dirname, '../../..')

function filesUnder(dir: string, ext: RegExp): string[] {
  const out: string[] = []
  for (const name of readdirSync(dir)) {
    const path = join(dir, name)
    if (statSync(path).isDirectory()) out.push(...filesUnder(path, ext))
    else if (ext.test(name)) out.push(path)
  }
  return out
}

/** A drizzle query call or raw SQL: what may only appear in server/database/. */
const queryPattern = /\bdb\s*\.\s*(select|selectDistinct|insert|update|delete|execute|transaction|query)\s*[(.]|\bsql`|\bsql\.raw\(/

describe('where code lives', () => {
  it('no file outside server/database/ queries the database', () => {
    const offenders = filesUnder(join(root, 'server'), /\.ts$/)
      .filter(path => !relative(root, path).startsWith(join('server', 'database')))
      .filter(path => queryPattern.test(readFileSync(path, 'utf8')))
      .map(path => relative(root, path))
    expect(offenders).toEqual([])
  })

  it('the pattern does find a query (the check above can fail)', () => {
    expect(queryPattern.test('const rows = await db.select().from(welders)')).toBe(true)
    expect(queryPattern.test('await db.transaction(async tx => {})')).toBe(true)
    expect(queryPattern.test('const x = sql`select 1`')).toBe(true)
    expect(queryPattern.test('const list = await listWelders(db, user)')).toBe(false)
  })

  it('shared/ imports only zod, date-fns and its own files', () => {
    const allowed = /^(\.{1,2}\/|zod$|zod\/|date-fns$|date-fns\/)/
    const offenders: string[] = []
    for (const path of filesUnder(join(root, 'shared'), /\.ts$/)) {
      if (path.endsWith('.d.ts')) continue // type declarations augment libraries' types; they hold no code
      for (const [, spec] of readFileSync(path, 'utf8').matchAll(/(?:^|\n)\s*(?:import|export)[^'"=()]*?from\s+['"]([^'"]+)['"]/g)) {
        if (!allowed.test(spec!)) offenders.push(`${relative(root, path)} imports ${spec}`)
      }
    }
    expect(offenders).toEqual([])
  })
})
