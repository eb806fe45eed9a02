import { and, desc, eq, inArray, isNull, or } from 'drizzle-orm'
import type { Db } from './client'
import { accounts, pqrs, procedures, signatures, signoffRequests, welders, welderTests } from './schema'
import type { SignoffRequestInput } from '../../shared/schemas/signoff'
import type { SessionUser } from '../utils/auth'
import { recordAudit } from './audit'
import { conflict, fieldFailure, forbidden, missing, type Outcome } from '../../shared/types/outcome'

/** What the mail (or any other) plugin receives when a sign-off is asked: hook 'rootface:signoff-requested'. */
export interface SignoffNotice {
  requestId: number
  meaning: 'approved' | 'certified' | 'witnessed'
  record: { type: string, id: number, label: string }
  requestedBy: { id: number, name: string }
  /** The accounts asked: the one named, or every active account of the signing role */
  recipients: { id: number, name: string, email: string }[]
  note: string | null
}

declare module 'nitropack/types' {
  interface NitroRuntimeHooks {
    /** After a sign-off request is stored (and committed): e.g. send the recipients an e-mail */
    'rootface:signoff-requested': (notice: SignoffNotice) => void | Promise<void>
  }
}

/** Who signs what: the role that gives each meaning, the role that may ask for it, the records it applies to. */
const rules = {
  approved: { signer: 'supervisor', asker: 'inspector', types: ['procedure'] },
  certified: { signer: 'inspector', asker: 'supervisor', types: ['pqr', 'welder-test'] },
  witnessed: { signer: 'inspector', asker: 'supervisor', types: ['welder-test'] },
} as const

export async function recordLabel(db: Db, type: string, id: number): Promise<{ label: string, version: number } | null> {
  if (type === 'procedure') {
    const [p] = await db.select({ number: procedures.number, revision: procedures.revision, version: procedures.version, title: procedures.title }).from(procedures).where(eq(procedures.id, id))
    return p ? { label: `WPS ${p.number} rev. ${p.revision} · ${p.title}`, version: p.version } : null
  }
  if (type === 'pqr') {
    const [q] = await db.select({ number: pqrs.number, version: pqrs.version, process: pqrs.process }).from(pqrs).where(eq(pqrs.id, id))
    return q ? { label: `PQR ${q.number} · ${q.process}`, version: q.version } : null
  }
  const [t] = await db.select({ id: welderTests.id, version: welderTests.version, process: welderTests.process, testDate: welderTests.testDate, name: welders.name, stamp: welders.stamp })
    .from(welderTests).innerJoin(welders, eq(welders.id, welderTests.welderId)).where(eq(welderTests.id, id))
  return t ? { label: `WPQ-${t.id} · ${t.name} (${t.stamp}) ${t.process} ${t.testDate}`, version: t.version } : null
}

export async function requestSignoff(db: Db, user: SessionUser, input: SignoffRequestInput): Promise<Outcome<SignoffNotice>> {
  const rule = rules[input.meaning]
  if (user.role !== rule.asker) return fieldFailure('meaning', 'A quality manager asks an inspector to certify or witness; an inspector asks a quality manager to approve')
  if (!(rule.types as readonly string[]).includes(input.recordType)) return fieldFailure('recordType', 'That record cannot be signed with this meaning')
  const record = await recordLabel(db, input.recordType, input.recordId)
  if (!record) return fieldFailure('recordId', 'No such record')
  const signers = await db.select({ id: accounts.id, name: accounts.name, email: accounts.email }).from(accounts)
    .where(and(eq(accounts.role, rule.signer), eq(accounts.active, true), input.requestedOf === null ? undefined : eq(accounts.id, input.requestedOf)))
  if (!signers.length) return fieldFailure('requestedOf', 'Choose an active account of the role that signs this')
  const [signed] = await db.select({ id: signatures.id }).from(signatures).where(and(eq(signatures.recordType, input.recordType),
    eq(signatures.recordId, input.recordId), eq(signatures.meaning, input.meaning), eq(signatures.recordVersion, record.version))).limit(1)
  if (signed) return conflict('This version of the record already carries that signature.')
  return db.transaction(async (tx) => {
    const [open] = await tx.select({ id: signoffRequests.id }).from(signoffRequests).where(and(eq(signoffRequests.recordType, input.recordType),
      eq(signoffRequests.recordId, input.recordId), eq(signoffRequests.meaning, input.meaning), eq(signoffRequests.status, 'open'))).limit(1)
    if (open) return conflict('A request for this sign-off is already open.')
    const [row] = await tx.insert(signoffRequests).values({ ...input, requestedBy: user.id }).returning()
    await recordAudit(tx as unknown as Db, { accountId: user.id, action: 'signoff.request', recordType: input.recordType, recordId: input.recordId, after: row })
    return {
      requestId: row!.id, meaning: input.meaning, record: { type: input.recordType, id: input.recordId, label: record.label },
      requestedBy: { id: user.id, name: user.name }, recipients: signers, note: input.note,
    }
  })
}

