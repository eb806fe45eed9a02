import { expect, test } from '@playwright/test'
import { signIn } from './support/sign-in'

test('the supervisor drafts a short-circuit GMAW sheet WPS from PQR-K101, fixes a value out of support, approves it, and an inspector reads it', async ({ page }) => {
  await signIn(page, 'supervisor@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/procedures')
  await page.getByRole('link', { name: 'New procedure' }).click()
  await expect(page.getByRole('heading', { level: 1 })).toHaveText('New procedure (WPS)')
  await expect(page.getByRole('button', { name: 'Fill from PQR-K101' })).toBeVisible()

  await page.getByLabel('WPS number').fill('KB-W07')
  await page.getByLabel('Title').fill('GMAW short-circuit, 10 gauge sheet, square groove')
  await page.getByRole('button', { name: 'Fill from PQR-K101' }).click()
  await expect(page.getByLabel('Edition')).toHaveValue('2019')
  await expect(page.getByLabel('Transfer mode')).toHaveValue('short-circuit')
  // What PQR-K101 qualifies fills the groove range: 1/16 in to 1.1T (ASME BPVC IX-2019, Table QW-451.1 and QW-403.10).
  await expect(page.getByLabel('Groove welds, base metal, from')).toHaveValue('0.0625')
  await expect(page.getByTestId('support-verdict')).toHaveText(/Within support/)

  await page.getByLabel('Joint type').fill('butt')
  await page.getByLabel('Specification', { exact: true }).fill('SFA-5.18')
  await page.getByLabel('Classification', { exact: true }).fill('ER70S-6')
  await page.getByLabel('Diameter', { exact: true }).fill('0.035')
  await page.getByRole('group', { name: 'Voltage: how the window is written' }).getByRole('button', { name: '± trim' }).click()
  await page.getByLabel('Voltage set point').fill('18.2')
  await page.getByLabel('Voltage trim').fill('1')
  await expect(page.getByTestId('window-layers.0.volts')).toContainText('= 17.2 to 19.2 V')
  await page.getByLabel('Amperage minimum').fill('95')
  await page.getByLabel('Amperage maximum').fill('135')

  // A quarter-inch maximum is outside what the 10 gauge coupon qualifies: the clause shows beside the value.
  await page.getByLabel('Groove welds, base metal, to').fill('0.25')
  const note = page.getByTestId('range-thickness.groove').getByTestId('support-note')
  await expect(note).toContainText('QW-403.8, QW-451.1')
  await expect(note).toContainText('outside what the PQRs qualify')
  await expect(page.getByTestId('support-verdict')).toHaveText(/1 outside support/)

  // Fixed by the sheet gauge: 10 ga sheet steel is 0.1345 in (Manufacturers' Standard Gauge).
  await page.getByLabel('Sheet gauge, thickest').selectOption('10')
  await expect(page.getByLabel('Groove welds, base metal, to')).toHaveValue('0.1345')
  await expect(note).toHaveCount(0)
  await expect(page.getByTestId('support-verdict')).toHaveText(/Within support/)

  await page.getByRole('button', { name: 'Save draft' }).click()
  await expect(page).toHaveURL(/\/procedures\/\d+$/)
  await expect(page.getByRole('heading', { level: 1 })).toContainText('KB-W07 rev. 0')
  await expect(page.getByRole('heading', { level: 1 })).toContainText('draft')
  await page.getByRole('button', { name: 'Approve and sign' }).click()
  await expect(page.getByRole('dialog', { name: 'Approve and sign this WPS' })).toContainText('KB-W07 rev. 0')
  await page.getByRole('dialog').getByRole('button', { name: 'Sign' }).click()
  await expect(page.getByRole('heading', { level: 1 })).toContainText('approved')
  await expect(page.getByText('current revision')).toBeVisible()
  await expect(page.getByText(/approved by Maren Oduya/)).toBeVisible()
  await expect(page.getByText('18.2 V ± 1 V (17.2 to 19.2 V)')).toBeVisible()

  await page.context().clearCookies()
  await signIn(page, 'inspector@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/procedures?q=KB-W07')
  await page.getByRole('link', { name: 'KB-W07 rev. 0' }).click()
  await expect(page.getByRole('heading', { level: 1 })).toContainText('approved')
  await expect(page.getByText('0.0625 to 0.1345 in')).toBeVisible()
  await expect(page.getByText(/approved by Maren Oduya/)).toBeVisible()
  await expect(page.getByTestId('support-verdict')).toHaveText(/Within support/)
  await expect(page.getByRole('button', { name: 'Approve and sign' })).toHaveCount(0)
  await expect(page.getByTestId('caution').first()).toBeVisible()
})

