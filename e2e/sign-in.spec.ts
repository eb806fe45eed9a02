import { expect, test } from '@playwright/test'
import { signIn } from './support/sign-in'

const roles = [
  { email: 'supervisor@demo.rootface.test', lands: '/dashboard', badge: 'Quality manager', nav: ['Procedures', 'Roster', 'Projects'], heading: 'Dashboard' },
  { email: 'inspector@demo.rootface.test', lands: '/dashboard', badge: 'Inspector', nav: ['Welder tests', 'Continuity log'], heading: 'Dashboard' },
  { email: 'welder@demo.rootface.test', lands: '/me', badge: 'Welder', nav: ['My qualifications'], heading: 'Ines Carvalho' },
  { email: 'auditor@demo.rootface.test', lands: '/projects', badge: 'Auditor', nav: ['My projects', 'Verify a sheet'], heading: 'My projects' },
]

for (const role of roles) {
  test(`${role.badge} signs in and lands in their own layout`, async ({ page }) => {
    await signIn(page, role.email)
    await expect(page).toHaveURL(new RegExp(`${role.lands}$`))
    await expect(page.getByText(role.badge, { exact: true })).toBeVisible()
    await expect(page.getByRole('heading', { level: 1 })).toHaveText(role.heading)
    const nav = page.getByRole('navigation', { name: 'Main' }).first()
    for (const item of role.nav) await expect(nav.getByRole('link', { name: item })).toBeVisible()
  })
}

test('the auditor is sent away from the roster', async ({ page }) => {
  await signIn(page, 'auditor@demo.rootface.test')
  await expect(page).toHaveURL(/\/projects$/)
  await page.goto('/welders')
  await expect(page).toHaveURL(/\/projects$/)
  await expect(page.getByRole('cell', { name: 'KB-2611' })).toBeVisible()
  await expect(page.getByRole('cell', { name: 'KB-2615' })).toHaveCount(0)
})

test('a wrong password gets a plain message', async ({ page }) => {
  await signIn(page, 'supervisor@demo.rootface.test', 'not-the-password')
  await expect(page.getByRole('alert')).toHaveText('That e-mail and password do not match an active account.')
  await expect(page).toHaveURL(/\/sign-in/)
})

test('signed out, a page sends you to sign in', async ({ page }) => {
  await page.goto('/welders')
  await expect(page).toHaveURL(/\/sign-in/)
})

test('the welder page reads on a phone', async ({ page }) => {
  await page.setViewportSize({ width: 375, height: 740 })
  await signIn(page, 'welder@demo.rootface.test')
  await expect(page.getByRole('list', { name: 'My processes' })).toBeVisible()
  await expect(page.getByText('GMAW', { exact: true }).first()).toBeVisible()
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth)
  expect(overflow).toBe(false)
})
