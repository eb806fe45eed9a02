import { useField } from 'vee-validate'

/**
 * One value of a vee-validate form, bound by its path ("thickness.min", "bends.0.result"), with the input id and the
 * error id the field components use. Path-bound fields live in components/form/field/.
 */
export function useFormField<T>(name: () => string) {
  const { value, errorMessage } = useField<T>(name)
  const id = computed(() => `f-${name().replace(/[^\w-]/g, '-')}`)
  const describedBy = computed(() => (errorMessage.value ? `${id.value}-error` : undefined))
  return { value, errorMessage, id, describedBy }
}

/** A text value of the form as the input shows it: '' for none; typing nothing stores null when `nullable`. */
export function useFormText(name: () => string, nullable: () => boolean | undefined) {
  const field = useFormField<string | null | undefined>(name)
  const text = computed({
    get: () => field.value.value ?? '',
    set: (v: string) => {
      field.value.value = v === '' && nullable() ? null : v
    },
  })
  return { ...field, text }
}
