import { refuse } from '../refusal'

/** Welding processes named in ASME IX (QW-250 procedure tables, QW-350 welder tables). */
export const asmeProcesses = ['SMAW', 'GTAW', 'GMAW', 'FCAW', 'SAW', 'PAW', 'OFW', 'ESW', 'EGW', 'LLBW'] as const
export type AsmeProcess = typeof asmeProcesses[number]

export function asmeProcess(process: string): AsmeProcess {
  const found = asmeProcesses.find(p => p === process.toUpperCase())
  if (!found) refuse(`process: "${process}" is not an ASME IX process (${asmeProcesses.join(', ')})`)
  return found
}

/** GMAW with short-circuiting transfer (GMAW-S). */
export function isShortCircuit(process: string, transfer: string | undefined): boolean {
  return process.toUpperCase() === 'GMAW' && transfer === 'short-circuit'
}
