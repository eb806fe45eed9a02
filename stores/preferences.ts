import type { Unit } from '#shared/rules/types'

/**
 * The user's own settings that hold across pages: the unit system they enter lengths in.
 * Kept in a cookie so a server-rendered page starts in the same unit as the browser left it.
 */
export const usePreferencesStore = defineStore('preferences', () => {
  const unitCookie = useCookie<Unit>('rootface-unit', { default: () => 'in', sameSite: 'lax', maxAge: 60 * 60 * 24 * 365 })
  const unit = computed<Unit>({
    get: () => (unitCookie.value === 'mm' ? 'mm' : 'in'),
    set: (value) => {
      unitCookie.value = value
    },
  })
  return { unit }
})
