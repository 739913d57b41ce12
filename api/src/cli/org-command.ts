// `plumbline org create`: a new organisation and the invitation of its first admin, for an
// operator on the server. Needs DATABASE_URL; the invitation mail is queued in PostgreSQL
// and sent by a running Plumbline server (APP_URL names where its link points).
import { isEmail } from 'class-validator';
import { parseArgs } from 'node:util';
import { CliInputError } from './errors.js';

export const ORG_USAGE = 'plumbline org create --name NAME --admin-email EMAIL [--admin-name NAME]   (needs DATABASE_URL)';

export async function orgCommand(args: string[]): Promise<object> {
  const [action, ...rest] = args;
  if (action !== 'create') throw new CliInputError(`unknown action "${action ?? ''}"; usage: ${ORG_USAGE}`);
  const { values } = parseArgs({
    args: rest,
    strict: true,
    options: { name: { type: 'string' }, 'admin-email': { type: 'string' }, 'admin-name': { type: 'string' } },
  });
  const name = values.name?.trim() ?? '';
  const adminEmail = values['admin-email']?.trim() ?? '';
  if (!name) throw new CliInputError('--name is missing or empty');
  if (name.length > 200) throw new CliInputError('--name must be at most 200 characters');
  if (!isEmail(adminEmail) || adminEmail.length > 254) throw new CliInputError(`--admin-email must be an e-mail address, got "${adminEmail}"`);
  const adminName = values['admin-name']?.trim() || adminEmail.split('@')[0]!;
  if (adminName.length > 200) throw new CliInputError('--admin-name must be at most 200 characters');
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl || !/^postgres(ql)?:\/\//.test(databaseUrl)) throw new CliInputError('DATABASE_URL must be set to the postgres:// URL of the Plumbline database');
  // The database work loads only now, so the file commands never load Knex or pg-boss.
  const { createOrganisation } = await import('./org-create.js');
  return createOrganisation(databaseUrl, { name, adminEmail, adminName });
}
