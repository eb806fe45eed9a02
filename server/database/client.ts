import { existsSync } from 'node:fs'
import { dirname, join, resolve } from 'node:path'
import { PGlite } from '@electric-sql/pglite'
import { drizzle as drizzlePglite, type PgliteDatabase } from 'drizzle-orm/pglite'
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator'
import { drizzle as drizzlePg } from 'drizzle-orm/node-postgres'
import { migrate as migratePg } from 'drizzle-orm/node-postgres/migrator'
import pg from 'pg'
import * as schema from './schema'
import { lockDataDir } from './lock'

// Both drivers expose the same query builder; the app is typed against one of them.
export type Db = PgliteDatabase<typeof schema>

export interface Database {
  db: Db
  driver: 'pglite' | 'postgres'
  close: () => Promise<void>
  /** A gzip tarball of the embedded database's files, taken while it runs (PGlite only). */
  backup?: () => Promise<Blob>
}

export interface OpenOptions {
  databaseUrl?: string
  dataDir: string
  holder?: string
  /** Runs right after the migrations, on PostgreSQL still under their lock (the demo seed: once, however many servers start). */
  afterMigrate?: (db: Db) => Promise<unknown>
}

/** Migrations sit beside the built server entry, or in the source tree in dev and scripts. */
export function migrationsFolder() {
  const entry = process.argv[1]
  const built = entry ? join(dirname(entry), 'migrations') : ''
  if (built && existsSync(join(built, 'meta/_journal.json'))) return built
  return resolve('server/database/migrations')
}

/** Opens a PGlite data directory from a backup tarball (the directory must not exist yet). */
export async function restorePglite(dataDir: string, archive: Blob, holder = 'restore') {
  const release = lockDataDir(dataDir, holder)
  try {
    const client = await PGlite.create({ dataDir, loadDataDir: archive })
    await client.query('select 1')
    await client.close()
  }
  finally {
    release()
  }
}

/** The key of the advisory lock that app servers take around migrations (any constant shared by all of them). */
export const MIGRATION_LOCK_KEY = 0x526f6f74 // 'Root'

/**
 * Migrates a PostgreSQL database while holding a session advisory lock, so app servers started at the same moment
 * on a fresh database take turns: the first applies the migrations, the others then find nothing left to do.
 */
export async function migrateUnderLock(pool: pg.Pool, afterMigrate?: (db: Db) => Promise<unknown>) {
  const client = await pool.connect()
  try {
    await client.query('select pg_advisory_lock($1)', [MIGRATION_LOCK_KEY])
    try {
      const db = drizzlePg(client, { schema })
      await migratePg(db, { migrationsFolder: migrationsFolder() })
      if (afterMigrate) await afterMigrate(db as unknown as Db)
    }
    finally {
      await client.query('select pg_advisory_unlock($1)', [MIGRATION_LOCK_KEY])
    }
  }
  finally {
    client.release()
  }
}

export async function openDatabase(options: OpenOptions): Promise<Database> {
  if (options.databaseUrl) {
    const pool = new pg.Pool({ connectionString: options.databaseUrl, max: 10 })
    try {
      await migrateUnderLock(pool, options.afterMigrate)
    }
    catch (error) {
      await pool.end()
      throw error
    }
    const db = drizzlePg(pool, { schema })
    return { db: db as unknown as Db, driver: 'postgres', close: () => pool.end() }
  }
  const release = lockDataDir(options.dataDir, options.holder)
  try {
    const client = await PGlite.create(options.dataDir)
    const db = drizzlePglite(client, { schema })
    await migratePglite(db, { migrationsFolder: migrationsFolder() })
    if (options.afterMigrate) await options.afterMigrate(db)
    return {
      db,
      driver: 'pglite',
      backup: () => client.dumpDataDir('gzip'),
      close: async () => {
        try {
          await client.close()
        }
        finally {
          release()
        }
      },
    }
  }
  catch (error) {
    release()
    throw error
  }
}
