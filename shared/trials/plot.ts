import type { Unit } from '../rules/types'
import { convexHull, type PlanePoint } from './hull'
import type { BeadVerdict } from './beads'

/** What the plot needs of a bead. */
export interface PlotBead {
  number: number
  volts: number
  wireFeed: number
  ctwd: number | null
  verdict: BeadVerdict['kind']
}

export type PlotView = 'wire-feed' | 'ctwd'

export interface PlotAxis {
  label: string
  min: number
  max: number
  ticks: number[]
}

/** A production reading taken later on the WPS made from the trials, shown against the trial plot. */
export interface PlotReading {
  volts: number | null
  wireFeed: number | null
  ctwd: number | null
}

export interface PlotMark extends PlanePoint {
  label: string
  verdict: BeadVerdict['kind'] | 'reading'
}

export interface PlotData {
  view: PlotView
  x: PlotAxis
  y: PlotAxis
  marks: PlotMark[]
  /** The accepted region: the convex hull of the accepted beads in this plane (a point or a segment when few). */
  region: PlanePoint[]
  /** Beads left off this view (no CTWD recorded). */
  leftOff: number[]
}

/** Tick step of 1, 2 or 5 × 10ⁿ giving about five ticks over the span. */
function niceStep(span: number): number {
  const raw = span / 5
  const power = 10 ** Math.floor(Math.log10(raw))
  const f = raw / power
  return (f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10) * power
}

function axis(values: number[], label: string): PlotAxis {
  if (!values.length) return { label, min: 0, max: 1, ticks: [0, 1] }
  let lo = Math.min(...values)
  let hi = Math.max(...values)
  if (lo === hi) {
    const pad = Math.abs(lo) * 0.1 || 1
    lo -= pad
    hi += pad
  }
  else {
    // A little room so no mark sits on the frame.
    const pad = (hi - lo) * 0.04
    lo -= pad
    hi += pad
  }
  const step = niceStep(hi - lo)
  const min = Math.floor(lo / step) * step
  const max = Math.ceil(hi / step) * step
  const ticks: number[] = []
  for (let t = min; t <= max + step / 1e6; t += step) ticks.push(Math.round(t * 1e6) / 1e6)
  return { label, min: ticks[0]!, max: ticks.at(-1)!, ticks }
}

/** The plot of a series in one plane: volts across, wire feed speed (or CTWD) up, each bead marked by its verdict. */
export function plotData(beads: readonly PlotBead[], view: PlotView, unit: Unit, readings: readonly PlotReading[] = []): PlotData {
  const yOf = (b: Pick<PlotBead, 'wireFeed' | 'ctwd'> | PlotReading) => (view === 'wire-feed' ? b.wireFeed : b.ctwd)
  const shown = beads.filter(b => yOf(b) !== null)
  const marks: PlotMark[] = shown.map(b => ({ x: b.volts, y: yOf(b)!, label: String(b.number), verdict: b.verdict }))
  // Readings are not beads: they are drawn (a diamond, "R"), never part of the accepted region.
  for (const r of readings) if (r.volts !== null && yOf(r) !== null) marks.push({ x: r.volts, y: yOf(r)!, label: 'R', verdict: 'reading' })
  return {
    view,
    x: axis(marks.map(m => m.x), 'Voltage, V'),
    y: axis(marks.map(m => m.y), view === 'wire-feed' ? `Wire feed speed, ${unit}/min` : `CTWD, ${unit}`),
    marks,
    region: convexHull(marks.filter(m => m.verdict === 'accepted')),
    leftOff: beads.filter(b => yOf(b) === null).map(b => b.number),
  }
}

const escapeXml = (text: string) => text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;')
const fixed = (v: number) => Number(v.toFixed(2)).toString()

/** Colours for the marks; the shape and the word in the legend carry the meaning too (never colour alone). */
const ink = { reading: '#1f5f7a', accepted: '#2f6b3a', rejected: '#a3322a', notJudged: '#545d63', region: '#dcebf1', regionEdge: '#1f5f7a', rule: '#a9a59a', text: '#1d2327' }

/** One mark: accepted a filled circle, rejected a cross, not judged an open square, a production reading a diamond. */
function markSvg(verdict: PlotMark['verdict'], x: number, y: number): string {
  if (verdict === 'reading') return `<path d="M${fixed(x)} ${fixed(y - 5)}L${fixed(x + 5)} ${fixed(y)}L${fixed(x)} ${fixed(y + 5)}L${fixed(x - 5)} ${fixed(y)}Z" fill="#ffffff" stroke="${ink.reading}" stroke-width="1.5"/>`
  if (verdict === 'accepted') return `<circle cx="${fixed(x)}" cy="${fixed(y)}" r="4.5" fill="${ink.accepted}" stroke="${ink.accepted}"/>`
  if (verdict === 'rejected') {
    return `<path d="M${fixed(x - 4.5)} ${fixed(y - 4.5)}L${fixed(x + 4.5)} ${fixed(y + 4.5)}M${fixed(x - 4.5)} ${fixed(y + 4.5)}L${fixed(x + 4.5)} ${fixed(y - 4.5)}" stroke="${ink.rejected}" stroke-width="2.2" fill="none"/>`
  }
  return `<rect x="${fixed(x - 4)}" y="${fixed(y - 4)}" width="8" height="8" fill="#ffffff" stroke="${ink.notJudged}" stroke-width="1.5"/>`
}

