import type { Client } from '../harness'

/** Expected status per role: [signed out, supervisor, inspector, welder, auditor]. */
export type Statuses = [number, number, number, number, number]

export interface MatrixEntry {
  /** The address to call, route parameters filled in (defaults to the route path). */
  url?: string | ((ctx: MatrixContext) => Promise<string> | string)
  /** A body for mutating routes; the default is none, so allowed roles reach validation (400) and nothing is written. */
  body?: unknown
  expect: Statuses
}

export interface MatrixContext {
  supervisor: Client
}

/** Keyed 'METHOD /api/path' as the file tree names it: 'GET /api/welders/[id]'. */
export type MatrixEntries = Record<string, MatrixEntry>
