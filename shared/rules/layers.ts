import type { PqrLayer, PqrRecord, ProcessVariables, ProductionWeld, WelderTestInput, WpsDraft, WpsLayer } from './inputs'
import { refuse } from './refusal'

/** The process layers of a welder test: `processes`, or the single-process fields as one layer. */
export function testLayers(test: WelderTestInput): ProcessVariables[] {
  if (test.processes && test.processes.length > 0) return test.processes
  if (test.process === undefined) refuse('process: give the process (or processes) of the test')
  const { process, transfer, depositThickness, layers, fNumber, progression, fillerAdded, consumableInsert, fillerForm, backingGas, current, fillerType } = test
  return [strip({ process, transfer, depositThickness, layers, fNumber, progression, fillerAdded, consumableInsert, fillerForm, backingGas, current, fillerType })]
}

/** The first (or only) process of a welder test. */
export function testProcess(test: WelderTestInput): string {
  return testLayers(test)[0]!.process
}

/** One test as a single-process test of one of its layers (the coupon's other fields kept). */
export function asSingleProcess(test: WelderTestInput, layer: ProcessVariables): WelderTestInput & { process: string } {
  const { processes: _processes, ...coupon } = test
  return strip({ ...coupon, ...layer })
}

/** The production positions: `positions`, or `position` as one. */
export function productionPositions(production: ProductionWeld): string[] {
  if (production.positions && production.positions.length > 0) return production.positions
  if (production.position !== undefined) return [production.position]
  return refuse('production.position: give the production position (or positions)')
}

/** The process layers of a production weld: `processes`, or the single-process fields as one layer (none when no process is named). */
export function productionLayers(production: ProductionWeld): ProcessVariables[] {
  if (production.processes && production.processes.length > 0) return production.processes
  if (production.process === undefined) return []
  const { process, transfer, fNumber, progression, fillerAdded, consumableInsert, fillerForm, backingGas, current, fillerType } = production
  return [strip({ process, transfer, depositThickness: production.thickness, fNumber, progression, fillerAdded, consumableInsert, fillerForm, backingGas, current, fillerType })]
}

/** The process layers of a WPS draft. */
export function wpsLayers(wps: WpsDraft): WpsLayer[] {
  if (wps.layers && wps.layers.length > 0) return wps.layers
  if (wps.process === undefined) refuse('wps.process: give the process (or layers) of the WPS')
  return [strip({ process: wps.process, transfer: wps.transfer, depositMax: wps.depositMax, fNumber: wps.fNumber, heatInputMax: wps.heatInputMax })]
}

/** The process layers of a PQR. */
export function pqrLayers(pqr: PqrRecord): PqrLayer[] {
  if (pqr.layers && pqr.layers.length > 0) return pqr.layers
  if (pqr.process === undefined) refuse('pqrs: each PQR needs its process (or layers)')
  return [strip({ process: pqr.process, transfer: pqr.transfer, depositThickness: pqr.depositThickness, maxPassThickness: pqr.maxPassThickness, fNumber: pqr.fNumber, heatInput: pqr.heatInput })]
}

export function strip<T extends object>(o: T): T {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T
}
