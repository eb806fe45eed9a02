import { readdirSync, statSync } from 'node:fs'
import { join, relative } from 'node:path'

export interface ApiRoute { method: string, path: string, file: string }

/** Every route file under server/api, as method + path (next-auth's catch-all excluded). */
export function apiRoutes(root = 'server/api'): ApiRoute[] {
  const found: ApiRoute[] = []
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const full = join(dir, name)
      if (statSync(full).isDirectory()) walk(full)
      else if (name.endsWith('.ts')) {
        const rel = relative(root, full).replace(/\.ts$/, '')
        const match = /^(.*?)(?:\.(get|post|patch|put|delete))?$/.exec(rel)!
        const route = `/api/${match[1]!.replace(/(^|\/)index$/, '')}`.replace(/\/$/, '')
        found.push({ method: (match[2] ?? 'any').toUpperCase(), path: route, file: full })
      }
    }
  }
  walk(root)
  return found.filter(r => !r.path.startsWith('/api/auth/'))
}
