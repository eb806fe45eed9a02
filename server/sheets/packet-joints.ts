import { createHash } from 'node:crypto'
import type { Db } from '../database/client'
import { issueRegister, registerForPacket, registerProjectOf, type PacketRegister } from '../database/joints'
import type { issuedSheets } from '../database/schema'
import type { SessionUser } from '../utils/auth'
import { repairName } from '#shared/vocabulary/joints'
import type { SheetBlock, SheetModel } from './model'
import type { PacketPlan } from './packet'
import { caution, verifyUrl } from './common'
import { printable } from './format'
import { shopName } from '../database/sheet-records'
import type { Verification } from './verify'

/** The packet's weld register: per joint its WPS, its welders with their standing on the weld date, and its results, with totals. */

const answerWords: Record<string, string> = { 'covered': 'qualified, current', 'not-covered': 'NOT covered', 'cannot-tell': 'cannot tell', 'lapsed': 'NOT current', 'missing': 'no test' }

/** The register's content as hashed: what the sheet prints, in a fixed order. */
function contentOf(register: PacketRegister) {
  return register.map(j => ({
    mark: j.mark, type: `${j.jointType} ${j.weld}`, p: [j.pNumberA, j.pNumberB], t: j.thickness, od: j.outsideDiameter, unit: j.unit, positions: j.positions,
    wps: j.procedureNumber ? `${j.procedureNumber} rev. ${j.procedureRevision}` : null, weldedOn: j.weldedOn,
    welders: j.welders.map(w => [w.repair, w.stamp, w.process]), check: j.completionCheck?.map(c => [c.stamp, c.process, c.answer, c.lapsesOn]) ?? null,
    exams: j.examinations.map(e => [e.repair, e.method, e.reportNumber, e.accepted, e.defectType, e.defectLength]),
    repairs: j.repairs.map(r => [r.repair, r.weldedOn]), overrides: j.overrides.map(o => [o.stage, o.reason, o.accountName, o.at]),
  }))
}

export const registerHash = (register: PacketRegister) => createHash('sha256').update(JSON.stringify(contentOf(register))).digest('hex')

function welderCell(j: PacketRegister[number]) {
  return j.welders.map((w) => {
    const check = w.repair === 0 ? j.completionCheck?.find(c => c.stamp === w.stamp && c.process === w.process) : undefined
    const standing = check ? `: ${answerWords[check.answer] ?? check.answer}${check.lapsesOn ? `, lapses ${check.lapsesOn}` : ''}` : w.repair ? '' : j.weldedOn ? ': not checked, check by hand' : ': not welded yet'
    return `${w.repair ? `${repairName(w.repair)} ` : ''}${printable(w.stamp)} ${w.process}${standing}`
  }).join('; ') || '—'
}

const examCell = (j: PacketRegister[number]) => j.examinations.map(e => `${e.repair ? `${repairName(e.repair)} ` : ''}${e.method} ${printable(e.reportNumber ?? '')} ${e.accepted ? 'accept' : `REJECT${e.defectType ? ` (${e.defectType} ${e.defectLength ?? ''} ${j.unit})` : ''}`}`.replace(/\s+/g, ' ')).join('; ') || '—'

export function registerBlocks(register: PacketRegister): SheetBlock[] {
  const welded = register.filter(j => j.weldedOn)
  const rejected = register.filter(j => j.examinations.some(e => !e.accepted))
  const notCovered = welded.filter(j => (j.completionCheck ?? []).some(c => c.answer !== 'covered'))
  const volumetric = register.flatMap(j => j.examinations.filter(e => e.method === 'RT' || e.method === 'UT'))
  return [
    {
      heading: 'Totals',
      fields: [
        { label: 'Joints in the register', value: String(register.length) },
        { label: 'Welded', value: String(welded.length) },
        { label: 'With a rejected result', value: String(rejected.length) },
        { label: 'Repairs', value: String(register.reduce((n, j) => n + j.repairs.length, 0)) },
        { label: 'RT / UT results (rejected)', value: `${volumetric.length} (${volumetric.filter(e => !e.accepted).length})` },
        { label: 'Welded with a welder not qualified or not current (overridden)', value: String(notCovered.length) },
      ],
    },
    {
      heading: 'Joints', clause: 'QW-322.1',
      table: {
        columns: ['Mark', 'Joint', 'WPS', 'Welded on', 'Welders, standing on the weld date', 'Examinations'],
        rows: register.map(j => [
          printable(j.mark),
          `${j.jointType} ${j.weld}, P-No. ${j.pNumberA ?? '—'}/${j.pNumberB ?? '—'}, ${j.thickness ?? '—'} ${j.unit}${j.outsideDiameter !== null ? ` OD ${j.outsideDiameter}` : ''}, ${j.positions.join(' ')}`,
          j.procedureNumber ? `${printable(j.procedureNumber)} rev. ${j.procedureRevision}` : '—',
          j.weldedOn ?? 'open',
          welderCell(j),
          examCell(j),
        ]),
        widths: [48, 110, 56, 52, '*', 120],
      },
      notes: register.length ? ['Each welder\'s standing is the check made when the joint was marked welded: a certified test covering the joint and the process current on that day (QW-322.1(a)). Repair welders were checked on the repair date.'] : ['No joints in the register.'],
    },
    {
      heading: 'Overrides of the check',
      notes: register.flatMap(j => j.overrides.map(o => `${printable(j.mark)}, at ${o.stage}, ${o.at}, by ${printable(o.accountName)}: “${printable(o.reason)}” Refused: ${o.refusals.map(printable).join(' | ')}`)).concat(register.some(j => j.overrides.length) ? [] : ['None.']),
    },
  ]
}

/** The packet's register sheet, issued (its hash and QR code kept); null when the project has no joints. */
export async function jointRegisterSheet(db: Db, plan: PacketPlan, user: Pick<SessionUser, 'id' | 'name'>, origin: string): Promise<SheetModel | null> {
  const register = await registerForPacket(db, plan.project.id)
  if (!register.length) return null
  const sha256 = registerHash(register)
  const issue = await issueRegister(db, plan.project.id, sha256, user)
  return {
    kind: 'register', kindTitle: 'Weld register', shopName: await shopName(db), number: `WR-${printable(plan.project.number)}`, revision: null,
    subtitle: `${printable(plan.project.number)} ${printable(plan.project.name)}, ${register.length} joints`,
    codeLine: null, unit: null, status: 'issued', banner: null, blocks: registerBlocks(register), statement: null,
    signatures: [{ meaning: 'issued', name: printable(issue.issuerName), at: issue.issuedAt.toISOString(), version: 1 }],
    hash: { value: sha256, label: 'SHA-256 of the register as issued', matchesSigned: true },
    verify: { code: issue.verifyCode, url: verifyUrl(origin, issue.verifyCode) },
    caution: caution('', ''),
  }
}

/** The verification page for an issued weld register: unchanged while the register still hashes to the issued value. */
export async function verifyRegister(db: Db, issue: typeof issuedSheets.$inferSelect): Promise<Verification | null> {
  if (issue.projectId === null) return null
  const project = await registerProjectOf(db, issue.projectId)
  if (!project) return null
  const current = registerHash(await registerForPacket(db, issue.projectId))
  return {
    code: issue.verifyCode, sheet: 'Weld register', number: `WR-${project.number}`, revision: null, subject: `${project.number} ${project.name}`, status: 'issued',
    signers: [{ meaning: 'issued', name: issue.issuerName, at: issue.issuedAt.toISOString() }],
    state: current === issue.sha256 ? 'unchanged' : 'changed', signedSha256: issue.sha256,
  }
}
