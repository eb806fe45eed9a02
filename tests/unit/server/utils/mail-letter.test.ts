import { describe, expect, it } from 'vitest'
import { escapeHtml, renderLetter } from '../../../../server/utils/mail-letter'
import { invitationMail, lapseReminderMail, weeklyDigestMail } from '../../../../server/utils/mail-messages'
import type { ProcessStanding } from '../../../../shared/qualification/process-standing'

const standing: ProcessStanding = {
  process: 'SMAW', code: 'asme-ix', edition: '2023', testDate: '2026-01-10', lastUse: '2026-06-12', lapsesOn: '2026-12-12',
  daysLeft: 11, standing: 'lapsing', rule: 'A welder who has not welded with a process during a period of 6 months or more loses the qualifications for that process.',
}

describe('renderLetter', () => {
  it('escapes what people typed, in the HTML part (common practice: names and notes are user input)', () => {
    const { html, text } = renderLetter({ greeting: 'Hello <img src=x onerror=alert(1)>,', paragraphs: ['Tom & "Jerry"'] }, 'Shop <b>')
    expect(html).not.toContain('<img src=x')
    expect(html).toContain('Hello &lt;img src=x onerror=alert(1)&gt;,')
    expect(html).toContain('Tom &amp; &quot;Jerry&quot;')
    expect(html).toContain('Shop &lt;b&gt;')
    expect(text).toContain('Hello <img src=x onerror=alert(1)>,') // plain text stays as typed
  })

  it('says the same in plain text and HTML, table columns aligned in the text', () => {
    const { text, html } = renderLetter({
      greeting: 'Hello,', paragraphs: ['Two rows:'], table: { head: ['Stamp', 'Process'], rows: [['KB-1', 'GTAW'], ['KB-100', 'SMAW']] },
      action: { label: 'Open', href: 'https://rootface.example/x?a=1&b=2' },
    }, 'Shop')
    expect(text).toContain('Stamp   Process\n------  -------\nKB-1    GTAW\nKB-100  SMAW')
    expect(text).toContain('Open:\nhttps://rootface.example/x?a=1&b=2')
    expect(html).toContain('href="https://rootface.example/x?a=1&amp;b=2"')
    expect(text.indexOf('KB-100')).toBeLessThan(text.indexOf('Open:')) // the table before the button
  })

  it('escapeHtml covers the five characters that matter in HTML text and attributes', () => {
    expect(escapeHtml(`<>&"'`)).toBe('&lt;&gt;&amp;&quot;&#39;')
  })
})

describe('message builders', () => {
  it('a lapse reminder is keyed by welder, process, lapse day and step, so a re-run cannot send it twice', () => {
    const mail = lapseReminderMail({ welder: { id: 7, name: 'Ines Carvalho', stamp: 'KB-03' }, to: 'ines@example.test', standing, step: 14, link: 'https://r.example/me', shopName: 'Shop' })
    expect(mail.dedupeKey).toBe('lapse:7:SMAW:2026-12-12:14')
    expect(mail.subject).toBe('SMAW qualification lapses on 2026-12-12 (11 days)')
    expect(mail.text).toContain('the inspector have the final word')
    expect(mail.text).toContain('ASME BPVC Section IX 2023:')
  })

  it('one digest per supervisor per ISO week', () => {
    const mail = weeklyDigestMail({ week: '2026-W49', account: { id: 1, name: 'M', email: 'm@example.test' }, today: '2026-12-01', windowDays: 60, rows: [], link: 'https://r.example/welders', shopName: 'Shop' })
    expect(mail.dedupeKey).toBe('digest:2026-W49:1')
    expect(mail.subject).toBe('Nothing lapses in the next 60 days (2026-W49)')
  })

  it('an invitation names its link and when it stops working', () => {
    const mail = invitationMail({ tokenId: 3, accountId: 9, to: 'new@example.test', name: 'New', role: 'inspector', invitedBy: 'Maren', link: 'https://r.example/set-password?token=abc', expiresAt: new Date(2026, 11, 8, 9, 30), shopName: 'Shop' })
    expect(mail.dedupeKey).toBe('invitation:9:3')
    expect(mail.text).toContain('https://r.example/set-password?token=abc')
    expect(mail.text).toContain('until 2026-12-08 09:30')
    expect(mail.text).toContain('as inspector')
  })
})
