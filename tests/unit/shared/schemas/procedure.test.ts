import { describe, expect, it } from 'vitest'
import { blankLayer, blankProcedureDraft, passTable, procedureDraftSchema, procedurePatchSchema, type ProcedureDraft, type ProcedureLayer } from '../../../../shared/schemas/procedure'

/** A complete short-circuit GMAW sheet draft (values of the form, not expected results). */
function complete(): ProcedureDraft {
  return {
    ...blankProcedureDraft(),
    number: 'WPS-100', title: 'GMAW-S sheet', edition: '2019',
    thickness: { groove: { min: 0.0625, max: 0.1345 }, fillet: { min: null, max: null } },
    joints: { type: 'butt', groove: 'square groove', grooveAngle: null, rootOpening: { min: 0, max: 0.0625 }, rootFace: { min: null, max: null }, backing: 'none', designation: null },
    layers: [{
      ...blankLayer('GMAW'),
      fillers: [{ fillerMetalId: null, specification: 'SFA-5.18', classification: 'ER70S-6', fNumber: '6', aNumber: '1', size: 0.035 }],
      amps: { min: 95, max: 135, setPoint: null }, volts: { min: 17, max: 19, setPoint: 18 },
    }],
  }
}
const withLayer = (patch: Partial<ProcedureLayer>) => {
  const d = complete()
  return { ...d, layers: [{ ...d.layers[0]!, ...patch }] }
}
const issues = (value: unknown) => {
  const result = procedureDraftSchema.safeParse(value)
  if (result.success) return {}
  const first: Record<string, string> = {}
  for (const i of result.error.issues) first[i.path.join('.')] ??= i.message
  return first
}

describe('procedureDraftSchema: the WPS draft shared by the form and the route', () => {
  it('accepts a complete draft', () => {
    expect(procedureDraftSchema.safeParse(complete()).success).toBe(true)
  })

  it('a blank form names what is missing, in words', () => {
    const found = issues(blankProcedureDraft())
    expect(found.number).toBe('Enter the WPS number')
    expect(found.title).toBe('Enter a title')
    expect(found['joints.type']).toMatch(/joint type/)
    expect(found['thickness.groove.max']).toBe('Give the groove thickness range, minimum and maximum')
  })

  it('empty boxes are "not stated", typed numbers are numbers', () => {
    const parsed = procedureDraftSchema.parse({ ...withLayer({ depositMax: '' as unknown as null }), preheatMin: '', interpassMax: '350' })
    expect(parsed.preheatMin).toBeNull()
    expect(parsed.interpassMax).toBe(350)
    expect(parsed.layers[0]!.depositMax).toBeNull()
    expect(issues({ ...complete(), interpassMax: 'hot' }).interpassMax).toBe('Interpass maximum must be a number')
  })

  it('a range whose minimum is above its maximum is refused at the maximum', () => {
    const found = issues({ ...complete(), thickness: { groove: { min: 0.2, max: 0.1 }, fillet: { min: null, max: null } } })
    expect(found['thickness.groove.max']).toBe('Groove thickness: the minimum is above the maximum')
  })

  it('a set point must lie inside its window', () => {
    const found = issues(withLayer({ volts: { min: 17, max: 19, setPoint: 20 } }))
    expect(found['layers.0.volts.setPoint']).toBe('Voltage: the set point lies outside its window')
  })

  it('GMAW needs a transfer mode; SMAW takes none; vertical needs a progression', () => {
    expect(issues(withLayer({ transfer: null }))['layers.0.transfer']).toBe('Pick the GMAW transfer mode')
    expect(issues(withLayer({ process: 'SMAW', transfer: 'spray' }))['layers.0.transfer']).toBe('A transfer mode is stated for GMAW and FCAW only')
    expect(issues({ ...complete(), positions: ['F', 'V'], progression: null }).progression).toMatch(/uphill or downhill/)
    expect(issues({ ...complete(), positions: [] }).positions).toBe('Pick at least one position')
    expect(issues({ ...complete(), positions: ['1G'] })['positions.0']).toBe('Positions are F, H, V or O (ISO: PA–PJ, H-L045, J-L045)')
  })

  it('needs at least one filler a layer, with its F-No.; an autogenous GTAW layer says so', () => {
    expect(issues(withLayer({ fillers: [] }))['layers.0.fillers']).toMatch(/Add at least one filler metal/)
    const d = complete()
    expect(issues(withLayer({ fillers: [{ ...d.layers[0]!.fillers[0]!, fNumber: '' }] }))['layers.0.fillers.0.fNumber']).toBe('Enter the F-No.')
    expect(issues(withLayer({ ...blankLayer('GTAW'), fillers: [], fillerAdded: false }))).toEqual({})
  })

  it('needs at least one layer; each process keeps its own variables', () => {
    expect(issues({ ...complete(), layers: [] }).layers).toBe('Add at least one process layer')
    expect(issues(withLayer({ process: 'SMAW', transfer: null, tungsten: { type: 'EWCe-2', size: 0.094 } }))['layers.0.tungsten.type']).toBe('A tungsten electrode belongs to GTAW or PAW')
    expect(issues(withLayer({ flux: { name: 'F7A2', classification: null } }))['layers.0.flux.name']).toBe('A flux belongs to SAW')
  })

  it('PWHT: none, or a temperature range and a time', () => {
    expect(issues({ ...complete(), pwht: { required: true, temperature: { min: null, max: null }, holdHours: null, note: null } })['pwht.temperature.max']).toBe('Give the PWHT temperature range')
    expect(issues({ ...complete(), pwht: { required: true, temperature: { min: 1100, max: 1200 }, holdHours: 1, note: null } })).toEqual({})
  })

  it('the pass table has one row per layer and filler, read from the layers', () => {
    const d = complete()
    const two = { layers: [{ ...blankLayer('GTAW', 'root'), fillers: [{ ...d.layers[0]!.fillers[0]!, classification: 'ER70S-2', size: 0.094 }] }, { ...blankLayer('SMAW', 'fill'), fillers: [] }] }
    const rows = passTable(two)
    expect(rows.map(r => [r.layer, r.process, r.filler, r.diameter])).toEqual([['root', 'GTAW', 'ER70S-2', 0.094], ['fill', 'SMAW', '', null]])
  })

  it('the edition is a year and the code one the rules carry', () => {
    expect(issues({ ...complete(), edition: '19' }).edition).toBe('Enter the edition year, e.g. 2023')
    expect(issues({ ...complete(), code: 'api-1104' }).code).toBe('Pick a code')
  })
})

describe('procedurePatchSchema', () => {
  it('carries the version that was edited and nothing else', () => {
    expect(procedurePatchSchema.safeParse({ version: 3, draft: complete() }).success).toBe(true)
    const stale = procedurePatchSchema.safeParse({ draft: complete() })
    expect(stale.success).toBe(false)
    expect(stale.error?.issues[0]?.message).toBe('Send the version you edited')
    expect(procedurePatchSchema.safeParse({ version: 3, draft: complete(), status: 'approved' }).success).toBe(false)
    expect(procedurePatchSchema.safeParse({ version: 0, draft: complete() }).success).toBe(false)
  })
})
