import { expect, test } from '@playwright/test'
import { signIn } from './support/sign-in'

test('an auditor opens a granted project, reads a record, builds the packet with a progress bar and downloads it', async ({ page }) => {
  await signIn(page, 'auditor@demo.rootface.test')
  await expect(page).toHaveURL(/\/projects$/)
  await page.getByRole('link', { name: 'KB-2611' }).click()
  await expect(page.getByRole('heading', { name: 'KB-2611' })).toBeVisible()
  await expect(page.getByText('Read-only')).toBeVisible()
  await expect(page.getByRole('button', { name: 'Detach' })).toHaveCount(0)

  await page.getByRole('button', { name: 'Open' }).first().click()
  const dialog = page.getByRole('dialog')
  await expect(dialog.getByText('Welding procedure specification (WPS)')).toBeVisible()
  await expect(dialog.getByText('QW-403.8').first()).toBeVisible()
  await dialog.getByRole('button', { name: 'Close' }).click()

  await page.getByTestId('build-packet').click()
  await expect(page.getByRole('progressbar', { name: 'Packet build' })).toBeVisible()
  await expect(page.getByText(/Ready: \d+ pages\./)).toBeVisible({ timeout: 20_000 })
  const download = page.waitForEvent('download')
  await page.getByRole('link', { name: 'Download PDF' }).first().click()
  expect((await download).suggestedFilename()).toMatch(/^Packet-KB-2611-\d+\.pdf$/)
})

test('the verification page is public and says plainly whether a code is unchanged or unknown', async ({ page, request }) => {
  await signIn(page, 'supervisor@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  const sheet = await (await page.request.get('/api/sheets/procedures/3?format=json')).json() as { verify: { code: string } }
  await page.context().clearCookies()

  await page.goto('/verify')
  await page.getByLabel('Code on the sheet').fill(`${sheet.verify.code.slice(0, 5)}-${sheet.verify.code.slice(5)}`.toLowerCase())
  await page.getByRole('button', { name: 'Verify' }).click()
  await expect(page.getByTestId('verify-result')).toContainText('Unchanged')
  await expect(page.getByText('KB-W02')).toBeVisible()
  await expect(page.getByText('Maren Oduya')).toBeVisible()

  await page.goto('/verify/ZZZZZZZZZZ')
  await expect(page.getByTestId('verify-result')).toContainText('No sheet has this code.')
  expect((await request.get('/api/verify/ZZZZZZZZZZ')).status()).toBe(404)
})
