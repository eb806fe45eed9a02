import type { Db } from '../client'
import * as t from '../schema'

// Invented trial runs for the demo shop: a square-groove butt on 16 ga (0.0598 in) mild steel sheet with 0.030 in
// ER70S-6 wire, short-circuit GMAW in 75Ar/25CO2. The values sit around a plausible window and are not copied from
// any one source; a few beads fail the usual ways (too much wire, spatter at a long extension, porosity when the
// extension was pulled out too far). The starting rows are marked as common practice.

type Bead = Partial<typeof t.trialBeads.$inferInsert> & { volts: number, wireFeed: number }

const good = { wetting: 'good', spatter: 'good', arcSound: 'good', backPenetration: 'full' } as const

const butt: Bead[] = [
  { volts: 17.0, wireFeed: 220, amps: 78, ctwd: 0.375, travelSpeed: 16, ...good, notes: 'First bead from the starting row' },
  { volts: 17.5, wireFeed: 220, amps: 79, ctwd: 0.375, travelSpeed: 16, ...good },
  { volts: 16.5, wireFeed: 220, amps: 77, ctwd: 0.375, travelSpeed: 16, ...good, wetting: 'fair', spatter: 'fair' },
  { volts: 17.0, wireFeed: 250, amps: 86, ctwd: 0.375, travelSpeed: 17, ...good },
  { volts: 17.5, wireFeed: 260, amps: 89, ctwd: 0.375, travelSpeed: 17, ...good, spatter: 'fair' },
  { volts: 17.0, wireFeed: 190, amps: 68, ctwd: 0.375, travelSpeed: 15, ...good, wetting: 'fair' },
  { volts: 17.0, wireFeed: 310, amps: 104, ctwd: 0.375, travelSpeed: 17, wetting: 'fair', spatter: 'poor', arcSound: 'poor', meltThrough: true, backPenetration: 'full', notes: 'Too much wire: stubbing, burned through at the end' },
  { volts: 17.0, wireFeed: 220, amps: 70, ctwd: 0.625, travelSpeed: 16, wetting: 'fair', spatter: 'poor', arcSound: 'fair', backPenetration: 'partial', notes: 'Long extension: spatter, back not through' },
  { volts: 17.0, wireFeed: 220, amps: 66, ctwd: 0.875, travelSpeed: 16, wetting: 'fair', spatter: 'poor', arcSound: 'fair', porosity: true, backPenetration: 'partial', notes: 'Extension pulled out too far: gas coverage lost, porosity' },
  { volts: 18.5, wireFeed: 230, amps: 80, ctwd: 0.375, travelSpeed: 16, wetting: 'good', spatter: 'fair', arcSound: 'fair', undercut: true, backPenetration: 'full', notes: 'Too hot for the sheet: undercut at the toes' },
  { volts: 16.0, wireFeed: 200, amps: 72, ctwd: 0.375, travelSpeed: 15, wetting: 'poor', spatter: 'fair', arcSound: 'good', backPenetration: 'partial', notes: 'Cold: ropy bead' },
  { volts: 17.2, wireFeed: 235, amps: 82, ctwd: 0.5, travelSpeed: 16, ...good },
  { volts: 17.3, wireFeed: 240, ctwd: 0.375, beadLength: 6, arcTime: 22, notes: 'Not yet judged: coupon cooling' },
]

const onPlate: Bead[] = [
  { volts: 17.0, wireFeed: 220, amps: 77, ctwd: 0.375, travelSpeed: 18, wetting: 'good', spatter: 'good', arcSound: 'good' },
  { volts: 17.5, wireFeed: 240, amps: 83, ctwd: 0.375, travelSpeed: 18, wetting: 'good', spatter: 'fair', arcSound: 'good' },
  { volts: 16.5, wireFeed: 240, amps: 82, ctwd: 0.375, travelSpeed: 18, wetting: 'fair', spatter: 'poor', arcSound: 'poor', notes: 'Stubbing' },
]

export async function seedDemoTrials(db: Db, who: { supervisor: number, inspector: number }, metals: { baseId: number | null, fillerId: number | null }) {
  await db.insert(t.trialStartingPoints).values([
    { unit: 'in', process: 'GMAW', transfer: 'short-circuit', wireDiameter: 0.030, thickness: 0.0478, gauge: '18 ga', gas: '75Ar/25CO2', volts: 16, wireFeed: 180, amps: 50, ctwd: 0.375, travelSpeed: 16, source: 'common practice' },
    { unit: 'in', process: 'GMAW', transfer: 'short-circuit', wireDiameter: 0.030, thickness: 0.0598, gauge: '16 ga', gas: '75Ar/25CO2', volts: 17, wireFeed: 220, amps: 60, ctwd: 0.375, travelSpeed: 16, source: 'common practice' },
    { unit: 'in', process: 'GMAW', transfer: 'short-circuit', wireDiameter: 0.035, thickness: 0.0747, gauge: '14 ga', gas: '75Ar/25CO2', volts: 18, wireFeed: 230, amps: 75, ctwd: 0.375, travelSpeed: 16, source: 'common practice' },
    { unit: 'in', process: 'GMAW', transfer: 'short-circuit', wireDiameter: 0.035, thickness: 0.1196, gauge: '11 ga', gas: '75Ar/25CO2', volts: 19, wireFeed: 300, amps: 120, ctwd: 0.5, travelSpeed: 14, source: 'common practice' },
    { unit: 'mm', process: 'GMAW', transfer: 'short-circuit', wireDiameter: 0.8, thickness: 1.5, gauge: null, gas: '82Ar/18CO2', volts: 17, wireFeed: 5500, amps: 60, ctwd: 10, travelSpeed: 400, source: 'common practice' },
  ])
  const header = {
    unit: 'in', process: 'GMAW', transfer: 'short-circuit', wireClass: 'ER70S-6', wireDiameter: 0.030, fillerMetalId: metals.fillerId,
    gas: '75Ar/25CO2', gasFlow: 25, baseMetal: 'SA-1011 CS Type B', baseMetalId: metals.baseId, thickness: 0.0598, gauge: '16 ga', position: '1G',
  }
  const [plate] = await db.insert(t.trialSeries).values({ ...header, title: 'Bead on plate, 16 ga, 0.030 wire', joint: 'bead-on-plate', createdBy: who.inspector }).returning({ id: t.trialSeries.id })
  await db.insert(t.trialBeads).values(onPlate.map((b, i) => ({ ...b, seriesId: plate!.id, number: i + 1, recordedBy: who.inspector })))
  const [series] = await db.insert(t.trialSeries).values({
    ...header, title: 'Square butt, 16 ga, 0.030 wire', joint: 'butt', rootGap: 0.03125, createdBy: who.supervisor,
    notes: 'For the sheet-metal enclosures: find the window before the PQR coupon',
  }).returning({ id: t.trialSeries.id })
  await db.insert(t.trialBeads).values(butt.map((b, i) => ({ ...b, seriesId: series!.id, number: i + 1, recordedBy: i < 6 ? who.inspector : who.supervisor })))
}
