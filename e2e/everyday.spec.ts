import { createRequire } from 'node:module'
import { expect, test } from '@playwright/test'
import { signIn } from './support/sign-in'

type Convert = (value: number) => { from: (unit: string) => { to: (unit: string) => number } }
const convert = createRequire(import.meta.url)('convert-units') as Convert

// Lengths are typed as the trade writes them: 3/8 is three eighths of an inch (0.375), never 38; a length typed in the
// other unit is not taken as typed: the field asks first.

test('3/8 typed in the contact-tip-to-work window of a WPS is saved as 0.375 in', async ({ page }) => {
  await signIn(page, 'supervisor@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/procedures?q=KB-W05')
  await page.getByRole('link', { name: 'KB-W05 rev. 0' }).click()
  await page.getByRole('link', { name: 'Edit draft' }).click()
  await expect(page.getByRole('button', { name: 'Save draft' })).toBeEnabled()
  const ctwd = page.getByTestId('window-layers.0.ctwd')
  await ctwd.getByRole('button', { name: 'min–max' }).click()
  await page.getByLabel('Contact tip to work minimum').fill('3/8')
  await page.getByLabel('Contact tip to work maximum').fill('1/2')
  await page.getByLabel('Contact tip to work maximum').blur()
  await page.getByRole('button', { name: 'Save draft' }).click()
  await expect(page).toHaveURL(/\/procedures\/\d+$/)
  // 3/8 in = 0.375 in, 1/2 in = 0.5 in (common practice: fractions of an inch)
  await expect(page.getByText('0.375 to 0.5 in')).toBeVisible()
})

test('"2 mm" typed in an inch welder test\'s bend discontinuity asks before converting', async ({ page }) => {
  await signIn(page, 'inspector@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/tests/new')
  await expect(page.getByRole('button', { name: 'Save test' })).toBeEnabled()
  await expect(page.getByRole('combobox', { name: 'Unit of this record', exact: true })).toHaveValue('in')
  await page.getByRole('radiogroup', { name: 'Visual examination' }).getByLabel('Accepted').check()
  await page.getByRole('button', { name: 'Add bend specimen' }).click()
  const field = page.getByLabel('Specimen 1 largest open discontinuity')
  await field.fill('2 mm')
  await field.blur()
  // 2 mm in inches, rounded to 4 decimals, cross-checked with convert-units
  const inches = Math.round(convert(2).from('mm').to('in') * 10_000) / 10_000
  const question = page.getByTestId('bend-0').getByRole('alert')
  await expect(question).toContainText(`2 mm is ${inches} in; this record is in in.`)
  await expect(question.getByRole('button', { name: `Use ${inches} in` })).toBeVisible()
})

test('a welder downloads the sheet of their own test from its page, and not another welder\'s', async ({ page }) => {
  await signIn(page, 'welder@demo.rootface.test')
  await expect(page).toHaveURL(/\/me$/)
  await page.getByRole('region', { name: 'My tests' }).getByRole('link').first().click()
  await expect(page).toHaveURL(/\/tests\/\d+$/)
  const own = Number(/\/tests\/(\d+)$/.exec(page.url())![1])
  const pdf = page.getByTestId('sheet-actions').getByRole('link', { name: /PDF sheet of/ })
  await expect(pdf).toHaveAttribute('href', `/api/sheets/tests/${own}`)
  await expect(page.getByTestId('sheet-actions').getByRole('button', { name: /Print the sheet of/ })).toBeVisible()
  const mine = await page.request.get(`/api/sheets/tests/${own}`)
  expect(mine.status()).toBe(200)
  expect(mine.headers()['content-type']).toContain('application/pdf')
  // Another welder's test is not there for this welder: 404, as for a record that does not exist.
  const list = await page.request.get('/api/tests?pageSize=200')
  const ownIds = ((await list.json()) as { items: { id: number }[] }).items.map(t => t.id)
  const other = [1, 2, 3, 4, 5, 6].find(n => !ownIds.includes(n))!
  expect((await page.request.get(`/api/sheets/tests/${other}`)).status()).toBe(404)
})

test('the WPS page offers its PDF sheet and Print to an inspector', async ({ page }) => {
  await signIn(page, 'inspector@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/procedures?q=KB-W01')
  await page.getByRole('link', { name: 'KB-W01 rev. 0' }).click()
  const pdf = page.getByTestId('sheet-actions').getByRole('link', { name: 'PDF sheet of WPS KB-W01 rev. 0' })
  const href = await pdf.getAttribute('href')
  const answer = await page.request.get(href!)
  expect(answer.status()).toBe(200)
  expect(answer.headers()['content-type']).toContain('application/pdf')
})

