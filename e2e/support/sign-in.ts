import { expect, type Page } from '@playwright/test'

/** Signs in through the form, once the page is interactive. */
export async function signIn(page: Page, email: string, password = 'rootface-demo') {
  await page.goto('/sign-in')
  await expect(page.getByRole('button', { name: 'Sign in' })).toBeEnabled()
  await page.getByLabel('E-mail').fill(email)
  await page.getByLabel('Password').fill(password)
  await page.getByRole('button', { name: 'Sign in' }).click()
}
