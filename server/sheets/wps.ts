import { evaluate } from '#shared/rules'
import type { Unit } from '#shared/rules/types'
import type { SheetBlock, SheetField, SheetModel } from './model'
import type { ProcedureRecord } from './records'
import { caution, codeLine, groupClause, isCode, signedParts } from './common'
import { dash, length, list, orDash, printable, rangeText, temperature, windowText } from './format'

type Vars = Record<string, unknown>
const obj = (v: unknown): Vars => (v && typeof v === 'object' && !Array.isArray(v) ? v as Vars : {})
const known = ['joints', 'fillers', 'progression', 'preheatMin', 'interpassMax', 'pwht', 'gas', 'electrical', 'technique']

/** The WPS: the variables QW-482 asks a procedure to state, the PQRs behind it and whether they support it. */
export function wpsSheet(record: ProcedureRecord, shop: string, origin: string): SheetModel {
  const p = record.procedure
  const unit = p.unit as Unit
  const v = obj(p.variables)
  const c = (g: Parameters<typeof groupClause>[1]) => groupClause(p.code, g)
  const joints = obj(v.joints)
  const gas = obj(v.gas)
  const el = obj(v.electrical)
  const tech = obj(v.technique)
  const fillers = Array.isArray(v.fillers) ? v.fillers.map(obj) : []
  const speedUnit = unit === 'in' ? 'in/min' : 'mm/min'
  const asme = p.code === 'asme-ix'

  const blocks: SheetBlock[] = [
    {
      heading: 'Scope',
      fields: [
        { label: 'Title', value: printable(p.title) },
        { label: 'Code', value: codeLine(p.code, p.edition) },
        { label: 'Process', value: p.process },
        { label: 'Transfer mode', value: orDash(p.transfer), clause: asme ? 'QW-409.2' : undefined },
        { label: 'Units', value: unit === 'in' ? 'inch, °F' : 'millimetre, °C' },
        { label: 'Supporting PQRs', value: list(record.pqrs.map(q => `${q.number} (tested ${q.testDate}, ${q.status})`)) },
      ],
    },
    {
      heading: 'Joints', clause: c('joints'),
      fields: [
        { label: 'Joint type', value: orDash(joints.type) },
        { label: 'Groove design', value: orDash(joints.groove) },
        { label: 'Backing', value: orDash(joints.backing), clause: asme ? 'QW-402.4' : undefined },
      ],
    },
    {
      heading: 'Base metals', clause: c('base'),
      fields: [
        { label: 'P-No. to P-No.', value: `P-No. ${orDash(p.pNumberA)} to P-No. ${orDash(p.pNumberB)}`, clause: asme ? 'QW-403.11' : undefined },
        { label: 'Base metal thickness', value: rangeText({ min: p.thicknessMin, max: p.thicknessMax }, unit), clause: asme ? 'QW-403.8' : undefined },
        { label: 'Pipe outside diameter', value: p.diameterMin === null ? 'all diameters' : `${length(p.diameterMin, unit)} and over` },
      ],
    },
    {
      heading: 'Filler metals', clause: c('filler'),
      fields: [{ label: 'F-No.', value: list(p.fNumbers), clause: asme ? 'QW-404.4' : undefined }],
      table: fillers.length
        ? {
            columns: ['Specification (SFA)', 'Classification', 'F-No.', 'A-No.', 'Size'],
            rows: fillers.map((f) => {
              const found = record.fillerCatalogue.find(x => x.specification === f.specification && x.classification === f.classification)
              return [orDash(f.specification), orDash(f.classification), orDash(found?.fNumber), orDash(found?.aNumber), orDash(f.size)]
            }),
          }
        : undefined,
    },
    {
      heading: 'Positions', clause: c('positions'),
      fields: [
        { label: 'Positions', value: list(p.positions) },
        { label: 'Progression (vertical)', value: orDash(v.progression), clause: asme ? 'QW-405.3' : undefined },
      ],
    },
    {
      heading: 'Preheat and interpass', clause: c('preheat'),
      fields: [
        { label: 'Preheat, minimum', value: temperature(v.preheatMin as number | null, unit), clause: asme ? 'QW-406.1' : undefined },
        { label: 'Interpass, maximum', value: temperature(v.interpassMax as number | null, unit), clause: asme ? 'QW-406.3' : undefined },
      ],
    },
    { heading: 'Postweld heat treatment', clause: c('pwht'), fields: [{ label: 'PWHT', value: orDash(v.pwht), clause: asme ? 'QW-407.1' : undefined }] },
    {
      heading: 'Shielding gas', clause: c('gas'),
      fields: [
        { label: 'Composition', value: orDash(gas.composition), clause: asme ? 'QW-408.2' : undefined },
        { label: 'Flow rate', value: gas.flow ? windowText(gas.flow, unit === 'in' ? 'ft³/h' : 'l/min') : dash },
      ],
    },
    {
      heading: 'Electrical characteristics', clause: c('electrical'),
      fields: [
        { label: 'Current and polarity', value: orDash(el.current), clause: asme ? 'QW-409.4' : undefined },
        { label: 'Amperes', value: windowText(el.amps, 'A') },
        { label: 'Volts', value: windowText(el.volts, 'V') },
        { label: 'Wire feed speed', value: el.wireFeed ? windowText(el.wireFeed, unit === 'in' ? 'in/min' : 'm/min') : dash },
        { label: 'Travel speed', value: windowText(el.travelSpeed, speedUnit) },
        { label: 'Heat input, maximum', value: el.heatInputMax ? `${el.heatInputMax} ${unit === 'in' ? 'J/in' : 'J/mm'}` : 'not limited', clause: asme ? 'QW-409.1' : undefined },
      ],
    },
    {
      heading: 'Technique', clause: c('technique'),
      fields: [
        { label: 'Bead', value: orDash(tech.bead), clause: asme ? 'QW-410.1' : undefined },
        { label: 'Contact tip to work distance', value: tech.ctwd ? windowText(tech.ctwd, unit) : dash },
        { label: 'Cleaning', value: orDash(tech.cleaning), clause: asme ? 'QW-410.5' : undefined },
      ],
    },
  ]
  const others: SheetField[] = Object.entries(v).filter(([k]) => !known.includes(k))
    .map(([k, value]) => ({ label: printable(k), value: typeof value === 'object' ? windowText(value) : orDash(value) }))
  if (others.length) blocks.push({ heading: 'Other variables', fields: others })
  blocks.push(supportBlock(record))

  const signed = signedParts(record.signed, origin)
  const status = p.status === 'superseded' && record.supersededBy !== null ? `superseded by rev. ${record.supersededBy}` : p.status
  return {
    kind: 'wps', kindTitle: 'Welding procedure specification (WPS)', shopName: shop, number: p.number, revision: p.revision,
    subtitle: printable(p.title), codeLine: codeLine(p.code, p.edition), unit, status,
    banner: p.status === 'draft' ? 'DRAFT · not for production' : p.status === 'superseded' ? 'SUPERSEDED' : null,
    blocks, statement: null, ...signed, caution: caution(p.code, p.edition),
  }
}

