// The demo shop's structural work (invented): a prequalified AWS D1.1 FCAW WPS drafted for a stair-stringer job, and an
// AWS D1.3 sheet-metal fillet test waiting for the inspector. Demo only; never an expected value in a test.
import { format, subDays } from 'date-fns'
import type { Db } from '../client'
import * as t from '../schema'
import { columnsOf } from '../procedure-columns'
import { columnsOf as welderTestColumns } from '../welder-test-columns'
import { blankLayer, blankProcedureDraft, type ProcedureDraft } from '../../../shared/schemas/procedure'
import type { WelderTestInput } from '../../../shared/schemas/welder-test'

export async function seedStructuralDemo(db: Db, who: { supervisorId: number, inspectorId: number, welderId: number, today: Date }) {
  const [a36] = await db.insert(t.baseMetals).values({ specification: 'A36', grade: '—', pNumber: '1', groupNumber: 1, minTensilePsi: 58000 }).returning()
  const [a572] = await db.insert(t.baseMetals).values({ specification: 'A572', grade: '50', pNumber: '1', groupNumber: 2, minTensilePsi: 65000 }).returning()
  // Drafted with a 40 °F preheat: under the prequalified minimum for its 1 in thickest part, for the quality manager to fix.
  const draft: ProcedureDraft = {
    ...blankProcedureDraft(), number: 'KB-S01', title: 'FCAW-G T- and corner joints, A36 to A572 Gr 50 plate, prequalified',
    code: 'aws-d1.1', edition: '2020', unit: 'in', prequalified: true,
    baseMetals: { a: { baseMetalId: a36!.id, pNumber: '1', groupNumber: 1 }, b: { baseMetalId: a572!.id, pNumber: '1', groupNumber: 2 } },
    thickness: { groove: { min: 0.25, max: 1 }, fillet: { min: 0.125, max: 1 } },
    joints: { type: 'tee and corner', groove: 'single bevel, steel backing', grooveAngle: 30, rootOpening: { min: 0.1875, max: 0.25 }, rootFace: { min: null, max: null }, backing: 'steel backing bar, 3/8 x 1 in', designation: 'TC-U4a-GF' },
    positions: ['F', 'H', 'V'], progression: 'uphill', preheatMin: 40, interpassMax: 500,
    cleaning: 'wire brush between passes; remove slag before each pass',
    layers: [{
      ...blankLayer('FCAW', 'all passes'), passes: 'root, fill, cap',
      fillers: [{ fillerMetalId: null, specification: 'SFA-5.20', classification: 'E71T-1C', fNumber: '6', aNumber: '1', size: 0.045 }],
      amps: { min: 180, max: 220, setPoint: 200 }, volts: { min: 24, max: 27, setPoint: 25.5 }, wireFeed: { min: 300, max: 380, setPoint: 340 },
      travelSpeed: { min: 8, max: 14, setPoint: null }, ctwd: { min: 0.75, max: 1, setPoint: null },
      gas: { composition: '100% CO2', flow: { min: 35, max: 45, setPoint: 40 } }, bead: 'stringer, slight weave in vertical up',
    }],
  }
  await db.insert(t.procedures).values({ ...columnsOf(draft), revision: 0, status: 'draft', createdBy: who.supervisorId })

  // A 14 gauge (0.0747 in) fillet test on galvanised-free sheet, visual and macro-etch accepted, not certified yet.
  const input: WelderTestInput = {
    welderId: who.welderId, procedureId: null, pqrId: null, testDate: format(subDays(who.today, 3), 'yyyy-MM-dd'),
    code: 'aws-d1.3', edition: '2018', unit: 'in', processes: [{ process: 'GMAW', transfer: 'short-circuit', depositThickness: null, fNumber: null }],
    form: 'plate', weld: 'fillet', jointType: 'fillet', couponThickness: 0.0747, layers: 1, outsideDiameter: null, pNumber: null, fNumber: null,
    backing: false, positions: ['2F'], progression: null, visualAccepted: true, visualNotes: 'two assemblies, even legs, no undercut',
    examination: 'macro-fracture', bends: [], radiography: null, macro: { accepted: true, notes: 'macro-etch of both assemblies: fusion to the root' }, iso: null,
  }
  const { values } = welderTestColumns(input)
  await db.insert(t.welderTests).values({ ...values, status: 'recorded', inspectorId: who.inspectorId })
}
