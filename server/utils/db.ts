import { openDatabase, type Database, type Db } from '../database/client'
import { seedDemoShop } from '../database/seed/demo'

const globalKey = Symbol.for('rootface.database')
type Holder = { [globalKey]?: Promise<Database> }

/**
 * The one database of this process, migrated and (on an empty database) seeded with the demo shop when NUXT_SEED_DEMO=true.
 * The server starts listening before that ends, so every route awaits the same promise.
 */
export function useDatabase(): Promise<Database> {
  const holder = globalThis as Holder
  if (!holder[globalKey]) {
    const config = useRuntimeConfig()
    holder[globalKey] = openDatabase({
      databaseUrl: process.env.DATABASE_URL || config.databaseUrl || undefined,
      dataDir: config.dataDir,
      holder: `rootface server (pid ${process.pid})`,
      // The demo shop only on request (NUXT_SEED_DEMO=true; `npm run dev` sets it), never by default in production;
      // seeded under the migration lock, so servers starting together seed it once.
      afterMigrate: String(config.seedDemo) === 'true' ? db => seedDemoShop(db) : undefined,
    })
  }
  return holder[globalKey]
}

export async function useDb(): Promise<Db> {
  return (await useDatabase()).db
}

export async function closeDatabase() {
  const holder = globalThis as Holder
  const pending = holder[globalKey]
  holder[globalKey] = undefined
  if (pending) await (await pending).close()
}
