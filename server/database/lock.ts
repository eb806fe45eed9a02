import { closeSync, mkdirSync, openSync, readFileSync, rmSync, writeSync } from 'node:fs'
import { join } from 'node:path'

export class DataDirLockedError extends Error {}

function isAlive(pid: number) {
  try {
    process.kill(pid, 0)
    return true
  }
  catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM'
  }
}

/**
 * PGlite has no lock across processes: a second process on the same data directory corrupts it.
 * Take a pid file; a stale one (its process gone) is replaced. Returns the release function.
 */
export function lockDataDir(dataDir: string, holder = 'rootface server'): () => void {
  mkdirSync(dataDir, { recursive: true })
  const file = join(dataDir, '..', `${dataDir.split(/[\\/]/).pop()}.lock`)
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      const fd = openSync(file, 'wx')
      writeSync(fd, JSON.stringify({ pid: process.pid, holder, since: new Date().toISOString() }))
      closeSync(fd)
      return () => rmSync(file, { force: true })
    }
    catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error
      let owner: { pid?: number, holder?: string, since?: string } = {}
      try {
        owner = JSON.parse(readFileSync(file, 'utf8'))
      }
      catch { /* half-written lock: treat as stale */ }
      if (owner.pid && owner.pid !== process.pid && isAlive(owner.pid)) {
        throw new DataDirLockedError(
          `The data directory ${dataDir} is in use by ${owner.holder ?? 'another process'} (pid ${owner.pid}, since ${owner.since}). `
          + 'Stop that process first, or point NUXT_DATA_DIR at another directory.')
      }
      rmSync(file, { force: true })
    }
  }
  throw new DataDirLockedError(`Could not lock the data directory ${dataDir}`)
}
