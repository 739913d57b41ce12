// Brings the test database to the latest migration before the API suites run.
// The bootstrap (scripts/test.sh) creates it fresh; the demo database is never used.
import { migrateLatest } from '../../scripts/migrate.js';

export default async function setup(): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set: run the API suites through `npm test`');
  if (!/_test(\?|$)/.test(url)) throw new Error('DATABASE_URL must name a database ending in _test; refusing to touch other data');
  await migrateLatest(url);
}
