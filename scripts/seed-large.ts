// npm run seed:large: a large invented shop in its own data directory (default .data/large/db), for `npm run bench`.
// 2,000 welders, 10,000 welder tests, 200,000 continuity entries, 500 WPSs, 300 PQRs, 200 projects with 200,000 joints,
// on top of the demo shop (so the demo accounts sign in). Deterministic: the same data every run.
import { layersOf } from '../server/database/procedure-columns'
import { pqrLayersOf } from '../server/database/pqr-columns'
import { rmSync } from 'node:fs'
import { resolve } from 'node:path'
import { format, subDays } from 'date-fns'
import { openDatabase, type Db } from '../server/database/client'
import * as t from '../server/database/schema'
import { seedDemoShop } from '../server/database/seed/demo'
import { refreshStandings } from '../server/database/standings'
import { analyzeTables, recomputeStaleQualifiedRanges } from '../server/database/qualified-ranges'
import { qualifiedRangesOf } from '../shared/qualification/test-ranges'
import { seedLargeJoints } from './seed-large-joints'

export const largeShop = { welders: 2000, tests: 10_000, continuity: 200_000, procedures: 500, pqrs: 300, projects: 200 }

/** A small deterministic generator (mulberry32), so every run builds the same shop. */
function random(seed: number) {
  let a = seed
  return () => {
    a = (a + 0x6D2B79F5) | 0
    let x = Math.imul(a ^ (a >>> 15), 1 | a)
    x = (x + Math.imul(x ^ (x >>> 7), 61 | x)) ^ x
    return ((x ^ (x >>> 14)) >>> 0) / 4294967296
  }
}
const rand = random(20261201)
const pick = <T>(list: readonly T[]) => list[Math.floor(rand() * list.length)]!
const int = (min: number, max: number) => min + Math.floor(rand() * (max - min + 1))

const first = ['Arlo', 'Brienne', 'Caspian', 'Delphine', 'Emrys', 'Fenna', 'Gideon', 'Halcyon', 'Isolde', 'Jarrah', 'Keziah', 'Lorcan', 'Maelis', 'Nerys', 'Oisin', 'Perpetua', 'Quillon', 'Rhiannon', 'Soren', 'Tamsin', 'Ulrike', 'Vesna', 'Wynn', 'Xanthe', 'Yorick', 'Zelda']
const last = ['Abernethy', 'Brackwater', 'Coldharbour', 'Dunmore', 'Elverston', 'Fairbrass', 'Glenholme', 'Hartwell', 'Inchcape', 'Jessop', 'Kilbride', 'Larkspur', 'Marchbank', 'Northcott', 'Oakenshaw', 'Pellow', 'Quarrie', 'Rushworth', 'Stanway', 'Thistlewood', 'Underhill', 'Vantongeren', 'Whitlock', 'Yeardley']
const processes = ['SMAW', 'GTAW', 'GMAW', 'FCAW'] as const
const plateGroove = [['1G'], ['2G'], ['3G'], ['4G'], ['3G', '4G'], ['2G', '3G', '4G']] as const
const pipeGroove = [['2G'], ['5G'], ['6G'], ['2G', '5G']] as const
const fOf: Record<string, string> = { SMAW: '4', GTAW: '6', GMAW: '6', FCAW: '6' }

async function batches<T>(rows: T[], size: number, insert: (chunk: T[]) => Promise<unknown>) {
  for (let i = 0; i < rows.length; i += size) await insert(rows.slice(i, i + size))
}

/** The shop's sizes at a scale (1: the sizes above; 10: 20,000 welders, 100,000 tests, 2,000,000 continuity entries). */
export function shopAt(scale: number) {
  const n = (v: number) => Math.max(1, Math.round(v * scale))
  return { welders: n(largeShop.welders), tests: n(largeShop.tests), continuity: n(largeShop.continuity), procedures: n(largeShop.procedures), pqrs: n(largeShop.pqrs), projects: n(largeShop.projects) }
}

