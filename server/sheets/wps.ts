import { passTable, tungstenProcesses, wireProcesses, type ProcedureLayer } from '#shared/schemas/procedure'
import { unitLabels } from '#shared/qualification/procedure-units'
import type { Unit } from '#shared/rules/types'
import type { SheetBlock, SheetField, SheetModel } from './model'
import type { ProcedureRecord } from '../database/sheet-records'
import { draftOf, layeredSupport } from '../database/procedures'
import { procedureCaution as caution, procedureCodeLine as codeLine, groupClause, isCode, signedParts } from './common'
import { dash, length, list, orDash, printable, rangeText, temperature, windowText, yesNo } from './format'

type Window = { min: number | null, max: number | null, setPoint?: number | null }

const decimals = (n: number) => (String(n).split('.')[1] ?? '').length

/**
 * A production window as the welder reads it: "18.4 V ± 1.0 V" for a set point with an even trim, "18.4 V (17.9 to 19.4 V)"
 * for an uneven one, "17 to 19 V" without a set point.
 */
export function setPointText(w: Window | null | undefined, unit: string): string {
  if (!w) return dash
  const u = unit ? ` ${unit}` : ''
  const sp = w.setPoint ?? null
  if (sp === null) return windowText(w, unit)
  if (w.min === null || w.max === null) return `${sp}${u}${w.min !== null ? `, ${w.min}${u} minimum` : w.max !== null ? `, ${w.max}${u} maximum` : ''}`
  const low = sp - w.min
  const high = w.max - sp
  const places = Math.max(decimals(sp), decimals(w.min), decimals(w.max))
  if (Math.abs(low - high) < 1e-9) return `${sp.toFixed(Math.max(decimals(sp), 0))}${u} ± ${low.toFixed(places)}${u}`
  return `${sp}${u} (${w.min} to ${w.max}${u})`
}

