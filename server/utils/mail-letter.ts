// Plain text and HTML of one message from the same parts, so both say the same thing.

export interface LetterTable {
  head: string[]
  rows: string[][]
}

export interface Letter {
  greeting: string
  paragraphs: string[]
  action?: { label: string, href: string }
  table?: LetterTable
  closing?: string[]
  /** Small print under a rule: the caution on messages that carry a computed status, why the message came. */
  footnotes?: string[]
}

export function escapeHtml(text: string) {
  return text.replace(/[&<>"']/g, c => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', '\'': '&#39;' })[c]!)
}

function textTable(table: LetterTable) {
  const widths = table.head.map((h, i) => Math.max(h.length, ...table.rows.map(r => (r[i] ?? '').length)))
  const line = (cells: string[]) => cells.map((c, i) => c.padEnd(widths[i]!)).join('  ').trimEnd()
  return [line(table.head), widths.map(w => '-'.repeat(w)).join('  '), ...table.rows.map(line)].join('\n')
}

export function renderLetter(letter: Letter, shopName: string): { text: string, html: string } {
  const text = [
    letter.greeting,
    ...letter.paragraphs,
    ...(letter.table ? [textTable(letter.table)] : []),
    ...(letter.action ? [`${letter.action.label}:\n${letter.action.href}`] : []),
    ...(letter.closing ?? []),
    ...(letter.footnotes?.length ? [`--\n${letter.footnotes.join('\n')}`] : []),
    `Rootface · ${shopName}`,
  ].join('\n\n')

  const p = (t: string) => `<p style="margin:0 0 14px">${escapeHtml(t).replace(/\n/g, '<br>')}</p>`
  const cell = 'padding:4px 10px 4px 0;border-bottom:1px solid #d4d1c7;text-align:left;vertical-align:top'
  const html = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>${escapeHtml(shopName)}</title></head>
<body style="margin:0;padding:24px;background:#f7f6f2;color:#1d2327;font:15px/1.5 'Source Sans 3',system-ui,sans-serif">
<div style="max-width:600px;margin:0 auto;background:#ffffff;border:1px solid #d4d1c7;border-radius:6px;padding:24px">
<p style="margin:0 0 18px;font-weight:700;color:#1f5f7a">Rootface · ${escapeHtml(shopName)}</p>
${p(letter.greeting)}
${letter.paragraphs.map(p).join('\n')}
${letter.table ? `<table style="border-collapse:collapse;margin:0 0 14px;font-size:14px"><thead><tr>${letter.table.head.map(h => `<th style="${cell};font-size:12px;text-transform:uppercase;color:#545d63">${escapeHtml(h)}</th>`).join('')}</tr></thead><tbody>${letter.table.rows.map(r => `<tr>${r.map(c => `<td style="${cell}">${escapeHtml(c)}</td>`).join('')}</tr>`).join('')}</tbody></table>` : ''}
${letter.action
  ? `<p style="margin:18px 0"><a href="${escapeHtml(letter.action.href)}" style="display:inline-block;background:#1f5f7a;color:#ffffff;padding:10px 16px;border-radius:4px;font-weight:600;text-decoration:none">${escapeHtml(letter.action.label)}</a></p>
<p style="margin:0 0 14px;font-size:13px;color:#545d63">Or paste this address into your browser: ${escapeHtml(letter.action.href)}</p>`
  : ''}
${(letter.closing ?? []).map(p).join('\n')}
${letter.footnotes?.length ? `<hr style="border:0;border-top:1px solid #d4d1c7;margin:18px 0">${letter.footnotes.map(f => `<p style="margin:0 0 8px;font-size:12px;color:#545d63">${escapeHtml(f)}</p>`).join('')}` : ''}
</div></body></html>`
  return { text, html }
}
