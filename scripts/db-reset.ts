// npm run db:reset: delete the PGlite data directory and seed the demo shop again.
// Refuses while a server holds the directory (its lock names the holder).
import { rmSync } from 'node:fs'
import { resolve } from 'node:path'
import { openDatabase } from '../server/database/client'
import { lockDataDir } from '../server/database/lock'
import { seedDemoShop } from '../server/database/seed/demo'

const dataDir = resolve(process.env.NUXT_DATA_DIR ?? '.data/db')
if (process.env.DATABASE_URL) {
  console.error('db:reset works on the embedded database only; DATABASE_URL is set.')
  process.exit(1)
}
try {
  lockDataDir(dataDir, 'npm run db:reset')()
}
catch (error) {
  console.error((error as Error).message)
  process.exit(1)
}
rmSync(dataDir, { recursive: true, force: true })
const database = await openDatabase({ dataDir, holder: 'npm run db:reset' })
try {
  await seedDemoShop(database.db)
  console.log(`Seeded the demo shop into ${dataDir}`)
}
finally {
  await database.close()
}