/** The fields of one process layer, the process's own variables only where the process has them. */
function layerFields(layer: ProcedureLayer, unit: Unit, asme: boolean): SheetField[] {
  const u = unitLabels(unit)
  const tungsten = (tungstenProcesses as readonly string[]).includes(layer.process)
  const wire = (wireProcesses as readonly string[]).includes(layer.process)
  const fields: SheetField[] = [
    { label: 'Process and transfer', value: `${layer.process}${layer.transfer ? ` (${layer.transfer})` : ''}`, clause: asme ? 'QW-409.2' : undefined },
    { label: 'Passes', value: orDash(layer.passes) },
    {
      label: 'Filler metals', clause: asme ? 'QW-404.4, QW-404.5' : undefined,
      value: layer.fillers.length
        ? layer.fillers.map(f => `${printable(f.specification)} ${printable(f.classification)}, F-No. ${printable(f.fNumber)}${f.aNumber ? `, A-No. ${printable(f.aNumber)}` : ''}, ${f.size === null ? 'size not stated' : `Ø ${length(f.size, unit)}`}`).join('; ')
        : 'none',
    },
    { label: 'Deposit thickness, maximum', value: layer.depositMax === null ? 'not limited here' : length(layer.depositMax, unit), clause: asme ? 'QW-404.30' : undefined },
    { label: 'Current and polarity', value: layer.current, clause: asme ? 'QW-409.4' : undefined },
    { label: 'Amperes', value: setPointText(layer.amps, 'A'), clause: asme ? 'QW-409.8' : undefined },
    { label: 'Volts', value: setPointText(layer.volts, 'V'), clause: asme ? 'QW-409.8' : undefined },
  ]
  if (wire || layer.wireFeed.min !== null || layer.wireFeed.max !== null || layer.wireFeed.setPoint !== null) {
    fields.push({ label: 'Wire feed speed', value: setPointText(layer.wireFeed, u.speed) })
  }
  fields.push(
    { label: 'Travel speed', value: setPointText(layer.travelSpeed, u.speed) },
    { label: 'Heat input, maximum', value: layer.heatInputMax === null ? 'not limited' : `${layer.heatInputMax} ${u.heat}`, clause: asme ? 'QW-409.1' : undefined },
  )
  if (wire) fields.push({ label: 'Contact tip to work distance', value: setPointText(layer.ctwd, u.length) })
  fields.push(
    { label: 'Shielding gas and flow', value: layer.gas.composition ? `${printable(layer.gas.composition)}${layer.gas.flow.min !== null || layer.gas.flow.max !== null || layer.gas.flow.setPoint !== null ? `, ${setPointText(layer.gas.flow, u.flow)}` : ''}` : 'none', clause: asme ? 'QW-408.2' : undefined },
    { label: 'Bead', value: orDash(layer.bead), clause: asme ? 'QW-410.1' : undefined },
  )
  if (layer.pulsing) fields.push({ label: 'Pulsing', value: 'pulsed current', clause: asme ? 'QW-409.29' : undefined })
  if (layer.oscillation) fields.push({ label: 'Oscillation', value: printable(layer.oscillation), clause: asme ? 'QW-410.7' : undefined })
  fields.push({ label: 'Electrodes', value: layer.electrodes, clause: asme ? 'QW-410.10' : undefined })
  if (layer.passesPerSide) fields.push({ label: 'Passes per side', value: layer.passesPerSide, clause: asme ? 'QW-410.9' : undefined })
  if (layer.backGouging) fields.push({ label: 'Back gouging', value: 'yes', clause: asme ? 'QW-410.6' : undefined })
  if (tungsten) {
    fields.push(
      { label: 'Filler added', value: yesNo(layer.fillerAdded) },
      { label: 'Tungsten electrode', value: layer.tungsten.type || layer.tungsten.size !== null ? `${orDash(layer.tungsten.type)}${layer.tungsten.size !== null ? `, Ø ${length(layer.tungsten.size, unit)}` : ''}` : dash, clause: asme ? 'QW-409.12' : undefined },
      { label: 'Backing gas and flow', value: layer.backingGas.composition ? `${printable(layer.backingGas.composition)}${layer.backingGas.flow.min !== null || layer.backingGas.flow.max !== null || layer.backingGas.flow.setPoint !== null ? `, ${setPointText(layer.backingGas.flow, u.flow)}` : ''}` : 'none', clause: asme ? 'QW-408.5' : undefined },
      { label: 'Consumable insert', value: layer.consumableInsert ? printable(layer.consumableInsert) : 'none', clause: asme ? 'QW-402.10' : undefined },
    )
  }
  if (layer.process === 'SAW') {
    fields.push({ label: 'Flux and electrode–flux class', value: `${orDash(layer.flux.name)}, ${orDash(layer.flux.classification)}`, clause: asme ? 'QW-404.9' : undefined })
  }
  return fields
}