test('"Certify result" asks first, naming the welder, stamp and what the signature means; Cancel signs nothing', async ({ page }) => {
  await signIn(page, 'inspector@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  const list = await page.request.get('/api/tests?status=recorded&pageSize=50')
  const recorded = ((await list.json()) as { items: { id: number, welderName: string, welderStamp: string }[] }).items[0]!
  await page.goto(`/tests/${recorded.id}`)
  await page.getByRole('button', { name: /Certify result/ }).click()
  const dialog = page.getByRole('dialog', { name: 'Certify this welder test' })
  await expect(dialog).toContainText(`${recorded.welderName}, stamp ${recorded.welderStamp}`)
  await expect(dialog.getByTestId('sign-meaning')).toContainText('Your signature certifies')
  await dialog.getByRole('button', { name: 'Cancel' }).click()
  await expect(dialog).toBeHidden()
  await page.reload()
  await expect(page.getByTestId('test-status')).toHaveText('○ Recorded, awaiting certification')
})

test('a half-filled WPS is not lost to a menu click: the page asks first', async ({ page }) => {
  await signIn(page, 'supervisor@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/procedures/new')
  await expect(page.getByRole('button', { name: 'Save draft' })).toBeEnabled()
  await page.getByLabel('WPS number').fill('KB-W99')
  const asked: string[] = []
  page.once('dialog', (d) => {
    asked.push(d.message())
    void d.dismiss()
  })
  await page.getByRole('link', { name: 'Roster', exact: true }).click()
  await expect.poll(() => asked.length).toBe(1)
  expect(asked[0]).toContain('not saved')
  await expect(page).toHaveURL(/\/procedures\/new$/)
  await expect(page.getByLabel('WPS number')).toHaveValue('KB-W99')
})

test('the welder\'s phone page: fewest days left first, only WPSs of processes they are current in, a copy button for the calendar address', async ({ browser }) => {
  const phone = await browser.newContext({ viewport: { width: 375, height: 800 } })
  await phone.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: test.info().project.use.baseURL! })
  const page = await phone.newPage()
  await signIn(page, 'welder@demo.rootface.test')
  await expect(page).toHaveURL(/\/me$/)
  const answer = await page.request.get('/api/me/qualifications')
  const mine = (await answer.json()) as { standings: { process: string, daysLeft: number, standing: string }[], procedures: { number: string, processes: string[] }[] }
  const days = mine.standings.map(s => s.daysLeft)
  expect(days).toEqual([...days].sort((a, b) => a - b))
  const shown = await page.locator('[data-testid^="process-"]').evaluateAll(els => els.map(e => e.getAttribute('data-testid')))
  expect(shown).toEqual(mine.standings.map(s => `process-${s.process}`))
  const current = new Set(mine.standings.filter(s => s.standing !== 'lapsed').map(s => s.process))
  // Guard the checks below: with no procedure (or no current process) they would pass on an empty answer.
  expect(current.size).toBeGreaterThan(0)
  expect(mine.procedures.length).toBeGreaterThan(0)
  for (const p of mine.procedures) {
    expect(p.processes.length).toBeGreaterThan(0)
    expect(p.processes.every(process => current.has(process)), `${p.number}: ${p.processes.join(' + ')}`).toBe(true)
  }
  await expect(page.getByTestId('my-procedure')).toHaveCount(mine.procedures.length)
  expect(await page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth)).toBe(false)

  await page.getByRole('button', { name: /subscription address/ }).first().click()
  const address = page.getByLabel('Subscription address')
  await expect(address).toHaveValue(/\/api\/me\/feed\/.+\.ics$/)
  await page.getByRole('button', { name: 'Copy address' }).click()
  await expect(page.getByRole('status').filter({ hasText: 'Copied.' })).toBeVisible()
  expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(await address.inputValue())

  // "Procedures I may use" in the menu: the same filtered list, as cards that fit the phone
  await page.getByRole('button', { name: 'Turn the subscription off' }).click()
  await page.goto('/procedures')
  await expect(page.getByRole('heading', { level: 1 })).toHaveText('Procedures I may use')
  await expect(page.getByTestId('my-procedure-card')).toHaveCount(mine.procedures.length)
  expect(await page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth)).toBe(false)
  await phone.close()
})