/** Open requests addressed to the user (or to anyone of their role), or the ones the user asked. */
export async function listSignoffs(db: Db, user: SessionUser, box: 'inbox' | 'sent') {
  const mine = (Object.keys(rules) as (keyof typeof rules)[]).filter(m => rules[m].signer === user.role)
  const where = box === 'sent'
    ? eq(signoffRequests.requestedBy, user.id)
    : and(eq(signoffRequests.status, 'open'), mine.length ? inArray(signoffRequests.meaning, mine) : eq(signoffRequests.id, -1),
        or(eq(signoffRequests.requestedOf, user.id), isNull(signoffRequests.requestedOf)))
  const rows = await db.select({
    id: signoffRequests.id, recordType: signoffRequests.recordType, recordId: signoffRequests.recordId, meaning: signoffRequests.meaning,
    note: signoffRequests.note, status: signoffRequests.status, createdAt: signoffRequests.createdAt, resolvedAt: signoffRequests.resolvedAt,
    requestedBy: signoffRequests.requestedBy, requestedOf: signoffRequests.requestedOf,
  }).from(signoffRequests).where(where).orderBy(desc(signoffRequests.createdAt)).limit(50)
  const people = new Map((await db.select({ id: accounts.id, name: accounts.name }).from(accounts)).map(a => [a.id, a.name]))
  return Promise.all(rows.map(async r => ({
    ...r,
    record: (await recordLabel(db, r.recordType, r.recordId))?.label ?? `${r.recordType} ${r.recordId} (removed)`,
    requestedByName: people.get(r.requestedBy) ?? '—',
    requestedOfName: r.requestedOf === null ? null : people.get(r.requestedOf) ?? '—',
  })))
}

/** The asker withdraws; the one asked (or anyone of the signing role, when no one was named) marks it done. */
export async function resolveSignoff(db: Db, user: SessionUser, id: number, status: 'done' | 'withdrawn') {
  const [row] = await db.select().from(signoffRequests).where(eq(signoffRequests.id, id))
  if (!row) return missing('Sign-off request')
  const signer = rules[row.meaning as keyof typeof rules]?.signer
  const addressee = row.requestedOf === null ? user.role === signer : row.requestedOf === user.id
  const allowed = status === 'withdrawn' ? row.requestedBy === user.id : addressee
  if (!allowed && row.requestedBy !== user.id && !addressee) return missing('Sign-off request')
  if (!allowed) return forbidden(status === 'withdrawn' ? 'Only the one who asked can withdraw it' : 'Only the one asked can mark it done')
  if (row.status !== 'open') return conflict('This request is already closed.')
  return db.transaction(async (tx) => {
    const [updated] = await tx.update(signoffRequests).set({ status, resolvedAt: new Date() })
      .where(and(eq(signoffRequests.id, id), eq(signoffRequests.status, 'open'))).returning()
    if (!updated) return conflict('This request is already closed.')
    await recordAudit(tx as unknown as Db, { accountId: user.id, action: `signoff.${status}`, recordType: row.recordType, recordId: row.recordId, before: row, after: updated })
    return updated
  })
}

/** Records a user could ask about, and the people who could be asked. */
export async function signoffCandidates(db: Db, user: SessionUser) {
  const askOf = user.role === 'supervisor' ? 'inspector' : 'supervisor'
  const people = await db.select({ id: accounts.id, name: accounts.name }).from(accounts).where(and(eq(accounts.role, askOf), eq(accounts.active, true)))
  if (user.role === 'inspector') {
    const drafts = await db.select({ id: procedures.id, number: procedures.number, revision: procedures.revision, title: procedures.title })
      .from(procedures).where(eq(procedures.status, 'draft'))
    return { people, records: drafts.map(d => ({ recordType: 'procedure' as const, recordId: d.id, meaning: 'approved' as const, label: `WPS ${d.number} rev. ${d.revision} · ${d.title}` })) }
  }
  const [openPqrs, openTests] = await Promise.all([
    db.select({ id: pqrs.id, number: pqrs.number, process: pqrs.process }).from(pqrs).where(eq(pqrs.status, 'recorded')),
    db.select({ id: welderTests.id, process: welderTests.process, testDate: welderTests.testDate, name: welders.name, stamp: welders.stamp })
      .from(welderTests).innerJoin(welders, eq(welders.id, welderTests.welderId)).where(eq(welderTests.status, 'recorded')),
  ])
  return {
    people,
    records: [
      ...openPqrs.map(q => ({ recordType: 'pqr' as const, recordId: q.id, meaning: 'certified' as const, label: `PQR ${q.number} · ${q.process}` })),
      ...openTests.map(t => ({ recordType: 'welder-test' as const, recordId: t.id, meaning: 'certified' as const, label: `WPQ-${t.id} · ${t.name} (${t.stamp}) ${t.process} ${t.testDate}` })),
    ],
  }
}
