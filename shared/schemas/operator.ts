import { z } from 'zod'

/**
 * A welding operator's own essential variables as tested (ASME IX QW-361.1, QW-361.2; a form such as QW-484B).
 * Process, backing, form, weld and positions are the coupon's own fields of the welder test.
 */
export const operatorVariablesSchema = z.object({
  mode: z.enum(['machine', 'automatic'], { errorMap: () => ({ message: 'Machine or automatic' }) }),
  visualControl: z.enum(['direct', 'remote'], { errorMap: () => ({ message: 'Direct or remote visual control' }) }),
  arcVoltageControl: z.boolean().default(false),
  jointTracking: z.boolean().default(false),
  consumableInserts: z.boolean().default(false),
  passesPerSide: z.enum(['single', 'multiple'], { errorMap: () => ({ message: 'Single or multiple passes per side' }) }),
})
export type OperatorVariables = z.infer<typeof operatorVariablesSchema>

export const operatorWords = {
  mode: { machine: 'Machine', automatic: 'Automatic' },
  visualControl: { direct: 'Direct', remote: 'Remote' },
  passesPerSide: { single: 'Single pass per side', multiple: 'Multiple passes per side' },
} as const
