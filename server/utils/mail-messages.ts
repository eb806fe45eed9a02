import { format } from 'date-fns'
import type { ProcessStanding } from '#shared/qualification/process-standing'
import { codeName } from '#shared/rules/caution'
import type { ReminderStep } from '#shared/mail/reminder-steps'
import type { OutgoingMail } from './mail'
import { renderLetter } from './mail-letter'

// The words of each message Rootface sends. Builders are pure: the caller queues what they return.

const caution = 'Rootface computes lapse dates from the continuity log and the code edition named on each test. It helps; it does not qualify anyone: '
  + 'the governing code edition, your shop\'s quality manual and the inspector have the final word.'

const roleWords: Record<string, string> = { supervisor: 'quality manager', inspector: 'inspector', welder: 'welder', auditor: 'auditor' }

const when = (date: Date) => format(date, 'yyyy-MM-dd HH:mm')

export function invitationMail(input: { tokenId: number, accountId: number, to: string, name: string, role: string, invitedBy: string, link: string, expiresAt: Date, shopName: string }): OutgoingMail {
  const body = renderLetter({
    greeting: `Hello ${input.name},`,
    paragraphs: [
      `${input.invitedBy} has opened a Rootface account for you at ${input.shopName}, as ${roleWords[input.role] ?? input.role}.`,
      `Choose your password with the link below. It works once and until ${when(input.expiresAt)} (server time); after that, ask for a new invitation.`,
    ],
    action: { label: 'Choose your password', href: input.link },
    footnotes: ['You receive this because someone at the shop entered your address. If you did not expect it, ignore it: no account is usable until a password is chosen.'],
  }, input.shopName)
  return { dedupeKey: `invitation:${input.accountId}:${input.tokenId}`, kind: 'invitation', to: input.to, subject: `Your Rootface account at ${input.shopName}`, ...body }
}

export function passwordResetMail(input: { dedupeKey: string, to: string, name: string, link: string, expiresAt: Date, shopName: string }): OutgoingMail {
  const body = renderLetter({
    greeting: `Hello ${input.name},`,
    paragraphs: [
      'Someone asked to reset the password of your Rootface account. If it was you, choose a new password with the link below.',
      `The link works once and until ${when(input.expiresAt)} (server time). Your current password keeps working until you choose a new one.`,
    ],
    action: { label: 'Choose a new password', href: input.link },
    footnotes: ['If you did not ask for this, ignore this message; nothing changes.'],
  }, input.shopName)
  return { dedupeKey: input.dedupeKey, kind: 'password-reset', to: input.to, subject: 'Reset your Rootface password', ...body }
}

export function lapseReminderMail(input: { welder: { id: number, name: string, stamp: string }, to: string, standing: ProcessStanding, step: ReminderStep, link: string, shopName: string }): OutgoingMail {
  const s = input.standing
  const days = s.daysLeft === 1 ? '1 day' : `${s.daysLeft} days`
  const body = renderLetter({
    greeting: `Hello ${input.welder.name},`,
    paragraphs: [
      ...(s.code === 'iso-9606-1'
        // ISO 9606-1: kept by the six-monthly confirmation (9.2) and ended by the revalidation route (9.3), not by logged uses
        ? [`Your ISO 9606-1 certificate for process ${s.process} (stamp ${input.welder.stamp}) lapses on ${s.lapsesOn}, in ${days}. The last confirmation on record is ${s.lastUse}.`,
            'A six-monthly confirmation (9.2) signed by the welding coordinator or the examiner before that day keeps it, unless its 9.3 end of validity comes first; then it needs a retest or the production welds tested.']
        : [`Your ${s.process} qualification (stamp ${input.welder.stamp}) lapses on ${s.lapsesOn}, in ${days}. The last use on record is ${s.lastUse}.`,
            `Welding with ${s.process} before that day, logged in the continuity log, keeps it current. Once it has lapsed you need a new test.`]),
      `${codeName(s.code)} ${s.edition}: ${s.rule}`,
    ],
    action: { label: 'See your qualifications', href: input.link },
    closing: ['If you have welded with this process recently and it is not in the log, tell your inspector or quality manager.'],
    footnotes: [caution, `Reminders go out ${[30, 14, 7].join(', ')} days before a qualification lapses; this is the ${input.step}-day reminder.`],
  }, input.shopName)
  return {
    dedupeKey: `lapse:${input.welder.id}:${s.process}:${s.lapsesOn}:${input.step}`, kind: 'lapse-reminder', to: input.to,
    subject: `${s.process} qualification lapses on ${s.lapsesOn} (${days})`, ...body,
  }
}

export interface DigestRow { stamp: string, name: string, standing: ProcessStanding }

