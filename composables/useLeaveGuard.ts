import type { MaybeRefOrGetter, WatchSource } from 'vue'

export const leaveQuestion = 'Leave this page? What you typed in this form is not saved.'

/**
 * Warns before a form with unsaved changes is left: by a link or menu item (the router asks first) or by closing or
 * reloading the tab (the browser's own question). `release()` lets a save navigate away; a change after it arms the
 * guard again, so a save the server refused still warns.
 */
export function useLeaveGuard(dirty: MaybeRefOrGetter<boolean>, changes?: WatchSource | object) {
  const released = ref(false)
  const unsaved = () => !released.value && toValue(dirty)
  if (changes) {
    watch(changes as WatchSource, () => {
      released.value = false
    }, { deep: true })
  }
  onBeforeRouteLeave(() => {
    if (unsaved() && !window.confirm(leaveQuestion)) return false
  })
  const onUnload = (event: BeforeUnloadEvent) => {
    if (!unsaved()) return
    event.preventDefault()
    event.returnValue = ''
  }
  onMounted(() => window.addEventListener('beforeunload', onUnload))
  onBeforeUnmount(() => window.removeEventListener('beforeunload', onUnload))
  const release = () => {
    released.value = true
  }
  return { release }
}
