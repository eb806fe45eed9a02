import { fieldWords } from '../vocabulary/field-words'

/** The fields that differ between two snapshots of a record, for the audit history. */
export function changedFields(before: unknown, after: unknown): { field: string, from: unknown, to: unknown }[] {
  const a = (before && typeof before === 'object' ? before : {}) as Record<string, unknown>
  const b = (after && typeof after === 'object' ? after : {}) as Record<string, unknown>
  const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])].filter(k => !['updatedAt', 'version'].includes(k)).sort()
  return keys.filter(k => JSON.stringify(a[k]) !== JSON.stringify(b[k])).map(k => ({ field: k, from: a[k], to: b[k] }))
}

/** A value as read on screen: a dash for nothing, yes/no, a list joined by commas. */
export function valueText(v: unknown): string {
  if (v === null || v === undefined || v === '') return '—'
  if (typeof v === 'boolean') return v ? 'yes' : 'no'
  if (Array.isArray(v)) return v.length ? v.map(valueText).join(', ') : '—'
  if (typeof v === 'object') return Object.entries(v as Record<string, unknown>).map(([k, x]) => `${fieldWords(k)} ${valueText(x)}`).join(', ')
  return String(v)
}

function leaves(v: unknown, path: string[], out: Map<string, unknown>) {
  if (v && typeof v === 'object' && !Array.isArray(v)) {
    for (const [k, x] of Object.entries(v as Record<string, unknown>)) leaves(x, [...path, fieldWords(k)], out)
  }
  else if (Array.isArray(v) && v.some(x => x && typeof x === 'object')) {
    v.forEach((x, i) => leaves(x, [...path, String(i + 1)], out))
  }
  else {
    out.set(path.join(' › '), v)
  }
}

/** The changes between two snapshots as labelled lines (Layers › 1 › amps › to: 130 → 140), never raw JSON. */
export function changeLines(before: unknown, after: unknown): { label: string, from: string, to: string }[] {
  return changedFields(before, after).flatMap(({ field, from, to }) => {
    const a = new Map<string, unknown>()
    const b = new Map<string, unknown>()
    leaves(from, [fieldWords(field)], a)
    leaves(to, [fieldWords(field)], b)
    return [...new Set([...a.keys(), ...b.keys()])]
      .map(label => ({ label: label.charAt(0).toUpperCase() + label.slice(1), from: valueText(a.get(label)), to: valueText(b.get(label)) }))
      .filter(line => line.from !== line.to)
  })
}
