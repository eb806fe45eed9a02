import { createHash, randomBytes } from 'node:crypto'
import { and, asc, eq, isNull, sql } from 'drizzle-orm'
import type { Db } from './client'
import { accounts, apiTokens, welders } from './schema'
import { logEntry } from './continuity'
import { recordAudit } from './audit'
import type { SessionUser } from '../utils/auth'
import { fieldFailure, isFailure, missing } from '../../shared/types/outcome'
import type { ApiTokenInput, ExternalContinuityInput } from '../../shared/schemas/joints'
import type { TokenScope } from '../../shared/vocabulary/joints'

/** Per-shop API tokens for other shop systems: created and revoked by the quality manager, only their SHA-256 kept. */

/** Uses a token may make per minute; more is a 429 until the minute is over. */
export const tokenRequestsPerMinute = 60

const hashOf = (token: string) => createHash('sha256').update(token).digest('hex')

export async function createApiToken(db: Db, user: SessionUser, input: ApiTokenInput) {
  const token = `rft_${randomBytes(24).toString('base64url')}`
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(apiTokens).values({ name: input.name, scopes: input.scopes, tokenHash: hashOf(token), prefix: token.slice(0, 10), createdBy: user.id }).returning()
    await recordAudit(tx as unknown as Db, { accountId: user.id, action: 'create', recordType: 'api-token', recordId: row!.id, after: { name: row!.name, scopes: row!.scopes, prefix: row!.prefix } })
    // The token itself is shown this once; only its hash is stored.
    return { id: row!.id, name: row!.name, scopes: row!.scopes, prefix: row!.prefix, token }
  })
}

export async function listApiTokens(db: Db) {
  return db.select({
    id: apiTokens.id, name: apiTokens.name, prefix: apiTokens.prefix, scopes: apiTokens.scopes, createdAt: apiTokens.createdAt,
    revokedAt: apiTokens.revokedAt, lastUsedAt: apiTokens.lastUsedAt, createdBy: accounts.name,
  }).from(apiTokens).innerJoin(accounts, eq(accounts.id, apiTokens.createdBy)).orderBy(asc(apiTokens.revokedAt), asc(apiTokens.name), asc(apiTokens.id))
}

export async function revokeApiToken(db: Db, user: SessionUser, id: number) {
  return db.transaction(async (tx) => {
    const [row] = await tx.update(apiTokens).set({ revokedAt: new Date() }).where(and(eq(apiTokens.id, id), isNull(apiTokens.revokedAt))).returning()
    if (!row) return missing('Token')
    await recordAudit(tx as unknown as Db, { accountId: user.id, action: 'revoke', recordType: 'api-token', recordId: id, after: { name: row.name, prefix: row.prefix } })
    return { ok: true as const }
  })
}

export type TokenCheck = { ok: true, token: { id: number, name: string, createdBy: number } } | { ok: false, status: 401 | 403 | 429, message: string }

/**
 * The token a request carries, checked: known and not revoked (401), holding the scope (403), within its minute's
 * allowance (429). Counting is one atomic update, so every app server shares the count.
 */
export async function checkApiToken(db: Db, token: string | null, scope: TokenScope): Promise<TokenCheck> {
  if (!token) return { ok: false, status: 401, message: 'Send the API token as Authorization: Bearer <token>' }
  const [row] = await db.update(apiTokens).set({
    windowCount: sql`case when ${apiTokens.windowStart} < now() - interval '1 minute' then 1 else ${apiTokens.windowCount} + 1 end`,
    windowStart: sql`case when ${apiTokens.windowStart} < now() - interval '1 minute' then now() else ${apiTokens.windowStart} end`,
    lastUsedAt: sql`now()`,
  }).where(and(eq(apiTokens.tokenHash, hashOf(token)), isNull(apiTokens.revokedAt))).returning()
  if (!row) return { ok: false, status: 401, message: 'Unknown or revoked API token' }
  if (!row.scopes.includes(scope)) return { ok: false, status: 403, message: `This token may not do this: it lacks the scope ${scope}` }
  if (row.windowCount > tokenRequestsPerMinute) return { ok: false, status: 429, message: `At most ${tokenRequestsPerMinute} requests a minute per token` }
  return { ok: true, token: { id: row.id, name: row.name, createdBy: row.createdBy } }
}

/** Every use of a token is in the audit trail, under the account that created it, naming the token. */
export async function auditTokenUse(db: Db, token: { id: number, name: string, createdBy: number }, what: string, result: unknown): Promise<void> {
  await recordAudit(db, { accountId: token.createdBy, action: `api:${what}`, recordType: 'api-token', recordId: token.id, after: { token: token.name, result } })
}

/** A continuity use reported by another shop system: the welder by stamp, then logged as by hand. */
export async function continuityFromSystem(db: Db, user: SessionUser, input: ExternalContinuityInput, today: string) {
  const [welder] = await db.select({ id: welders.id }).from(welders).where(eq(welders.stamp, input.stamp))
  if (!welder) return fieldFailure('stamp', 'Not on the roster')
  return logEntry(db, user, { welderId: welder.id, process: input.process, weldedOn: input.weldedOn, reference: input.reference }, today)
}

/** The same, as a route calls it: every use of the key is audited, refused or not. */
export async function continuityByKey(db: Db, token: { id: number, name: string, createdBy: number }, user: SessionUser, input: ExternalContinuityInput, today: string) {
  const result = await continuityFromSystem(db, user, input, today)
  await auditTokenUse(db, token, 'continuity', isFailure(result) ? { refused: result.fail, stamp: input.stamp } : { stamp: input.stamp, process: input.process, weldedOn: input.weldedOn })
  return result
}
