import type { AnyColumn, SQL } from 'drizzle-orm'
import { and, asc, desc } from 'drizzle-orm'

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

/** Every filter that applies, joined with AND; undefined when none does. */
export function allOf(filters: (SQL | undefined | null | false | '' | 0)[]) {
  const kept = filters.filter((f): f is SQL => !!f)
  return kept.length ? and(...kept) : undefined
}

/** One page of a list and the total behind it, in the shape every list route answers (shared/schemas/list.ts Page). */
export async function pageOf<T>(query: { page: number, pageSize: number }, rows: (window: { limit: number, offset: number }) => Promise<T[]>, total: () => Promise<{ total: number }[]>) {
  const [items, [totals]] = await Promise.all([rows(pageWindow(query)), total()])
  return { items, total: totals?.total ?? 0, page: query.page, pageSize: query.pageSize }
}