export async function seedLargeShop(db: Db, today = new Date(), scale = 1) {
  const size = shopAt(scale)
  const day = (daysAgo: number) => format(subDays(today, daysAgo), 'yyyy-MM-dd')
  await seedDemoShop(db, today)
  const [supervisor] = await db.select().from(t.accounts).limit(1)
  const [base] = await db.select().from(t.baseMetals).limit(1)
  const [filler] = await db.select().from(t.fillerMetals).limit(1)

  await db.transaction(async (tx) => {
    const welderRows = Array.from({ length: size.welders }, (_, i) => ({
      name: `${pick(first)} ${pick(last)}`, stamp: `LG-${String(i + 1).padStart(4, '0')}`, employeeNumber: `L-${20000 + i}`,
      status: rand() < 0.95 ? 'active' : 'inactive', email: `welder${i + 1}@large.rootface.test`,
    }))
    const welderIds: number[] = []
    await batches(welderRows, 500, async chunk => welderIds.push(...(await tx.insert(t.welders).values(chunk).returning({ id: t.welders.id })).map(r => r.id)))

    const pqrRows = Array.from({ length: size.pqrs }, (_, i) => {
      const process = pick(processes)
      return {
        number: `PQR-L${String(i + 1).padStart(4, '0')}`, testDate: day(int(60, 2000)), code: 'asme-ix', edition: '2023', unit: 'in', process,
        transfer: process === 'GMAW' && rand() < 0.5 ? 'short-circuit' : null, couponThickness: pick([0.1345, 0.375, 0.5, 0.75, 1, 1.5]),
        baseMetalId: base!.id, fillerMetalId: filler!.id, status: 'certified', processes: [process],
      }
    }).map(row => ({ ...row, layers: pqrLayersOf({ ...row, layers: [], depositThickness: null, actuals: {} }) }))
    const pqrIds = (await tx.insert(t.pqrs).values(pqrRows).returning({ id: t.pqrs.id })).map(r => r.id)

    const procedureRows = Array.from({ length: size.procedures }, (_, i) => {
      const process = pick(processes)
      const max = pick([0.1875, 0.75, 1.5, 2, 8])
      return {
        number: `L-W${String(i + 1).padStart(4, '0')}`, revision: 0, title: `${process} carbon steel, production procedure ${i + 1}`,
        code: 'asme-ix', edition: '2023', status: rand() < 0.7 ? 'approved' : 'draft', unit: 'in', process,
        pNumberA: '1', pNumberB: '1', thicknessMin: 0.0625, thicknessMax: max, positions: ['F', 'H', 'V', 'O'], fNumbers: [fOf[process]!],
        createdBy: supervisor!.id, processes: [process],
      }
    }).map(row => ({ ...row, layers: layersOf({ ...row, transfer: null, variables: {}, layers: [] }) }))
    const procedureIds: number[] = []
    await batches(procedureRows, 250, async chunk => procedureIds.push(...(await tx.insert(t.procedures).values(chunk).returning({ id: t.procedures.id })).map(r => r.id)))
    await batches(procedureIds.map((id, i) => ({ procedureId: id, pqrId: pqrIds[i % pqrIds.length]! })), 500, chunk => tx.insert(t.procedurePqrs).values(chunk))

    const testRows = Array.from({ length: size.tests }, (_, i) => {
      const welderId = welderIds[i % welderIds.length]!
      const process = pick(processes)
      const form = rand() < 0.6 ? 'plate' as const : 'pipe' as const
      const thickness = pick([0.1345, 0.25, 0.375, 0.5, 0.75, 1])
      const input = {
        code: 'asme-ix' as const, edition: '2023', unit: 'in' as const, process, transfer: process === 'GMAW' && rand() < 0.5 ? 'short-circuit' : null,
        form, weld: 'groove' as const, couponThickness: thickness, depositThickness: thickness, layers: thickness >= 0.5 ? 4 : 2,
        outsideDiameter: form === 'pipe' ? pick([1.315, 2.375, 4.5, 6.625, 8.625]) : null, pNumber: '1', fNumber: fOf[process]!, backing: rand() < 0.5,
        positions: [...(form === 'plate' ? pick(plateGroove) : pick(pipeGroove))],
      }
      const status = rand() < 0.9 ? 'certified' : rand() < 0.5 ? 'recorded' : 'failed'
      return {
        ...input, welderId, procedureId: procedureIds[i % procedureIds.length], testDate: day(int(200, 1500)), visualAccepted: true,
        examination: 'bend', ranges: qualifiedRangesOf(input), status, processes: [process],
        deposits: [{ process, transfer: input.transfer, depositThickness: thickness }], certifiedAt: status === 'certified' ? subDays(today, 190) : null,
      }
    })
    await batches(testRows, 500, chunk => tx.insert(t.welderTests).values(chunk))

    // Continuity: per welder a few processes, entries spread over the last 14 months; some stop early so they lapse.
    const continuityRows = Array.from({ length: size.continuity }, (_, i) => {
      const welderId = welderIds[i % welderIds.length]!
      const stopsEarly = welderId % 7 === 0
      return { welderId, process: processes[(i >> 3) % processes.length]!, weldedOn: day(int(stopsEarly ? 190 : 0, 420)), reference: `Job L-${int(1000, 9999)}`, recordedBy: supervisor!.id }
    })
    await batches(continuityRows, 2000, chunk => tx.insert(t.continuityEntries).values(chunk))

    const [customer] = await tx.insert(t.customers).values({ name: 'Large shop customer (invented)' }).returning()
    const projectRows = Array.from({ length: size.projects }, (_, i) => ({
      customerId: customer!.id, number: `LP-${String(i + 1).padStart(4, '0')}`, name: `Invented project ${i + 1}`, startsOn: day(int(200, 400)),
    }))
    const projectIds = (await tx.insert(t.projects).values(projectRows).returning({ id: t.projects.id })).map(r => r.id)
    // The first project is the bench's packet: 3 WPSs with their PQRs and 16 welders (about 100 sheets).
    const welderCount = (i: number) => (i === 0 ? 16 : 10)
    await batches(projectIds.flatMap((projectId, i) => Array.from({ length: welderCount(i) }, (_, k) => ({ projectId, welderId: welderIds[(i * 16 + k) % welderIds.length]! }))), 1000, chunk => tx.insert(t.projectWelders).values(chunk))
    await batches(projectIds.flatMap((projectId, i) => Array.from({ length: 3 }, (_, k) => ({ projectId, procedureId: procedureIds[(i * 3 + k) % procedureIds.length]! }))), 1000, chunk => tx.insert(t.projectProcedures).values(chunk))
    // SEED_LARGE_JOINTS=false leaves the weld registers empty (a quicker seed when only the qualification figures are wanted).
    if (process.env.SEED_LARGE_JOINTS !== 'false') await seedLargeJoints(tx as unknown as Db, projectIds.map((id, i) => ({ id, welderIds: Array.from({ length: welderCount(i) }, (_, k) => welderIds[(i * 16 + k) % welderIds.length]!), procedureIds: Array.from({ length: 3 }, (_, k) => procedureIds[(i * 3 + k) % procedureIds.length]!) })), day, int)
  })
}

const isMain = process.argv[1] && resolve(process.argv[1]).endsWith('seed-large.ts')
if (isMain) {
  // DATABASE_URL: an empty PostgreSQL database instead of the embedded one (the bench makes a fresh one).
  const databaseUrl = process.env.DATABASE_URL || undefined
  const dataDir = resolve(process.env.NUXT_DATA_DIR ?? '.data/large/db')
  if (!databaseUrl) rmSync(dataDir, { recursive: true, force: true })
  const started = Date.now()
  const database = await openDatabase({ databaseUrl, dataDir, holder: 'npm run seed:large' })
  try {
    await seedLargeShop(database.db, new Date(), Number(process.env.BENCH_SCALE ?? 1))
    await refreshStandings(database.db) // so the first request is not the one that computes 8,000 chains
    await recomputeStaleQualifiedRanges(database.db) // and not the one that derives 10,000 tests' ranges
    await analyzeTables(database.db) // the planner's statistics (PGlite runs no autovacuum)
  }
  finally {
    await database.close()
  }
  console.log(`Seeded the large shop into ${databaseUrl ? 'the PostgreSQL database' : dataDir} in ${((Date.now() - started) / 1000).toFixed(1)} s`)
}
