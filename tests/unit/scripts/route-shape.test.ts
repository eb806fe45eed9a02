import { readdirSync, readFileSync, statSync } from 'node:fs'
import { join, relative } from 'node:path'
import { describe, expect, it } from 'vitest'

// The shape of a route (DEVELOPERS.md "The shape of a route"): role → validate → one call into server/database/ →
// answer. These checks read every file under server/api/; a route that checks no role first, or makes more than one
// call into server/database/, fails here with its path, unless it is named below with the reason it differs.

const root = join(import.meta.dirname, '../../..')

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name)
    return statSync(path).isDirectory() ? filesUnder(path) : name.endsWith('.ts') ? [path] : []
  })
}

/** Routes anyone may call without a session: each checks its own secret (a link token, a verification code) or none. */
const publicRoutes: Record<string, string> = {
  'server/api/auth/[...].ts': 'the sign-in handler itself',
  'server/api/cards/[token].get.ts': 'public ID card page, by its unguessable token',
  'server/api/me/feed/[token].get.ts': 'calendar feed, by its unguessable token',
  'server/api/health/index.get.ts': 'health probe',
  'server/api/verify/[code].get.ts': 'public verification of a printed sheet',
  'server/api/password/link.get.ts': 'password link, by its token',
  'server/api/password/forgot.post.ts': 'asks for a password link',
  'server/api/password/set.post.ts': 'sets a password with a link token',
}

/** Routes that make more than one call into server/database/, and why. */
const severalCalls: Record<string, string> = {
  'server/api/auth/[...].ts': 'the sign-in throttle wraps the auth library: reserve, then succeed, fail or abandon',
  'server/api/continuity/index.post.ts': 'whether the shop lets a welder log is checked before the body is validated (403 before 400)',
  'server/api/sheets/continuity/[welderId].get.ts': 'the period is read before the sheet is built in server/sheets/',
}

const roleCheck = /^\s*(?:const\s+[^=]+=\s*)?await\s+(requireRole|requireTrialUser|requireToken)\(/

/** The handler's first statement, and the number of calls it makes to functions imported from server/database/. */
export function routeShape(source: string) {
  const domain: string[] = []
  for (const [, typeOnly, names, from] of source.matchAll(/import\s+(type\s+)?\{([^}]*)\}\s+from\s+['"]([^'"]+)['"]/g)) {
    if (typeOnly || !/(^|\/)database\//.test(from!)) continue
    for (const name of names!.split(',').map(n => n.trim()).filter(n => n && !n.startsWith('type '))) domain.push(name.split(/\s+as\s+/).pop()!)
  }
  const body = source.replace(/^import[^\n]*\n/gm, '')
  const calls = domain.flatMap(name => [...body.matchAll(new RegExp(`(?<![\\w.])${name}\\s*\\(`, 'g'))].map(() => name))
  const first = body.split('defineEventHandler')[1]?.split('\n')[1] ?? ''
  return { calls, checksRoleFirst: roleCheck.test(first) }
}

const routes = filesUnder(join(root, 'server/api')).map(path => ({ path: relative(root, path), ...routeShape(readFileSync(path, 'utf8')) }))

describe('the shape of a route', () => {
  it('every route checks the role first, except the public ones', () => {
    expect(routes.filter(r => !r.checksRoleFirst && !(r.path in publicRoutes)).map(r => r.path)).toEqual([])
  })

  it('every route makes at most one call into server/database/, except those named with their reason', () => {
    expect(routes.filter(r => r.calls.length > 1 && !(r.path in severalCalls)).map(r => `${r.path}: ${r.calls.join(', ')}`)).toEqual([])
  })

  it('the exceptions are still exceptions (a fixed route leaves the list)', () => {
    const byPath = new Map(routes.map(r => [r.path, r]))
    expect(Object.keys(severalCalls).filter(p => (byPath.get(p)?.calls.length ?? 0) <= 1)).toEqual([])
    expect(Object.keys(publicRoutes).filter(p => !byPath.has(p) || byPath.get(p)!.checksRoleFirst)).toEqual([])
  })

  it('the check can fail: two domain calls and a missing role check are seen', () => {
    const two = routeShape(`import { findProcedure, procedureDetail } from '../../database/procedures'
export default defineEventHandler(async (event) => {
  const { id } = await validParams(event, idParamSchema)
  const row = await findProcedure(db, id)
  return procedureDetail(db, row)
})`)
    expect(two.calls).toEqual(['findProcedure', 'procedureDetail'])
    expect(two.checksRoleFirst).toBe(false)
    const one = routeShape(`import { welderPage } from '../../database/welders'
import type { Failure } from '../../database/types'
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  return orThrow(await welderPage(await useDb(), user, 1))
})`)
    expect(one).toEqual({ calls: ['welderPage'], checksRoleFirst: true })
  })
})
