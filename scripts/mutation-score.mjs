// The mutation score per folder (and with --files per file) from Stryker's JSON reports:
//   node scripts/mutation-score.mjs [report.json ...] [--files]
// Without report names it reads every reports/mutation/*.json but the incremental files. Score = killed (and timed
// out) / (killed + timed out + survived + not covered); ignored (static) mutants and compile errors are left out.
import { readdirSync, readFileSync } from 'node:fs'
import { join } from 'node:path'

const args = process.argv.slice(2)
const perFile = args.includes('--files')
let files = args.filter(a => !a.startsWith('--'))
if (!files.length) {
  const dir = 'reports/mutation'
  files = readdirSync(dir).filter(f => f.endsWith('.json') && !f.includes('incremental')).map(f => join(dir, f))
}
const parts = new Map()
const count = (key, status) => {
  const part = parts.get(key) ?? { killed: 0, survived: 0, noCoverage: 0 }
  if (status === 'Killed' || status === 'Timeout') part.killed++
  else if (status === 'Survived') part.survived++
  else if (status === 'NoCoverage') part.noCoverage++
  else return
  parts.set(key, part)
}
for (const file of files) {
  const report = JSON.parse(readFileSync(file, 'utf8'))
  for (const [name, result] of Object.entries(report.files)) {
    const path = name.replace(/^.*?(shared\/)/, '$1')
    const key = perFile ? path : path.split('/').slice(0, -1).join('/')
    for (const mutant of result.mutants) {
      count(key, mutant.status)
      count('all', mutant.status)
    }
  }
}
console.log('| part | mutants | killed | survived | not covered | score |')
console.log('| --- | ---: | ---: | ---: | ---: | ---: |')
for (const [key, p] of [...parts].sort(([a], [b]) => (a === 'all') - (b === 'all') || a.localeCompare(b))) {
  const total = p.killed + p.survived + p.noCoverage
  console.log(`| ${key} | ${total} | ${p.killed} | ${p.survived} | ${p.noCoverage} | ${(100 * p.killed / total).toFixed(1)} % |`)
}
