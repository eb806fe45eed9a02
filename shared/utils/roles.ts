export const roles = ['supervisor', 'inspector', 'welder', 'auditor'] as const
export type Role = typeof roles[number]

export const roleTitles: Record<Role, string> = {
  supervisor: 'Quality manager',
  inspector: 'Inspector',
  welder: 'Welder',
  auditor: 'Auditor',
}

/** Where each role lands after signing in. */
export const roleHome: Record<Role, string> = {
  supervisor: '/dashboard',
  inspector: '/dashboard',
  welder: '/me',
  auditor: '/projects',
}

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (roles as readonly string[]).includes(value)
}