/**
 * The plot as a self-contained SVG (the page shows it and the trial sheet prints it with pdfmake's svg support), drawn
 * from plotData only: axes with ticks and units, the accepted region shaded with a dashed edge, each bead's mark
 * and number, and a legend naming each shape.
 */
export function plotSvg(data: PlotData, size: { width: number, height: number } = { width: 520, height: 340 }): string {
  const m = { left: 52, right: 14, top: 34, bottom: 40 }
  const w = size.width - m.left - m.right
  const h = size.height - m.top - m.bottom
  const sx = (v: number) => m.left + ((v - data.x.min) / (data.x.max - data.x.min)) * w
  const sy = (v: number) => m.top + h - ((v - data.y.min) / (data.y.max - data.y.min)) * h
  const parts: string[] = []
  const title = data.view === 'wire-feed' ? 'Beads by voltage and wire feed speed' : 'Beads by voltage and CTWD'
  parts.push(`<svg xmlns="http://www.w3.org/2000/svg" width="${size.width}" height="${size.height}" viewBox="0 0 ${size.width} ${size.height}" font-family="Source Sans 3, sans-serif" font-size="11">`)
  parts.push(`<title>${escapeXml(title)}</title>`)
  parts.push(`<rect x="${m.left}" y="${m.top}" width="${w}" height="${h}" fill="#ffffff" stroke="${ink.rule}"/>`)
  for (const t of data.x.ticks) {
    parts.push(`<line x1="${fixed(sx(t))}" y1="${m.top}" x2="${fixed(sx(t))}" y2="${m.top + h}" stroke="#eceae3"/>`)
    parts.push(`<text x="${fixed(sx(t))}" y="${m.top + h + 14}" text-anchor="middle" fill="${ink.text}">${fixed(t)}</text>`)
  }
  for (const t of data.y.ticks) {
    parts.push(`<line x1="${m.left}" y1="${fixed(sy(t))}" x2="${m.left + w}" y2="${fixed(sy(t))}" stroke="#eceae3"/>`)
    parts.push(`<text x="${m.left - 5}" y="${fixed(sy(t) + 4)}" text-anchor="end" fill="${ink.text}">${fixed(t)}</text>`)
  }
  parts.push(`<text x="${m.left + w / 2}" y="${size.height - 6}" text-anchor="middle" fill="${ink.text}">${escapeXml(data.x.label)}</text>`)
  parts.push(`<text x="12" y="${m.top + h / 2}" text-anchor="middle" fill="${ink.text}" transform="rotate(-90 12 ${m.top + h / 2})">${escapeXml(data.y.label)}</text>`)
  if (data.region.length >= 3) {
    parts.push(`<polygon points="${data.region.map(p => `${fixed(sx(p.x))},${fixed(sy(p.y))}`).join(' ')}" fill="${ink.region}" fill-opacity="0.8" stroke="${ink.regionEdge}" stroke-width="1.5" stroke-dasharray="5 3"/>`)
  }
  else if (data.region.length === 2) {
    const [a, b] = data.region as [PlanePoint, PlanePoint]
    parts.push(`<line x1="${fixed(sx(a.x))}" y1="${fixed(sy(a.y))}" x2="${fixed(sx(b.x))}" y2="${fixed(sy(b.y))}" stroke="${ink.regionEdge}" stroke-width="6" stroke-opacity="0.35"/>`)
  }
  // Beads at the same settings share one place: every mark is drawn, their numbers once, together ("1, 8, 9").
  const places = new Map<string, PlotMark[]>()
  for (const mark of data.marks) places.set(`${mark.x}|${mark.y}`, [...(places.get(`${mark.x}|${mark.y}`) ?? []), mark])
  for (const group of places.values()) {
    const { x, y } = group[0]!
    for (const mark of group) parts.push(markSvg(mark.verdict, sx(x), sy(y)))
    const nearRight = sx(x) > m.left + w * 0.85
    parts.push(`<text x="${fixed(sx(x) + (nearRight ? -6 : 6))}" y="${fixed(sy(y) - 5)}" text-anchor="${nearRight ? 'end' : 'start'}" fill="${ink.text}" font-size="10">${escapeXml(group.map(g => g.label).join(', '))}</text>`)
  }
  // Legend: each shape with its word.
  const legend: [PlotMark['verdict'], string][] = [['accepted', 'accepted'], ['rejected', 'rejected'], ['not-judged', 'not judged']]
  if (data.marks.some(mark => mark.verdict === 'reading')) legend.push(['reading', 'reading'])
  let lx = m.left
  for (const [verdict, word] of legend) {
    parts.push(markSvg(verdict, lx + 5, 16))
    parts.push(`<text x="${lx + 14}" y="20" fill="${ink.text}">${word}</text>`)
    lx += 14 + word.length * 6 + 16
  }
  parts.push(`<rect x="${lx}" y="10" width="14" height="12" fill="${ink.region}" stroke="${ink.regionEdge}" stroke-dasharray="4 2"/>`)
  parts.push(`<text x="${lx + 18}" y="20" fill="${ink.text}">accepted region</text>`)
  parts.push('</svg>')
  return parts.join('')
}
