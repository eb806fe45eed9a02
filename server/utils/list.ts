import type { AnyColumn, SQL } from 'drizzle-orm'
import { asc, desc } from 'drizzle-orm'

export function orderOf(column: AnyColumn | SQL, dir: 'asc' | 'desc') {
  return dir === 'desc' ? desc(column) : asc(column)
}

export function pageWindow(query: { page: number, pageSize: number }) {
  return { limit: query.pageSize, offset: (query.page - 1) * query.pageSize }
}

/** LIKE pattern for a free-text filter, with the wildcards of the user's text escaped. */
export function containsPattern(q: string) {
  return `%${q.replace(/[\\%_]/g, m => `\\${m}`)}%`
}
