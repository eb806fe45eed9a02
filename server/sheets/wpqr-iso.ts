import type { SheetBlock } from './model'
import type { PqrRecord } from '../database/sheet-records'
import { isoWpqrOf } from '../database/pqrs'
import { isoPieceOf } from '#shared/qualification/iso-procedure-support'
import { wpqrRanges } from '#shared/rules/iso-15614-1'
import { RuleRefusal } from '#shared/rules/refusal'
import { isIsoProcedureCode } from '#shared/vocabulary/records'
import { isoFillerGroups } from '#shared/vocabulary/iso'
import { wpqrPieceOf } from '../database/pqr-columns'
import { dash, list, printable } from './format'

/**
 * The ISO 15614-1 parts of a WPQR sheet: the test piece in the standard's terms (ISO 6947 positions, product, runs,
 * ISO/TR 15608 group, filler designation, preheat, interpass, PWHT, heat input) and the range of qualification of
 * clause 8, each line with its clause and "from memory". Null for ASME/AWS PQRs, whose sheets are untouched.
 */
export function isoWpqrBlocks(record: PqrRecord): { piece: SheetBlock, ranges: SheetBlock } | null {
  const q = record.pqr
  if (!isIsoProcedureCode(q.code)) return null
  const stored = wpqrPieceOf(q)
  const w = isoWpqrOf(q, record.layers)
  const heats = w?.heatInputs.filter((h): h is number => h !== null) ?? []
  const piece: SheetBlock = {
    heading: 'Test piece', clause: 'ISO 15614-1:2017, 6 and 8',
    fields: stored
      ? [
          { label: 'Positions welded (ISO 6947)', value: list(stored.positions) },
          { label: 'Product', value: stored.form === 'pipe' ? `pipe (T), D ${stored.outsideDiameter ?? '?'} mm` : 'plate (P)' },
          { label: 'Test piece thickness t', value: `${q.couponThickness} mm` },
          { label: 'Runs', value: stored.runs === 'single' ? 'single-run' : 'multi-run' },
          { label: 'Parent metal group (ISO/TR 15608)', value: stored.materialGroup ? printable(stored.materialGroup) : 'not recorded' },
          { label: 'Filler designation', value: stored.fillerDesignation ? printable(stored.fillerDesignation) : 'not recorded' },
          { label: 'Filler group', value: stored.fillerGroup ? isoFillerGroups[Number(stored.fillerGroup) as keyof typeof isoFillerGroups] : dash },
          { label: 'Preheat', value: w?.preheat !== null && w?.preheat !== undefined ? `${w.preheat} °C` : 'not recorded' },
          { label: 'Interpass, highest reached', value: w?.interpass !== null && w?.interpass !== undefined ? `${w.interpass} °C` : 'not recorded' },
          { label: 'PWHT', value: !w?.pwht ? 'not recorded' : !w.pwht.done ? 'none (as welded)' : `${w.pwht.temperature ?? '?'} °C${w.pwht.hours !== null ? `, held ${w.pwht.hours} h` : ''}` },
          { label: 'Heat input', value: heats.length ? `${(Math.min(...heats) / 1000).toFixed(2)} to ${(Math.max(...heats) / 1000).toFixed(2)} kJ/mm` : 'not recorded' },
          { label: 'Impact tested', value: q.toughnessRequired ? 'yes' : 'no' },
          { label: 'Hardness tested', value: stored.hardnessTested ? 'yes' : 'no' },
        ]
      : [{ label: 'Test piece', value: 'not recorded: record the positions welded and whether it is plate or pipe' }],
  }
  const heading = 'Range of qualification'
  const p = w ? isoPieceOf({ iso: w }) : null
  if (!p) return { piece, ranges: { heading, clause: 'ISO 15614-1:2017, 8', notes: ['Cannot tell: the test piece is not recorded (or the record is not in mm and °C).'] } }
  try {
    const r = wpqrRanges(p)
    const rows: Record<string, string> = {
      'process': r.processes.join(' + '),
      'thickness': `${r.thickness.min} to ${r.thickness.max} mm`,
      'diameter': r.diameter ? `${r.diameter.min} mm${r.diameter.max === null ? ' and over' : ` to ${r.diameter.max} mm`}` : 'pipe over 500 mm (plate test)',
      'position': r.positions.join(', '),
      'material': r.materialGroups ? `group ${r.materialGroups.join(', ')}` : 'not recorded',
      'heat-input': r.heatInput ? `${r.heatInput.min ?? '—'} to ${r.heatInput.max ?? '—'} kJ/mm` : 'not limited by the test',
      'preheat': r.preheatMin === null ? 'not recorded' : `${r.preheatMin} °C and over`,
      'interpass': r.interpassMax === null ? 'not recorded' : `up to ${r.interpassMax} °C`,
      'pwht': !r.pwht ? 'not recorded' : !r.pwht.done ? 'as welded' : r.pwht.temperature ? `${r.pwht.temperature.min} to ${r.pwht.temperature.max} °C` : 'as tested',
      'filler': r.filler ? r.filler.designation : 'not recorded',
    }
    const words: Record<string, string> = { 'process': 'Process (ISO 4063)', 'thickness': 'Thickness', 'diameter': 'Outside diameter', 'position': 'Positions', 'material': 'Parent metal', 'heat-input': 'Heat input', 'preheat': 'Preheat', 'interpass': 'Interpass', 'pwht': 'PWHT', 'filler': 'Filler' }
    return {
      piece,
      ranges: {
        heading, clause: 'ISO 15614-1:2017, 8',
        table: { columns: ['Variable', 'Qualified', 'Clause', 'Source', 'Why'], rows: r.reasons.map(x => [words[x.variable] ?? x.variable, rows[x.variable] ?? dash, x.clause.replace('ISO 15614-1:2017, ', ''), 'from memory', x.text]), widths: ['auto', 'auto', 'auto', 'auto', '*'] },
        notes: ['Every range is carried from memory of ISO 15614-1:2017 clause 8 (level 2): confirm against your copy of the standard.'],
      },
    }
  }
  catch (error) {
    if (!(error instanceof RuleRefusal)) throw error
    return { piece, ranges: { heading, notes: [`Cannot tell: ${error.message}`] } }
  }
}
