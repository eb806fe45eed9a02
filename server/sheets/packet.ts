import { and, asc, eq, inArray, lte } from 'drizzle-orm'
import type { Db } from '../database/client'
import { customers, procedures, projectProcedures, projectWelders, projects, welders, welderTests } from '../database/schema'
import type { SessionUser } from '../utils/auth'
import { gapsInPeriod, loadCertifiedTests, loadUses, type Gap, type Period } from './continuity'
import { groupedCode } from './format'
import { documentBase, PageTracker, pageFooter, pageHeader, sheetSection, styles } from './layout'
import { sheetReference, type SheetModel } from './model'
import { renderPdf } from './pdf'
import { pqrIdsOf, shopName } from './records'
import { continuityLogSheet, pqrSheetOf, procedureSheet, projectPeriod, welderTestSheet } from './sheets'
import { todayIso } from '../utils/standings'

export interface PacketPlan {
  project: { id: number, number: string, name: string, customer: string }
  period: Period
  procedureIds: number[]
  pqrIds: number[]
  pqrs: { id: number, number: string }[]
  welders: { id: number, name: string, stamp: string, testIds: number[], tests: { id: number, process: string, testDate: string }[] }[]
  processes: string[]
}

/** What goes into a project's packet: its WPSs and their PQRs, its welders' certified tests up to the period's end. */
export async function packetPlan(db: Db, projectId: number): Promise<PacketPlan | null> {
  const [project] = await db.select({ id: projects.id, number: projects.number, name: projects.name, customer: customers.name })
    .from(projects).innerJoin(customers, eq(customers.id, projects.customerId)).where(eq(projects.id, projectId))
  const period = await projectPeriod(db, projectId)
  if (!project || !period) return null
  const procs = await db.select({ id: procedures.id, process: procedures.process }).from(projectProcedures)
    .innerJoin(procedures, eq(procedures.id, projectProcedures.procedureId)).where(eq(projectProcedures.projectId, projectId))
    .orderBy(asc(procedures.number), asc(procedures.revision))
  const support = await pqrIdsOf(db, procs.map(p => p.id))
  const crew = await db.select({ id: welders.id, name: welders.name, stamp: welders.stamp }).from(projectWelders)
    .innerJoin(welders, eq(welders.id, projectWelders.welderId)).where(eq(projectWelders.projectId, projectId)).orderBy(asc(welders.stamp))
  const tests = crew.length
    ? await db.select({ id: welderTests.id, welderId: welderTests.welderId, process: welderTests.process, testDate: welderTests.testDate }).from(welderTests)
        .where(and(inArray(welderTests.welderId, crew.map(w => w.id)), eq(welderTests.status, 'certified'), lte(welderTests.testDate, period.to)))
        .orderBy(asc(welderTests.testDate), asc(welderTests.id))
    : []
  return {
    project, period,
    procedureIds: procs.map(p => p.id),
    pqrIds: [...new Set(support.map(s => s.pqrId))],
    welders: crew.map((w) => {
      const own = tests.filter(t => t.welderId === w.id).map(t => ({ id: t.id, process: t.process, testDate: t.testDate }))
      return { ...w, testIds: own.map(t => t.id), tests: own }
    }),
    pqrs: [...new Map(support.map(s => [s.pqrId, { id: s.pqrId, number: s.number }])).values()],
    processes: [...new Set(procs.map(p => p.process))].sort(),
  }
}

export function sheetCount(plan: PacketPlan) {
  return plan.procedureIds.length + plan.pqrIds.length + plan.welders.reduce((n, w) => n + w.testIds.length + 1, 0)
}

export interface WelderGap extends Gap { welder: string, stamp: string }

/** Every welder of the project who was not current for a process of its WPSs on some day of the period. */
export async function gapsOfProject(db: Db, plan: PacketPlan): Promise<WelderGap[]> {
  const found: WelderGap[] = []
  for (const w of plan.welders) {
    const [tests, uses] = await Promise.all([loadCertifiedTests(db, w.id, plan.period.to), loadUses(db, w.id, plan.period.to)])
    for (const process of plan.processes) {
      for (const gap of gapsInPeriod(tests, uses, process, plan.period)) found.push({ ...gap, welder: w.name, stamp: w.stamp })
    }
  }
  return found
}

interface Entry { sheet: SheetModel, group: string }

