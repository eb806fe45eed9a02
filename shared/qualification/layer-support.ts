import { supportCheck, type SupportCheck, type SupportFinding, type SupportPqr } from './procedure-support'
import type { ProcedureDraft } from '../schemas/procedure'
import { isIsoProcedureCode } from '../vocabulary/records'
import { isoSupportCheck } from './iso-procedure-support'

const layerFields: Record<string, string> = { 'process': 'process', 'transfer': 'transfer', 'depositMax': 'depositMax', 'electrical.heatInputMax': 'heatInputMax', 'fillers': 'fillers' }

/**
 * Each layer of a WPS checked against the PQRs (QW-200.4: a WPS may combine processes qualified on one PQR or on
 * several): its process, transfer, deposit, heat input and filler against every PQR process; the coupon thickness,
 * toughness and base metals once for the whole WPS. A finding about a layer names the layer and its form field.
 */
export function layeredSupport(draft: Pick<ProcedureDraft, 'code' | 'edition' | 'unit' | 'thickness' | 'toughnessRequired' | 'baseMetals' | 'layers'> & Partial<Pick<ProcedureDraft, 'diameter' | 'preheatMin' | 'interpassMax' | 'pwht' | 'positions'>>, pqrs: SupportPqr[]): SupportCheck {
  // ISO 15609-1 / ISO 15614-1: the WPS is compared whole against each WPQR (its processes in order, clause 8.4.1).
  if (isIsoProcedureCode(draft.code)) return isoSupportCheck(draft, pqrs)
  const runs = draft.layers.map((layer, i) => ({ layer, i, check: supportCheck({
    code: draft.code, edition: draft.edition, unit: draft.unit, process: layer.process, transfer: layer.transfer, thickness: draft.thickness,
    depositMax: layer.depositMax, toughnessRequired: draft.toughnessRequired, baseMetals: draft.baseMetals, fillers: layer.fillers,
    electrical: { heatInputMax: layer.heatInputMax }, preheatMin: draft.preheatMin, pwht: draft.pwht, positions: draft.positions,
  }, pqrs) }))
  const first = runs[0]!.check
  const findings: SupportFinding[] = []
  const seen = new Set<string>()
  for (const { layer, i, check } of runs) {
    for (const f of check.findings) {
      const onLayer = f.field !== null && f.field in layerFields
      const text = onLayer && runs.length > 1 ? `${layer.name} (${layer.process}): ${f.text}` : f.text
      const key = `${f.clause}|${text}`
      if (seen.has(key)) continue
      seen.add(key)
      findings.push({ ...f, text, field: onLayer ? `layers.${i}.${layerFields[f.field!]}` : f.field })
    }
  }
  const violations = findings.filter(f => !f.met)
  const checked = runs.every(r => r.check.checked)
  return {
    ...first, checked, supported: checked && violations.length === 0 && runs.every(r => r.check.supported || r.check.violations.length === 0),
    findings, violations, blockers: [...new Set(runs.flatMap(r => r.check.blockers))],
  }
}
