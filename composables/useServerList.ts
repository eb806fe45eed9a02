import type { Page } from '#shared/schemas/list'

/** A server-paged, sorted and filtered list bound to the page's query string. */
export function useServerList<T>(url: string, defaults: { sort: string, dir?: 'asc' | 'desc', pageSize?: number }) {
  const route = useRoute()
  const router = useRouter()
  const query = computed(() => ({
    page: Number(route.query.page ?? 1) || 1,
    pageSize: Number(route.query.pageSize ?? defaults.pageSize ?? 25) || 25,
    sort: String(route.query.sort ?? defaults.sort),
    dir: (route.query.dir === 'desc' || route.query.dir === 'asc') ? route.query.dir : (defaults.dir ?? 'asc'),
    ...Object.fromEntries(Object.entries(route.query).filter(([k, v]) => !['page', 'pageSize', 'sort', 'dir'].includes(k) && v !== '')),
  }))
  /** The current value of a filter in the query string ('' when unset). */
  const filter = (name: string) => {
    const value = route.query[name]
    return typeof value === 'string' ? value : ''
  }
  const { data, status, error, refresh } = useFetch<Page<T>>(url, { query, key: `list:${url}`, watch: [query] })

  function update(patch: Record<string, string | number | undefined>) {
    const next: Record<string, string> = {}
    for (const [k, v] of Object.entries({ ...route.query, ...patch })) if (v !== undefined && v !== '' && v !== null) next[k] = String(v)
    router.replace({ query: next })
  }
  function sortBy(column: string) {
    const dir = query.value.sort === column && query.value.dir === 'asc' ? 'desc' : 'asc'
    update({ sort: column, dir, page: 1 })
  }
  return { data, status, error, refresh, query, filter, update, sortBy }
}

export type ServerList<T> = ReturnType<typeof useServerList<T>>