/** Whether the WPS stays inside what its PQRs qualify, variable by variable (the rules' wps-support check). */
function supportBlock(record: ProcedureRecord): SheetBlock {
  const p = record.procedure
  const heading = 'Qualified by the supporting PQRs'
  if (!isCode(p.code) || !record.pqrs.length) return { heading, notes: ['No supporting PQR is recorded for this WPS.'] }
  const fNumber = Number(p.fNumbers[0])
  const result = evaluate({
    code: p.code, check: 'wps-support', unit: p.unit, edition: p.edition,
    input: {
      wps: {
        process: p.process, ...(p.transfer ? { transfer: p.transfer } : {}),
        thickness: { min: p.thicknessMin, max: p.thicknessMax },
        ...(Number.isInteger(fNumber) && fNumber > 0 ? { fNumber } : {}),
      },
      pqrs: record.pqrs.map((q) => {
        const f = Number(q.fNumber)
        return {
          id: q.number, process: q.process, ...(q.transfer ? { transfer: q.transfer } : {}), couponThickness: q.couponThickness,
          ...(q.depositThickness ? { depositThickness: q.depositThickness } : {}), toughness: q.toughnessRequired,
          ...(Number.isInteger(f) && f > 0 ? { fNumber: f } : {}),
        }
      }),
    },
  })
  if ('error' in result) return { heading, notes: [`The rules could not check this WPS against its PQRs: ${result.error}`] }
  const reasons = result.reasons as { clause: string, text: string, met?: boolean }[]
  return {
    heading,
    notes: [result.supported ? 'Every variable checked lies within what the PQRs qualify.' : 'At least one variable lies outside what the PQRs qualify (marked "outside").'],
    table: { columns: ['Clause', 'Finding', 'Result'], rows: reasons.map(r => [r.clause, r.text, r.met === false ? 'outside' : 'within']), widths: [90, '*', 48] },
  }
}