/** Builds the packet's sheets (0..0.6 of the progress) and renders the one PDF (0.6..1). */
export async function buildPacket(db: Db, plan: PacketPlan, user: Pick<SessionUser, 'id' | 'name'>, origin: string, progress: (fraction: number) => Promise<void> | void) {
  const total = sheetCount(plan)
  const entries: Entry[] = []
  let done = 0
  const add = async (sheet: SheetModel | null, group: string) => {
    if (sheet) entries.push({ sheet, group })
    done++
    await new Promise(resolve => setImmediate(resolve)) // let polling and other requests in between sheets
    if (done % 5 === 0 || done === total) await progress(0.6 * done / Math.max(total, 1))
  }
  for (const id of plan.procedureIds) await add(await procedureSheet(db, id, origin), 'Procedures')
  for (const id of plan.pqrIds) await add(await pqrSheetOf(db, id, origin), 'Procedure qualifications')
  for (const w of plan.welders) {
    for (const id of w.testIds) await add(await welderTestSheet(db, id, origin), `${w.name} (${w.stamp})`)
    await add(await continuityLogSheet(db, w.id, plan.period, user, origin), `${w.name} (${w.stamp})`)
  }
  const gaps = await gapsOfProject(db, plan)
  const shop = await shopName(db)
  const tracker = new PageTracker()
  const furniture = { shopName: shop, documentLine: `Packet ${plan.project.number}` }
  const front = (content: unknown[], section: number, anchor?: string) => ({
    section: anchor ? [{ text: '', id: anchor }, ...content] : content,
    header: (page: number) => {
      tracker.seen(page, section)
      return pageHeader(shop, `Project ${plan.project.number}`, furniture.documentLine)
    },
    footer: (page: number, pages: number) => {
      tracker.total = pages
      return pageFooter(`Project ${plan.project.number} · ${plan.project.name}`, `Packet page ${page} of ${pages}`)
    },
  })
  const definition = {
    ...documentBase(`Packet ${plan.project.number}`, shop),
    content: [
      front(coverContent(plan, shop, entries.length, gaps, user), 0),
      front(indexContent(entries), 1),
      front(gapContent(plan, gaps), 2, 'not-current'),
      ...entries.map((e, i) => sheetSection(e.sheet, i + 3, tracker, furniture, `sheet-${i}`)),
    ],
    styles,
  }
  const pdf = await renderPdf(definition, (f) => {
    void progress(0.6 + 0.4 * f)
  })
  return { pdf, pageCount: tracker.total, sheets: entries.length, gaps: gaps.length }
}

function coverContent(plan: PacketPlan, shop: string, sheets: number, gaps: WelderGap[], user: Pick<SessionUser, 'name'>) {
  const row = (label: string, value: string) => [{ text: label, style: 'label', margin: [0, 3, 0, 3] }, { text: value, style: 'value', margin: [0, 2, 0, 2] }]
  return [
    { text: shop, fontSize: 13, bold: true, margin: [0, 60, 0, 4] },
    { text: 'PROJECT PACKET', style: 'kind', margin: [0, 30, 0, 2] },
    { text: plan.project.number, fontSize: 30, bold: true },
    { text: plan.project.name, fontSize: 14, margin: [0, 2, 0, 24] },
    {
      table: {
        widths: [130, '*'],
        body: [
          row('Customer', plan.project.customer),
          row('Period', `${plan.period.from} to ${plan.period.to}`),
          row('Procedures (WPS)', String(plan.procedureIds.length)),
          row('Procedure qualifications (PQR)', String(plan.pqrIds.length)),
          row('Welders', String(plan.welders.length)),
          row('Sheets', String(sheets)),
          row('Welders not current on a day of the period', gaps.length ? `${new Set(gaps.map(g => g.stamp)).size} (see the summary)` : 'none'),
          row('Prepared', `${todayIso()} by ${user.name}`),
        ],
      },
      layout: { hLineWidth: () => 0.5, vLineWidth: () => 0, hLineColor: () => '#d4d1c7' },
    },
    {
      text: 'Each sheet carries its own signatures, the SHA-256 of its signed content and a code with a QR code: '
        + 'the verification page tells whether the record is still as it was signed.',
      style: 'value', margin: [0, 24, 0, 8],
    },
    { table: { widths: ['*'], body: [[{ text: genericCaution, style: 'caution', fillColor: '#f7ecd2', margin: [6, 5, 6, 5] }]] }, layout: 'noBorders' },
  ]
}

