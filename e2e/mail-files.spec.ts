import { expect, test } from '@playwright/test'
import { signIn } from './support/sign-in'

// Issue 7 in the browser: an invitation from the Accounts page sits in the outbox (this server has no SMTP_URL, so
// nothing is sent and nothing is lost), its link sets a password and signs in once; files on a PQR are checked by content.

const pdf = Buffer.from('%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[3 0 R]/Count 1>>endobj\n3 0 obj<</Type/Page/Parent 2 0 R/MediaBox[0 0 612 792]>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n', 'latin1')
const png = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==', 'base64')

test('a quality manager invites an inspector; the link from the outbox sets a password once', async ({ page, browser }) => {
  await signIn(page, 'supervisor@demo.rootface.test')
  await page.getByRole('link', { name: 'Accounts' }).first().click()
  await page.getByRole('link', { name: 'Invite someone' }).click()
  await page.getByLabel('Inspector').check()
  await page.getByLabel('Name').fill('Jonas Whitcombe')
  await page.getByLabel('E-mail').fill('j.whitcombe@kestrelbend.test')
  await page.getByRole('button', { name: 'Send the invitation' }).click()
  await expect(page.getByRole('heading', { name: /Jonas Whitcombe/ })).toContainText('Invited')

  await page.goto('/mail')
  await expect(page.getByText('No SMTP server set')).toBeVisible()
  await page.getByRole('button', { name: 'Your Rootface account at Kestrel Bend Fabrication' }).click()
  const body = await page.getByTestId('mail-message').locator('pre').innerText()
  const link = /http:\/\/\S+\/set-password\?token=[\w-]{43}/.exec(body)?.[0]
  expect(link).toBeTruthy()

  const visitor = await browser.newPage()
  await visitor.goto(link!)
  await expect(visitor.getByRole('heading', { name: 'Welcome, Jonas Whitcombe' })).toBeVisible()
  await visitor.getByLabel('New password').fill('short')
  await visitor.getByLabel('The same again').fill('short')
  await visitor.getByRole('button', { name: 'Save the password' }).click()
  await expect(visitor.getByText('At least 10 characters').first()).toBeVisible()
  await visitor.getByLabel('New password').fill('inspects every root pass')
  await visitor.getByLabel('The same again').fill('inspects every root pass')
  await visitor.getByRole('button', { name: 'Save the password' }).click()
  await expect(visitor.getByText('Inspector', { exact: true })).toBeVisible()
  await expect(visitor.getByTestId('signed-in-as')).toHaveText('Jonas Whitcombe')

  const again = await browser.newPage()
  await again.goto(link!)
  await expect(again.getByRole('heading', { name: 'This link does not work' })).toBeVisible()
  await expect(again.getByText('already been used')).toBeVisible()
})

test('a lab report goes on a PQR; a file whose content is not what its name says is refused', async ({ page }) => {
  await signIn(page, 'inspector@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/pqrs')
  await page.getByRole('link', { name: 'PQR-K101' }).first().click()
  const files = page.getByTestId('attachments')
  await expect(files).toContainText('No files yet.')
  await files.getByLabel('Kind').selectOption('lab-report')
  await files.locator('input[type=file]').setInputFiles({ name: 'LAB-24-0871.pdf', mimeType: 'application/pdf', buffer: pdf })
  await files.getByRole('button', { name: 'Add file' }).click()
  await expect(files.getByRole('link', { name: 'LAB-24-0871.pdf' })).toBeVisible()
  await expect(files).toContainText('Lab report · PDF')

  await files.locator('input[type=file]').setInputFiles({ name: 'tensile.pdf', mimeType: 'application/pdf', buffer: png })
  await files.getByRole('button', { name: 'Add file' }).click()
  await expect(files.getByRole('alert')).toHaveText('The file claims to be PDF but its content is PNG image')

  await files.locator('input[type=file]').setInputFiles({ name: 'coupon.png', mimeType: 'image/png', buffer: png })
  await files.getByRole('button', { name: 'Add file' }).click()
  await expect(files.locator('img[alt="Thumbnail of coupon.png"]')).toBeVisible()
  const download = page.waitForEvent('download')
  await files.getByRole('link', { name: 'LAB-24-0871.pdf' }).click()
  expect((await download).suggestedFilename()).toBe('LAB-24-0871.pdf')
})