/** The WPS: the variables QW-482 asks a procedure to state, layer by layer, the pass table, and whether its PQRs support it. */
export function wpsSheet(record: ProcedureRecord, shop: string, origin: string): SheetModel {
  const p = record.procedure
  const unit = p.unit as Unit
  const u = unitLabels(unit)
  const draft = draftOf(p, record.pqrs.map(q => q.id))
  const c = (g: Parameters<typeof groupClause>[1]) => groupClause(p.code, g)
  const asme = p.code === 'asme-ix'
  const side = (s: typeof draft.baseMetals.a) => `P-No. ${printable(s.pNumber)}${s.groupNumber ? ` Group ${s.groupNumber}` : ''}`
  const t = draft.pwht.temperature
  const note = draft.pwht.note ? ` (${printable(draft.pwht.note)})` : ''
  const pwhtText = !draft.pwht.required
    ? `none${note}`
    : `${t.min ?? dash} to ${t.max ?? dash} ${u.temperature}, held ${draft.pwht.holdHours ?? dash} h${note}`

  const blocks: SheetBlock[] = [
    {
      heading: 'Scope',
      fields: [
        { label: 'Title', value: printable(p.title) },
        { label: 'Code', value: codeLine(p.code, p.edition, 'wps') },
        { label: 'Processes', value: draft.layers.map(l => `${l.process}${l.transfer ? ` (${l.transfer})` : ''} ${printable(l.name)}`).join(' + ') },
        { label: 'Units', value: unit === 'in' ? 'inch, °F' : 'millimetre, °C' },
        { label: 'Supporting PQRs', value: list(record.pqrs.map(q => `${q.number} (tested ${q.testDate}, ${q.status})`)) },
      ],
    },
    {
      heading: 'Joints', clause: c('joints'),
      fields: [
        { label: 'Joint type', value: orDash(draft.joints.type) },
        { label: 'Groove design', value: orDash(draft.joints.groove) },
        { label: 'Groove angle', value: draft.joints.grooveAngle === null ? dash : `${draft.joints.grooveAngle}°` },
        { label: 'Root opening', value: draft.joints.rootOpening.min === null && draft.joints.rootOpening.max === null ? dash : rangeText(draft.joints.rootOpening, unit), clause: asme ? 'QW-402.1' : undefined },
        { label: 'Root face', value: draft.joints.rootFace.min === null && draft.joints.rootFace.max === null ? dash : rangeText(draft.joints.rootFace, unit) },
        { label: 'Backing', value: orDash(draft.joints.backing), clause: asme ? 'QW-402.4' : undefined },
      ],
    },
    {
      heading: 'Base metals', clause: c('base'),
      fields: [
        { label: 'Base metal A to base metal B', value: `${side(draft.baseMetals.a)} to ${side(draft.baseMetals.b)}`, clause: asme ? 'QW-403.11' : undefined },
        { label: 'Base metal thickness', value: rangeText({ min: p.thicknessMin, max: p.thicknessMax }, unit), clause: asme ? 'QW-403.8' : undefined },
        { label: 'Pipe outside diameter', value: p.diameterMin === null ? 'all diameters' : `${length(p.diameterMin, unit)} and over` },
      ],
    },
    {
      heading: 'Positions', clause: c('positions'),
      fields: [
        { label: 'Positions', value: list(p.positions) },
        { label: 'Progression (vertical)', value: orDash(draft.progression), clause: asme ? 'QW-405.3' : undefined },
      ],
    },
    {
      heading: 'Preheat, interpass, PWHT', clause: asme ? 'QW-406, QW-407' : undefined,
      fields: [
        { label: 'Preheat, minimum', value: temperature(draft.preheatMin, unit), clause: asme ? 'QW-406.1' : undefined },
        { label: 'Interpass, maximum', value: temperature(draft.interpassMax, unit), clause: asme ? 'QW-406.3' : undefined },
        { label: 'PWHT', value: pwhtText, clause: asme ? 'QW-407.1' : undefined },
      ],
    },
    ...draft.layers.map((layer, i): SheetBlock => ({
      heading: `Layer ${i + 1} of ${draft.layers.length}: ${printable(layer.name)}, ${layer.process}`, clause: asme ? 'QW-404, QW-408 to QW-410' : undefined,
      fields: layerFields(layer, unit, asme),
    })),
    {
      heading: 'Pass table', clause: c('electrical'),
      table: {
        columns: ['Layer (passes)', 'Process', 'Filler', `Ø (${u.length})`, 'Polarity', 'Amps or WFS', 'Volts', `Travel (${u.speed})`, `Heat input max (${u.heat})`],
        rows: passTable(draft).map(r => [
          `${printable(r.layer)}${r.passes ? ` (${printable(r.passes)})` : ''}`, `${r.process}${r.transfer ? ` ${r.transfer}` : ''}`, orDash(r.filler),
          r.diameter === null ? dash : length(r.diameter, unit).replace(/ (in|mm)$/, ''), r.current,
          r.wireFeed.min !== null || r.wireFeed.setPoint !== null ? setPointText(r.wireFeed, u.speed) : setPointText(r.amps, 'A'),
          setPointText(r.volts, 'V'), windowText(r.travelSpeed), r.heatInputMax === null ? dash : String(r.heatInputMax),
        ]),
        numeric: [3, 8],
        widths: ['*', 44, 58, 34, 40, 78, 62, 52, 46],
      },
    },
    { heading: 'Technique', clause: c('technique'), fields: [{ label: 'Cleaning', value: orDash(draft.cleaning), clause: asme ? 'QW-410.5' : undefined }] },
    record.prequalified ? prequalifiedBlock(record.prequalified) : supportBlock(record, draft),
  ]

  const signed = signedParts(record.signed, origin)
  const status = p.status === 'superseded' && record.supersededBy !== null ? `superseded by rev. ${record.supersededBy}` : p.status
  return {
    kind: 'wps', kindTitle: 'Welding procedure specification (WPS)', shopName: shop, number: p.number, revision: p.revision,
    subtitle: printable(p.title), codeLine: codeLine(p.code, p.edition, 'wps'), unit, status,
    banner: p.status === 'draft' ? 'DRAFT · not for production' : p.status === 'superseded' ? 'SUPERSEDED' : null,
    blocks, statement: null, ...signed, caution: caution(p.code, p.edition),
  }
}