test('an inspector checks production readings against an approved WPS', async ({ page }) => {
  await signIn(page, 'inspector@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/procedures?q=KB-W01')
  await page.getByRole('link', { name: 'KB-W01 rev. 0' }).click()
  await page.getByLabel('Voltage').fill('21')
  await page.getByLabel('Current').fill('120')
  await page.getByLabel('Travel speed').fill('14')
  await page.getByRole('button', { name: 'Check readings' }).click()
  const result = page.getByTestId('reading-result')
  await expect(result).toContainText('Outside the WPS window')
  await expect(result).toContainText('Arc voltage 21 V is outside the WPS window (17 to 19.5 V)')
  // ASME BPVC IX QW-409.1(a): 21 V × 120 A × 60 / 14 in/min = 10800 J/in.
  await expect(result).toContainText('= 10800 J/in')
})

test('the supervisor records a PQR coupon; the inspector records its results and certifies them', async ({ page }) => {
  await signIn(page, 'supervisor@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/pqrs')
  await page.getByRole('link', { name: 'New PQR' }).click()
  await expect(page.getByRole('heading', { level: 1 })).toHaveText('New PQR')
  await expect(page.getByLabel('Base metal A')).toContainText('SA-516 70')
  await page.getByLabel('PQR number').fill('PQR-K120')
  await page.getByTestId('pqr-layer-0').getByLabel('Process').selectOption('SMAW')
  await page.getByLabel('Transfer mode').selectOption('')
  await page.getByLabel('Coupon thickness').fill('0.375')
  await page.getByLabel('Base metal A').selectOption({ label: 'SA-516 70 · P-No. 1 Gr. 2 · min 70000 psi' })
  await page.getByLabel('Filler metal').selectOption({ label: 'SFA-5.1 E7018 · F-No. 4' })
  await page.getByRole('button', { name: 'Save PQR' }).click()
  await expect(page).toHaveURL(/\/pqrs\/\d+$/)
  // ASME BPVC IX, Table QW-451.1: T from 1/16 to 3/8 in inclusive qualifies 1/16 in to 2T = 0.75 in.
  await expect(page.getByTestId('pqr-qualifies')).toContainText('Base metal 0.0625 in to 0.75 in')
  const address = page.url()

  await page.context().clearCookies()
  await signIn(page, 'inspector@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto(address)
  for (const n of [0, 1]) {
    await page.getByRole('button', { name: 'Add a tensile specimen' }).click()
    await page.locator(`#f-tensile-${n}-width`).fill('0.75')
    await page.locator(`#f-tensile-${n}-thickness`).fill('0.375')
    await page.locator(`#f-tensile-${n}-load`).fill('22500')
  }
  // 22500 lbf / (0.75 in × 0.375 in) = 80000 psi, not less than SA-516 70's 70000 psi (QW-153.1).
  await expect(page.getByText('80000 psi against the specified minimum of 70000 psi: accepted').first()).toBeVisible()
  for (const type of ['face', 'face', 'root', 'root']) {
    await page.getByRole('button', { name: 'Add a bend specimen' }).click()
    await page.locator('select[id^="f-bends-"][id$="-type"]').last().selectOption(type)
  }
  await page.getByRole('button', { name: 'Save results' }).click()
  await expect(page.getByRole('cell', { name: '80000 psi' }).first()).toBeVisible()
  await page.getByRole('button', { name: 'Certify results' }).click()
  await page.getByRole('dialog').getByRole('button', { name: 'Sign' }).click()
  await expect(page.getByRole('heading', { level: 1 })).toContainText('certified')
  await expect(page.getByText(/certified by Tobias Lindqvist-Hale/)).toBeVisible()
  await expect(page.getByRole('button', { name: 'Save results' })).toHaveCount(0)
})
