import type { MaybeRefOrGetter } from 'vue'

/**
 * The roster for pickers: up to 200 welders by stamp, active ones unless `all`, optionally narrowed by a search text.
 * One key per variant, so every picker on a page shares one request. The row type comes from GET /api/welders.
 */
export function useRoster(options: { all?: boolean, search?: MaybeRefOrGetter<string | undefined>, immediate?: boolean } = {}) {
  const query = computed(() => ({
    pageSize: 200, sort: 'stamp' as const,
    ...(options.all ? {} : { status: 'active' as const }),
    ...(toValue(options.search) ? { q: toValue(options.search) } : {}),
  }))
  return useFetch('/api/welders', {
    query, key: `roster-${options.all ? 'all' : 'active'}-${toValue(options.search) ?? ''}`,
    immediate: options.immediate ?? true,
  })
}