/** A prequalified WPS: each limit of the edition's prequalification clause checked, with its table and result. */
function prequalifiedBlock(check: NonNullable<ProcedureRecord['prequalified']>): SheetBlock {
  const words = { 'pass': 'within', 'fail': 'outside', 'by-hand': 'check by hand' } as const
  return {
    heading: `Prequalified (AWS D1.1:${check.edition} ${check.clause})`,
    notes: [
      check.failures
        ? `${check.failures} limit${check.failures === 1 ? ' lies' : 's lie'} outside the prequalification limits (marked "outside"): not prequalified as written.`
        : 'No limit checked lies outside the prequalification limits; limits marked "check by hand" are not carried by Rootface and were checked by hand.',
      'No PQR is needed for a prequalified WPS; welders using it are still qualified by test.',
      check.caution,
    ],
    table: {
      columns: ['Limit', 'Table', 'Finding', 'Result'],
      rows: check.items.map(i => [i.limit, i.table, printable(`${i.text}${i.required && i.state !== 'pass' ? ` Required: ${i.required}.` : ''}`), words[i.state]]),
      widths: [56, 90, '*', 56],
    },
  }
}

/** Whether each layer of the WPS stays inside what its PQRs qualify, variable by variable, with the clause. */
function supportBlock(record: ProcedureRecord, draft: ReturnType<typeof draftOf>): SheetBlock {
  const p = record.procedure
  const heading = 'Qualified by the supporting PQRs'
  if (!isCode(p.code) || !record.pqrs.length) return { heading, notes: ['No supporting PQR is recorded for this WPS.'] }
  const check = layeredSupport(draft, record.support)
  const notes = [
    ...check.blockers,
    check.rulesMissing
      ? 'The support rules of this code are not carried here: the ranges were checked by hand.'
      : !check.checked
          ? 'Not checked: the rules could not compare this WPS with its PQRs.'
          : check.supported
            ? 'Every variable checked lies within what the PQRs qualify; variables not listed were not checked.'
            : check.violations.every(v => v.byHand)
              ? 'Every variable compared lies within what the PQRs qualify; those marked "by hand" were checked by the supervisor, as stated.'
              : 'At least one variable lies outside what the PQRs qualify (marked "not met").',
  ]
  return {
    heading, notes,
    table: { columns: ['Clause', 'Finding', 'Result'], rows: check.findings.map(f => [f.clause, printable(f.text), f.byHand ? 'by hand' : f.met ? 'met' : 'not met']), widths: [90, '*', 48] },
  }
}
