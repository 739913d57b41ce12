// Brings the database named by DATABASE_URL to the latest migration.
import knex from 'knex';
import { migrationSource } from '../migrations/source.js';

export async function migrateLatest(databaseUrl: string): Promise<string[]> {
  const db = knex({ client: 'pg', connection: databaseUrl });
  try {
    const [, applied] = (await db.migrate.latest({ migrationSource })) as [number, string[]];
    return applied;
  } finally {
    await db.destroy();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const url = process.env.DATABASE_URL;
  if (!url) {
    console.error('[plumbline] DATABASE_URL is not set');
    process.exit(1);
  }
  migrateLatest(url)
    .then((applied) => {
      if (applied.length) console.log(`[plumbline] applied ${applied.length} migration(s): ${applied.join(', ')}`);
    })
    .catch((error: unknown) => {
      console.error('[plumbline] migration failed:', error instanceof Error ? error.message : error);
      process.exit(1);
    });
}
