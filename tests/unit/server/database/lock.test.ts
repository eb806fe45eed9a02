import { spawn } from 'node:child_process'
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { afterEach, describe, expect, it } from 'vitest'
import { DataDirLockedError, lockDataDir } from '../../../../server/database/lock'

const dirs: string[] = []
const fresh = () => {
  const dir = mkdtempSync(join(tmpdir(), 'rootface-lock-unit-'))
  dirs.push(dir)
  return join(dir, 'db')
}
afterEach(() => dirs.splice(0).forEach(d => rmSync(d, { recursive: true, force: true })))

describe('data directory lock', () => {
  it('takes and releases the lock', () => {
    const dataDir = fresh()
    const release = lockDataDir(dataDir)
    expect(existsSync(`${dataDir}.lock`)).toBe(true)
    release()
    expect(existsSync(`${dataDir}.lock`)).toBe(false)
  })

  it('refuses while another live process holds it, naming the holder', async () => {
    const dataDir = fresh()
    const other = spawn(process.execPath, ['-e', 'setTimeout(() => {}, 10000)'])
    try {
      writeFileSync(`${dataDir}.lock`, JSON.stringify({ pid: other.pid, holder: 'npm run dev', since: '2026-12-01T10:00:00Z' }))
      expect(() => lockDataDir(dataDir)).toThrow(DataDirLockedError)
      expect(() => lockDataDir(dataDir)).toThrow(`in use by npm run dev (pid ${other.pid}`)
    }
    finally {
      other.kill()
    }
  })

  it('replaces a stale lock whose process is gone', async () => {
    const dataDir = fresh()
    const gone = spawn(process.execPath, ['-e', '0'])
    await new Promise(r => gone.once('exit', r))
    writeFileSync(`${dataDir}.lock`, JSON.stringify({ pid: gone.pid, holder: 'old server' }))
    const release = lockDataDir(dataDir)
    release()
  })
})
