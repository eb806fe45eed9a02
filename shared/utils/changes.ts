/** The fields that differ between two snapshots of a record, for the audit history. */
export function changedFields(before: unknown, after: unknown): { field: string, from: unknown, to: unknown }[] {
  const a = (before && typeof before === 'object' ? before : {}) as Record<string, unknown>
  const b = (after && typeof after === 'object' ? after : {}) as Record<string, unknown>
  const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])].filter(k => !['updatedAt', 'version'].includes(k)).sort()
  return keys.filter(k => JSON.stringify(a[k]) !== JSON.stringify(b[k])).map(k => ({ field: k, from: a[k], to: b[k] }))
}
