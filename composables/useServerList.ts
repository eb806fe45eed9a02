import type { InternalApi } from 'nitropack/types'
import type { Page } from '#shared/schemas/list'

/** The routes whose GET answers a page of items (`{ items, total, page, pageSize }`). */
export type ListRoute = {
  [R in keyof InternalApi]: InternalApi[R] extends { get: { items: readonly unknown[], total: number } } ? R : never
}[keyof InternalApi]

/** One row of a list route's answer, as the route returns it (no hand-written copy of its shape). */
export type ListRow<R extends ListRoute> = InternalApi[R] extends { get: { items: readonly (infer T)[] } } ? T : never

/**
 * A server-paged, sorted and filtered list bound to the page's query string. `route` names the list route (its pattern,
 * e.g. '/api/projects/:id/joints'); `url` is the address to call when the pattern has parameters.
 */
export function useServerList<R extends ListRoute>(route: R, defaults: ListDefaults) {
  return listOf<ListRow<R>>(defaults.url ?? route, defaults)
}

interface ListDefaults { sort: string, dir?: 'asc' | 'desc', pageSize?: number, url?: string }

function listOf<T>(url: string, defaults: ListDefaults) {
  const currentRoute = useRoute()
  const router = useRouter()
  const query = computed(() => ({
    page: Number(currentRoute.query.page ?? 1) || 1,
    pageSize: Number(currentRoute.query.pageSize ?? defaults.pageSize ?? 25) || 25,
    sort: String(currentRoute.query.sort ?? defaults.sort),
    dir: (currentRoute.query.dir === 'desc' || currentRoute.query.dir === 'asc') ? currentRoute.query.dir : (defaults.dir ?? 'asc'),
    ...Object.fromEntries(Object.entries(currentRoute.query).filter(([k, v]) => !['page', 'pageSize', 'sort', 'dir'].includes(k) && v !== '')),
  }))
  /** The current value of a filter in the query string ('' when unset). */
  const filter = (name: string) => {
    const value = currentRoute.query[name]
    return typeof value === 'string' ? value : ''
  }
  // The address is a plain string here (patterns with parameters are filled in by the caller), so the row type comes
  // from the route useServerList names.
  const { data, status, error, refresh } = useFetch<Page<T>>(url, { query, key: `list:${url}`, watch: [query] })

  function update(patch: Record<string, string | number | undefined>) {
    const next: Record<string, string> = {}
    for (const [k, v] of Object.entries({ ...currentRoute.query, ...patch })) if (v !== undefined && v !== '' && v !== null) next[k] = String(v)
    router.replace({ query: next })
  }
  function sortBy(column: string) {
    const dir = query.value.sort === column && query.value.dir === 'asc' ? 'desc' : 'asc'
    update({ sort: column, dir, page: 1 })
  }
  return { data, status, error, refresh, query, filter, update, sortBy }
}

export type ServerList<T> = ReturnType<typeof listOf<T>>
