// The large shop's weld registers: 1,000 joints on each of its 200 projects (200,000), each with one welder and process
// from the project's crew, most welded, some with an RT result. Invented and deterministic. Seeded joints carry no
// completion check (the register and the packet say "not checked"), since the check was never run on them.
import type { Db } from '../server/database/client'
import * as t from '../server/database/schema'

export const jointsPerProject = 1000

export async function seedLargeJoints(tx: Db, projects: { id: number, welderIds: number[], procedureIds: number[] }[], day: (daysAgo: number) => string, int: (min: number, max: number) => number) {
  const processes = ['SMAW', 'GTAW', 'GMAW', 'FCAW'] as const
  const types = ['butt', 'butt', 'butt', 'tee', 'branch', 'socket'] as const
  for (const p of projects) {
    const rows = Array.from({ length: jointsPerProject }, (_, i) => {
      const type = types[i % types.length]!
      const welded = i % 5 !== 0
      return {
        projectId: p.id, mark: `L${String(Math.floor(i / 40) + 1).padStart(2, '0')}-W${String(i % 40 + 1).padStart(3, '0')}`, jointType: type,
        weld: type === 'tee' || type === 'socket' ? 'fillet' : 'groove', unit: 'in', pNumberA: '1', pNumberB: i % 17 === 0 ? '8' : '1',
        thickness: [0.154, 0.218, 0.28, 0.375, 0.5][i % 5]!, outsideDiameter: i % 3 === 0 ? null : [2.375, 4.5, 6.625, 8.625][i % 4]!,
        positions: i % 2 ? ['F', 'V', 'O'] : ['F'], rtPercent: i % 4 === 0 ? 100 : 10, procedureId: p.procedureIds[i % p.procedureIds.length]!,
        weldedOn: welded ? day(int(1, 380)) : null,
      }
    })
    const ids: number[] = []
    for (let i = 0; i < rows.length; i += 1000) ids.push(...(await tx.insert(t.joints).values(rows.slice(i, i + 1000)).returning({ id: t.joints.id })).map(r => r.id))
    const crew = ids.map((jointId, i) => ({ jointId, welderId: p.welderIds[i % p.welderIds.length]!, process: processes[(i >> 2) % processes.length]!, layer: 'all', fNumber: 6 }))
    for (let i = 0; i < crew.length; i += 2000) await tx.insert(t.jointWelders).values(crew.slice(i, i + 2000))
    const exams = ids.flatMap((jointId, i) => (rows[i]!.weldedOn && i % 4 === 0
      ? [{ jointId, method: 'RT', examinedOn: rows[i]!.weldedOn!, accepted: i % 23 !== 0, lengthExamined: 14.1, defectType: i % 23 === 0 ? 'porosity' : null, defectLength: i % 23 === 0 ? 0.25 : null }]
      : []))
    for (let i = 0; i < exams.length; i += 2000) await tx.insert(t.jointExaminations).values(exams.slice(i, i + 2000))
  }
}