test('picking the WPS on a new welder test fills the code, edition, unit, processes and base metal from it', async ({ page }) => {
  await signIn(page, 'inspector@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  const list = await page.request.get('/api/procedures?q=KB-W05&pageSize=5')
  const { id } = ((await list.json()) as { items: { id: number }[] }).items[0]!
  const wps = (await (await page.request.get(`/api/procedures/${id}`)).json()) as { procedure: { code: string, edition: string, unit: string }, draft: { baseMetals: { a: { pNumber: string } }, layers: { process: string }[] } }
  await page.goto('/tests/new')
  await expect(page.getByRole('button', { name: 'Save test' })).toBeEnabled()
  await page.getByRole('combobox', { name: 'WPS followed', exact: true }).fill('KB-W05')
  await page.getByRole('option', { name: /^KB-W05 rev\./ }).first().click()
  await expect(page.getByRole('combobox', { name: 'Code', exact: true })).toHaveValue(wps.procedure.code)
  await expect(page.getByRole('combobox', { name: 'Edition', exact: true })).toHaveValue(wps.procedure.edition)
  await expect(page.getByRole('combobox', { name: 'Unit of this record', exact: true })).toHaveValue(wps.procedure.unit)
  await expect(page.getByRole('combobox', { name: 'Process 1', exact: true })).toHaveValue(wps.draft.layers[0]!.process)
  await expect(page.getByLabel('Base metal P-No.')).toHaveValue(wps.draft.baseMetals.a.pNumber)
})

test('a CSV chosen again under the same name after a fix is read again; a row error names the line, column and value', async ({ page }) => {
  await signIn(page, 'inspector@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/continuity/import')
  const input = page.locator('input[type=file]')
  await expect(input).toBeEnabled()
  const day = new Date(Date.now() - 86_400_000).toISOString().slice(0, 10)
  const choose = async (body: string) => {
    const chooser = page.waitForEvent('filechooser')
    await input.click()
    await (await chooser).setFiles({ name: 'shift.csv', mimeType: 'text/csv', buffer: Buffer.from(body) })
  }
  await choose(`stamp,process,date,reference\nKB-01,SMAW,31/12/2025,e2e import\n`)
  const errors = page.getByRole('table', { name: 'Row errors' })
  const row = errors.getByRole('row').nth(1)
  await expect(row).toContainText('2')
  await expect(row).toContainText('date')
  await expect(row).toContainText('31/12/2025')
  await expect(row).not.toContainText('weldedOn')
  await choose(`stamp,process,date,reference\nKB-01,SMAW,${day},e2e import\n`)
  await expect(errors).toHaveCount(0)
  await expect(page.getByRole('button', { name: 'Import 1 entries' })).toBeEnabled()
})

test('the sheet gauge picker clears when the thickness is typed by hand', async ({ page }) => {
  await signIn(page, 'supervisor@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/procedures/new')
  await expect(page.getByRole('button', { name: 'Save draft' })).toBeEnabled()
  await page.getByRole('combobox', { name: 'Add a supporting PQR' }).fill('PQR-K')
  await page.getByRole('listbox', { name: 'Add a supporting PQR' }).getByRole('option').first().click()
  await page.getByRole('button', { name: /^Fill from PQR-/ }).first().click()
  const gauge = page.getByLabel('Sheet gauge, thickest')
  await gauge.selectOption('10')
  // 10 ga sheet steel is 0.1345 in (Manufacturers' Standard Gauge, common practice)
  await expect(page.getByLabel('Groove welds, base metal, to')).toHaveValue('0.1345')
  await page.getByLabel('Groove welds, base metal, to').fill('1/4')
  await expect(gauge).toHaveValue('')
})

test('words on screen: readings out of window say what to do next; the test page names the code in words', async ({ page }) => {
  await signIn(page, 'inspector@demo.rootface.test')
  await expect(page).toHaveURL(/\/dashboard$/)
  await page.goto('/procedures?q=KB-W01')
  await page.getByRole('link', { name: 'KB-W01 rev. 0' }).click()
  await page.getByLabel('Voltage').fill('40')
  await page.getByLabel('Current').fill('120')
  await page.getByLabel('Travel speed').fill('14')
  await page.getByRole('button', { name: 'Check readings' }).click()
  await expect(page.getByTestId('reading-result')).toContainText('Outside the WPS window')
  await expect(page.getByTestId('reading-next')).toContainText('What next')
  const list = await page.request.get('/api/tests?pageSize=1')
  const { id } = ((await list.json()) as { items: { id: number }[] }).items[0]!
  await page.goto(`/tests/${id}`)
  await expect(page.getByTestId('test-status')).toBeVisible()
  await expect(page.locator('main')).not.toContainText(/asme-ix|aws-d1|iso-9606/)
})