const genericCaution = 'Rootface helps; it does not qualify anyone. Each sheet names the code edition its ranges follow; the governing code '
  + 'edition, the shop\'s quality manual, the contract and the Authorized Inspector or certified welding inspector have the final word.'

function indexContent(entries: Entry[]) {
  const body: unknown[][] = [[
    { text: 'Sheet', style: 'th' }, { text: 'Reference', style: 'th' }, { text: 'Subject', style: 'th' }, { text: 'Code', style: 'th' }, { text: 'Page', style: 'th', alignment: 'right' },
  ]]
  body.push([{ text: 'Welders not current in the period', style: 'cell', colSpan: 4, bold: true }, {}, {}, {}, { text: '00', pageReference: 'not-current', style: 'cell', alignment: 'right' }])
  let group = ''
  entries.forEach((e, i) => {
    if (e.group !== group) {
      group = e.group
      body.push([{ text: group, style: 'cell', bold: true, colSpan: 5, margin: [0, 4, 0, 0] }, {}, {}, {}, {}])
    }
    body.push([
      { text: e.sheet.kindTitle.replace(/ \(.*\)$/, ''), style: 'cell' },
      { text: sheetReference(e.sheet), style: 'cell', bold: true },
      { text: e.sheet.subtitle, style: 'cell' },
      { text: e.sheet.verify ? groupedCode(e.sheet.verify.code) : 'not signed', style: 'cell' },
      { text: '00', pageReference: `sheet-${i}`, style: 'cell', alignment: 'right' },
    ])
  })
  return [
    { text: 'INDEX', style: 'kind', margin: [0, 0, 0, 2] },
    { text: 'Sheets in this packet', style: 'number', fontSize: 16, margin: [0, 0, 0, 8] },
    {
      table: { headerRows: 1, widths: [110, 80, '*', 62, 28], body, dontBreakRows: true },
      layout: { hLineWidth: (i: number) => (i === 0 ? 0 : 0.4), vLineWidth: () => 0, hLineColor: () => '#d4d1c7', paddingTop: () => 2, paddingBottom: () => 2 },
    },
  ]
}

function gapContent(plan: PacketPlan, gaps: WelderGap[]) {
  const rows = gaps.map(g => [
    { text: `${g.welder} (${g.stamp})`, style: 'cell' }, { text: g.process, style: 'cell' },
    { text: g.from, style: 'cell' }, { text: g.to, style: 'cell' },
    { text: g.why === 'no-test' ? 'no certified test of this process on record yet' : 'qualification lapsed (no use within six months, or not renewed)', style: 'cell' },
  ])
  return [
    { text: 'SUMMARY', style: 'kind', margin: [0, 0, 0, 2] },
    { text: 'Welders not current on a day of the period', style: 'number', fontSize: 16, margin: [0, 0, 0, 4] },
    {
      text: `For each welder of the project and each process of its WPSs (${plan.processes.join(', ') || 'none'}), the days from ${plan.period.from} to ${plan.period.to} `
        + 'on which the welder was not current, from the certified tests and the continuity log (ASME IX QW-322). A welder who did not weld a process '
        + 'on the project need not hold it: read each line with the project\'s weld map.',
      style: 'value', margin: [0, 0, 0, 8],
    },
    gaps.length
      ? {
          table: {
            headerRows: 1, widths: [120, 40, 58, 58, '*'],
            body: [[{ text: 'Welder', style: 'th' }, { text: 'Process', style: 'th' }, { text: 'From', style: 'th' }, { text: 'To', style: 'th' }, { text: 'Why', style: 'th' }], ...rows],
          },
          layout: { hLineWidth: (i: number) => (i === 0 ? 0 : 0.4), vLineWidth: () => 0, hLineColor: () => '#d4d1c7' },
        }
      : { text: 'Every welder was current for every process of the project on every day of the period.', bold: true },
    { table: { widths: ['*'], body: [[{ text: genericCaution, style: 'caution', fillColor: '#f7ecd2', margin: [6, 5, 6, 5] }]] }, layout: 'noBorders', margin: [0, 14, 0, 0] },
  ]
}
