import type { ComputedRef, InjectionKey, Ref } from 'vue'
import type { SupportFinding, SupportPqr } from '#shared/qualification/procedure-support'
import type { ProcedureDraft } from '#shared/schemas/procedure'
import type { unitLabels } from '#shared/qualification/procedure-units'
import type { Unit } from '#shared/rules/types'

export interface PqrOption {
  id: number
  number: string
  code: string
  edition: string
  unit: string
  process: string
  processes: string[]
  transfer: string | null
  couponThickness: number
  status: string
  pNumber: string | null
  groupNumber: number | null
  baseMetalId: number | null
  baseMetal: string | null
  baseGrade: string | null
  fillerMetalId: number | null
  fillerSpecification: string | null
  filler: string | null
  fNumber: string | null
  aNumber: string | null
  support: SupportPqr
  supports: SupportPqr[]
}
export interface BaseMetalOption { id: number, specification: string, grade: string, pNumber: string, groupNumber: number | null }
export interface FillerMetalOption { id: number, specification: string, classification: string, fNumber: string, aNumber: string | null }

/** What the sections of the WPS form share: the values being edited, the catalogue, the unit and the live support findings. */
export interface ProcedureFormContext {
  values: Partial<ProcedureDraft>
  setFieldValue: (path: string, value: unknown) => void
  setValues: (values: Partial<ProcedureDraft>) => void
  unit: ComputedRef<Unit>
  u: ComputedRef<ReturnType<typeof unitLabels>>
  at: (field: string) => SupportFinding[]
  errors: Ref<Partial<Record<string, string>>>
  pqrOptions: ComputedRef<PqrOption[]>
  baseMetals: Ref<BaseMetalOption[] | null | undefined>
  fillerMetals: Ref<FillerMetalOption[] | null | undefined>
}

export const procedureFormKey: InjectionKey<ProcedureFormContext> = Symbol('procedure-form')

/** The WPS form's shared state, inside one of its sections. */
export function useProcedureForm(): ProcedureFormContext {
  const context = inject(procedureFormKey)
  if (!context) throw new Error('useProcedureForm: only inside ProcedureForm')
  return context
}
