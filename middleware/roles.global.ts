// Client-side routing by role, for the user's convenience only: every API route checks the role again.
declare module '#app' {
  interface PageMeta {
    roles?: readonly Role[]
  }
}

export default defineNuxtRouteMiddleware((to) => {
  const { data } = useAuth()
  const role = data.value?.user?.role
  if (!role || !isRole(role)) return
  if (to.path === '/') return navigateTo(roleHome[role], { replace: true })
  const allowed = to.meta.roles
  if (allowed && !allowed.includes(role)) return navigateTo(roleHome[role], { replace: true })
})
