import { prequalifiedCheck, type PrequalifiedResult } from '../rules/aws-d1.1/prequalified'
import type { ProcedureDraft } from '../schemas/procedure'

export type { PrequalifiedItem, PrequalifiedResult, PrequalifiedState } from '../rules/aws-d1.1/prequalified'

/** A catalogue base metal as the check needs it. */
export interface CatalogueBaseMetal {
  id: number
  specification: string
  grade: string
}

type DraftPart = Pick<ProcedureDraft, 'code' | 'edition' | 'unit' | 'baseMetals' | 'thickness' | 'preheatMin' | 'positions' | 'joints' | 'layers'> & { prequalified?: boolean }

/**
 * The prequalification check of a WPS draft (AWS D1.1 only; null for any other code or a WPS not marked prequalified).
 * Base metals are read from the catalogue by id; one not picked from the catalogue is "cannot tell".
 */
export function prequalifiedOfDraft(draft: DraftPart, catalogue: readonly CatalogueBaseMetal[]): PrequalifiedResult | null {
  if (!draft.prequalified || draft.code !== 'aws-d1.1') return null
  const side = (id: number | null | undefined) => {
    const m = id ? catalogue.find(b => b.id === id) : undefined
    return { specification: m?.specification ?? null, grade: m?.grade ?? null }
  }
  const groove = draft.thickness?.groove ?? { min: null, max: null }
  const fillet = draft.thickness?.fillet ?? { min: null, max: null }
  const maxOf = [groove.max, fillet.max].filter((v): v is number => typeof v === 'number')
  const minOf = [groove.min, fillet.min].filter((v): v is number => typeof v === 'number')
  return prequalifiedCheck({
    layers: (draft.layers ?? []).map(l => ({
      name: l.name, process: l.process, transfer: l.transfer,
      fillers: (l.fillers ?? []).map(f => ({ classification: f.classification ?? '', size: f.size })), fluxClassification: l.flux?.classification ?? null,
    })),
    baseMetals: [side(draft.baseMetals?.a?.baseMetalId), side(draft.baseMetals?.b?.baseMetalId)],
    // The thickest part the WPS allows sets the preheat: the larger of its groove and fillet maxima.
    thickness: { min: minOf.length ? Math.min(...minOf) : null, max: maxOf.length ? Math.max(...maxOf) : null },
    preheatMin: draft.preheatMin ?? null,
    positions: draft.positions ?? [],
    joint: {
      designation: draft.joints?.designation ?? null, rootOpening: draft.joints?.rootOpening ?? {}, grooveAngle: draft.joints?.grooveAngle ?? null,
      rootFace: draft.joints?.rootFace ?? {},
    },
  }, { edition: draft.edition, unit: draft.unit })
}