export function weeklyDigestMail(input: { week: string, account: { id: number, name: string, email: string }, today: string, windowDays: number, rows: DigestRow[], link: string, shopName: string, calibrations?: { tag: string, kindWords: string, text: string }[] }): OutgoingMail {
  const count = input.rows.length
  const calibrations = input.calibrations ?? []
  const body = renderLetter({
    greeting: `Hello ${input.account.name},`,
    paragraphs: [count
      ? `${count} welder ${count === 1 ? 'qualification lapses' : 'qualifications lapse'} in the ${input.windowDays} days from ${input.today} unless the process is used and logged before then:`
      : `No welder qualification lapses in the ${input.windowDays} days from ${input.today}.`,
    ...(calibrations.length ? [`Calibration of machines and meters in service, due in the ${input.windowDays} days, past due or not recorded: ${calibrations.map(c => `${c.kindWords} ${c.tag}: ${c.text}`).join(' ')}`] : [])],
    table: count
      ? {
          head: ['Lapses on', 'Days', 'Stamp', 'Welder', 'Process', 'Last use'],
          rows: input.rows.map(r => [r.standing.lapsesOn, String(r.standing.daysLeft), r.stamp, r.name, r.standing.process, r.standing.lastUse]),
        }
      : undefined,
    action: { label: 'Open the roster', href: input.link },
    footnotes: [caution, 'This digest goes to every active quality manager account once a week.'],
  }, input.shopName)
  return {
    dedupeKey: `digest:${input.week}:${input.account.id}`, kind: 'weekly-digest', to: input.account.email,
    subject: count ? `Lapsing in the next ${input.windowDays} days: ${count} ${count === 1 ? 'qualification' : 'qualifications'} (${input.week})` : `Nothing lapses in the next ${input.windowDays} days (${input.week})`,
    ...body,
  }
}

const meaningWords: Record<string, { ask: string, subject: string }> = {
  approved: { ask: 'approve', subject: 'Approval asked' },
  certified: { ask: 'certify', subject: 'Certification asked' },
  witnessed: { ask: 'witness', subject: 'Witness signature asked' },
}

export function signoffRequestMail(input: {
  notice: { requestId: number, meaning: string, record: { label: string }, requestedBy: { name: string }, note: string | null }
  recipient: { id: number, name: string, email: string }
  link: string
  shopName: string
}): OutgoingMail {
  const words = meaningWords[input.notice.meaning] ?? { ask: `sign (${input.notice.meaning})`, subject: 'Sign-off asked' }
  const body = renderLetter({
    greeting: `Hello ${input.recipient.name},`,
    paragraphs: [
      `${input.notice.requestedBy.name} asks you to ${words.ask} ${input.notice.record.label}.`,
      ...(input.notice.note ? [`Their note: “${input.notice.note}”`] : []),
      'The request waits on your dashboard until it is signed or withdrawn.',
    ],
    action: { label: 'Open your dashboard', href: input.link },
    footnotes: ['A signature freezes the signed version of the record; review it in Rootface before you sign.'],
  }, input.shopName)
  return {
    dedupeKey: `signoff:${input.notice.requestId}:${input.recipient.id}`, kind: 'signoff-request', to: input.recipient.email,
    subject: `${words.subject}: ${input.notice.record.label}`, ...body,
  }
}

/**
 * A revocation (ASME IX QW-322.1(b) and its like): the welder, when they have an account, and each quality manager hear
 * of it at once, in plain words: what was revoked, by whom, why, and what restores it.
 */
export function revocationMail(input: {
  revocation: { id: number, process: string, revokedOn: string, reason: string, clause: string, restore: string }
  welder: { id: number, name: string, stamp: string }
  recipient: { id: number, name: string, email: string, isWelder: boolean }
  revokedBy: string
  link: string
  shopName: string
}): OutgoingMail {
  const r = input.revocation
  const w = input.welder
  const paragraphs = input.recipient.isWelder
    ? [`${input.revokedBy} revoked your ${r.process} qualification (stamp ${w.stamp}) on ${r.revokedOn}.`,
        `The reason given: “${r.reason}”`,
        `From today you may not weld with ${r.process} on work that needs this qualification. It comes back when you pass a new test (${r.restore}).`]
    : [`${input.revokedBy} revoked the ${r.process} qualification of ${w.name} (stamp ${w.stamp}) on ${r.revokedOn}.`,
        `The reason given: “${r.reason}”`,
        `It lapsed at once on every list, welder page, reminder and packet. A new certified test restores it (${r.restore}); until then, plan the work without this welder for ${r.process}.`]
  const body = renderLetter({
    greeting: `Hello ${input.recipient.name},`,
    paragraphs,
    action: { label: input.recipient.isWelder ? 'See your qualifications' : 'Open the welder\'s page', href: input.link },
    closing: input.recipient.isWelder ? ['If you think this is a mistake, speak to your inspector or quality manager.'] : [],
    footnotes: [`Revoked under ${r.clause}. Rootface records the revocation; the inspector and your shop's quality manual decide.`],
  }, input.shopName)
  return {
    dedupeKey: `revocation:${r.id}:${input.recipient.id}`, kind: 'revocation', to: input.recipient.email,
    subject: input.recipient.isWelder ? `Your ${r.process} qualification was revoked` : `${w.stamp} ${w.name}: ${r.process} qualification revoked`, ...body,
  }
}
