import { randomBytes } from 'node:crypto'
import { and, desc, eq } from 'drizzle-orm'
import type { Db } from './client'
import { attachments, welders, welderTests } from './schema'
import { standingsOf } from './standings'
import { depositsOf, variablesOf } from './welder-test-columns'
import { recordAudit } from './audit'
import { mayReadWelder } from './welders'
import { shopNameOf } from './mail'
import type { SessionUser } from '../utils/auth'
import { qualifiedRangesOf } from '../../shared/qualification/test-ranges'
import { cardLines, type CardTest } from '../../shared/qualification/id-card'
import type { WelderRangesResult } from '../../shared/rules/results'
import type { Unit } from '../../shared/rules/types'
import { missing } from '../../shared/types/outcome'
import type { CardLinkInput } from '../../shared/schemas/welder-card'

// A welder's ID card (PDF, two sides) and the public page its QR code opens. The public page answers only while the
// shop has it on, under an unguessable token that a renewal replaces; it shows name, stamp and per current process the
// positions, thickness and lapse date, nothing else.

async function cardTests(db: Db, welderId: number): Promise<CardTest[]> {
  const rows = await db.select().from(welderTests).where(and(eq(welderTests.welderId, welderId), eq(welderTests.status, 'certified')))
    .orderBy(desc(welderTests.testDate), desc(welderTests.id))
  return rows.map((t) => {
    const ranges = qualifiedRangesOf(variablesOf(t))
    return {
      testDate: t.testDate, unit: t.unit as Unit, processes: depositsOf(t).map(d => d.process),
      ranges: 'error' in ranges ? null : ranges as unknown as WelderRangesResult,
    }
  })
}

async function linesOf(db: Db, welderId: number, today: string) {
  const standings = (await standingsOf(db, [welderId], today)).get(welderId) ?? []
  return cardLines(standings, await cardTests(db, welderId))
}

/** Everything the card prints, for staff (and the welder for their own card). */
/** The welder's card as `user` may read it: staff any welder's, a welder their own (another's is missing, as on every welder record). */
export async function cardOf(db: Db, user: SessionUser, welderId: number, today: string) {
  if (!await mayReadWelder(db, user, welderId)) return missing('Welder')
  const [welder] = await db.select({ id: welders.id, name: welders.name, stamp: welders.stamp, status: welders.status, cardToken: welders.cardToken, cardPublic: welders.cardPublic })
    .from(welders).where(eq(welders.id, welderId)).limit(1)
  if (!welder) return missing('Welder')
  const [photo] = await db.select({ storageKey: attachments.storageKey, contentType: attachments.contentType }).from(attachments)
    .where(and(eq(attachments.recordType, 'welder'), eq(attachments.recordId, welderId), eq(attachments.kind, 'photo')))
    .orderBy(desc(attachments.createdAt), desc(attachments.id)).limit(1)
  const { cardToken, cardPublic, ...who } = welder
  return {
    welder: who, today, lines: await linesOf(db, welderId, today), photo: photo ?? null,
    link: { public: cardPublic && !!cardToken, token: cardPublic ? cardToken : null },
    shopName: await shopNameOf(db),
  }
}

/** The public page behind a card's QR code; missing when the token is unknown, the page is off, or the welder inactive. */
export async function publicCard(db: Db, token: string, today: string) {
  const [welder] = await db.select({ id: welders.id, name: welders.name, stamp: welders.stamp }).from(welders)
    .where(and(eq(welders.cardToken, token), eq(welders.cardPublic, true), eq(welders.status, 'active'))).limit(1)
  if (!welder) return missing('Card')
  const lines = await linesOf(db, welder.id, today)
  return {
    name: welder.name, stamp: welder.stamp, asOf: today,
    qualifications: lines.map(l => ({ process: l.process, positions: l.positions, thickness: l.thickness, lapsesOn: l.lapsesOn })),
  }
}

/** Turns the public page on (issuing a token if none), off, or renews the token so the old address stops answering. */
export async function setCardLink(db: Db, user: SessionUser, welderId: number, input: CardLinkInput) {
  const [row] = await db.select({ id: welders.id, cardToken: welders.cardToken, cardPublic: welders.cardPublic }).from(welders).where(eq(welders.id, welderId)).limit(1)
  if (!row) return missing('Welder')
  const fresh = () => randomBytes(24).toString('base64url')
  const next = input.action === 'off'
    ? { cardPublic: false, cardToken: row.cardToken }
    : { cardPublic: true, cardToken: input.action === 'renew' || !row.cardToken ? fresh() : row.cardToken }
  await db.transaction(async (tx) => {
    await tx.update(welders).set(next).where(eq(welders.id, welderId))
    await recordAudit(tx as unknown as Db, { accountId: user.id, action: `card-page-${input.action}`, recordType: 'welder', recordId: welderId, before: { public: row.cardPublic }, after: { public: next.cardPublic } })
  })
  return { public: next.cardPublic, token: next.cardPublic ? next.cardToken : null }
}
