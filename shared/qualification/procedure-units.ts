import type { Unit } from '../rules/types'

/** The units a WPS record prints its values in: inch records use in, in/min, ft³/h, J/in and °F; millimetre records mm, mm/min, L/min, J/mm and °C. */
export function unitLabels(unit: Unit) {
  return unit === 'in'
    ? { length: 'in', speed: 'in/min', flow: 'ft³/h', heat: 'J/in', temperature: '°F', stress: 'psi', force: 'lbf' }
    : { length: 'mm', speed: 'mm/min', flow: 'L/min', heat: 'J/mm', temperature: '°C', stress: 'MPa', force: 'N' }
}

export type Dimension = 'length' | 'speed' | 'flow' | 'heat' | 'temperature'

const window3 = (p: string, d: Dimension) => ['min', 'max', 'setPoint'].map(k => [`${p}.${k}`, d] as [string, Dimension])

/** Every numeric path of a WPS draft outside its layers that carries a unit, with its dimension. */
export const unitPaths: [string, Dimension][] = [
  ...['thickness.groove', 'thickness.fillet', 'diameter', 'joints.rootOpening', 'joints.rootFace']
    .flatMap(p => [[`${p}.min`, 'length'], [`${p}.max`, 'length']] as [string, Dimension][]),
  ['preheatMin', 'temperature'],
  ['interpassMax', 'temperature'],
  ['pwht.temperature.min', 'temperature'],
  ['pwht.temperature.max', 'temperature'],
]

/** The numeric paths of one process layer that carry a unit, relative to the layer. */
export const layerUnitPaths: [string, Dimension][] = [
  ['depositMax', 'length'], ['tungsten.size', 'length'],
  ...window3('ctwd', 'length'), ...window3('wireFeed', 'speed'), ...window3('travelSpeed', 'speed'),
  ...window3('gas.flow', 'flow'), ...window3('backingGas.flow', 'flow'),
  ['heatInputMax', 'heat'],
]

/** Every unit-carrying path of a draft, its layers and their fillers' sizes included. */
export function unitPathsOf(draft: { layers?: { fillers?: unknown[] }[] }): [string, Dimension][] {
  const layers = Array.isArray(draft.layers) ? draft.layers : []
  return [
    ...unitPaths,
    ...layers.flatMap((layer, i) => [
      ...layerUnitPaths.map(([p, d]) => [`layers.${i}.${p}`, d] as [string, Dimension]),
      ...(Array.isArray(layer?.fillers) ? layer.fillers : []).map((_, j) => [`layers.${i}.fillers.${j}.size`, 'length'] as [string, Dimension]),
    ]),
  ]
}

// 1 in = 25.4 mm and 1 ft³ = 28.316846592 L, both exact by definition.
const FT3_PER_H_IN_L_PER_MIN = 28.316846592 / 60

const round = (value: number, places: number) => Math.round(value * 10 ** places) / 10 ** places

/** One value from one unit system to the other; lengths and flows exactly, to 1e-9 of the target unit. */
export function convertValue(value: number, dimension: Dimension, from: Unit, to: Unit): number {
  if (from === to) return value
  const toMm = from === 'in'
  switch (dimension) {
    case 'length':
    case 'speed': return round(toMm ? value * 25.4 : value / 25.4, 9)
    case 'flow': return round(toMm ? value * FT3_PER_H_IN_L_PER_MIN : value / FT3_PER_H_IN_L_PER_MIN, 9)
    case 'heat': return round(toMm ? value / 25.4 : value * 25.4, 9)
    case 'temperature': return round(toMm ? ((value - 32) * 5) / 9 : (value * 9) / 5 + 32, 6)
  }
}

type Tree = Record<string, unknown>

export function getPath(tree: Tree, path: string): unknown {
  return path.split('.').reduce<unknown>((node, key) => (node && typeof node === 'object' ? (node as Tree)[key] : undefined), tree)
}

function setPath(tree: Tree, path: string, value: unknown) {
  const keys = path.split('.')
  let node = tree
  for (const key of keys.slice(0, -1)) {
    if (!node[key] || typeof node[key] !== 'object') node[key] = {}
    node = node[key] as Tree
  }
  node[keys[keys.length - 1]!] = value
}

/** A copy of the draft in the other unit system; values left empty stay empty. */
export function convertDraft<T extends Tree>(draft: T, from: Unit, to: Unit): T {
  const copy = structuredClone(draft) as Tree
  for (const [path, dimension] of unitPathsOf(copy as { layers?: { fillers?: unknown[] }[] })) {
    const value = getPath(copy, path)
    if (typeof value === 'number' && Number.isFinite(value)) setPath(copy, path, convertValue(value, dimension, from, to))
  }
  copy.unit = to
  return copy as T
}
