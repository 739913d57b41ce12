// `plumbline quality-check --project ID`: runs the quality rules over one project now, as the
// server's job does after each sync, and says what they found. Needs DATABASE_URL.
import { isUUID } from 'class-validator';
import { parseArgs } from 'node:util';
import { CliInputError } from './errors.js';

export const QUALITY_CHECK_USAGE = 'plumbline quality-check --project PROJECT_ID   (needs DATABASE_URL)';

export async function qualityCheckCommand(args: string[]): Promise<object> {
  const { values } = parseArgs({ args, strict: true, options: { project: { type: 'string' } } });
  const projectId = values.project?.trim().toLowerCase() ?? '';
  if (!isUUID(projectId)) throw new CliInputError(`--project must be a project id (a UUID), got "${values.project ?? ''}"`);
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl || !/^postgres(ql)?:\/\//.test(databaseUrl)) throw new CliInputError('DATABASE_URL must be set to the postgres:// URL of the Plumbline database');
  // The database work loads only now, so the file commands never load Knex.
  const [{ createKnex }, { runQualityCheck }] = await Promise.all([import('../database/database.module.js'), import('../quality/quality-check.js')]);
  const db = createKnex(databaseUrl);
  try {
    if (!(await db('projects').where({ id: projectId }).first('id'))) throw new CliInputError(`no project ${projectId}; nothing was changed`);
    return await runQualityCheck(db, projectId);
  } finally {
    await db.destroy();
  }
}
