// The services behind `plumbline org create`, built by hand (no Nest application): the same
// OrganisationsService as sign-up, with a job queue that only sends.
import 'reflect-metadata';
import { ConflictException } from '@nestjs/common';
import { InvitationsService } from '../accounts/invitations.service.js';
import { OneTimeTokensRepository } from '../accounts/one-time-tokens.repository.js';
import { loadLinksConfig } from '../config/accounts-config.js';
import { ConfigError } from '../config/config-error.js';
import { createKnex } from '../database/database.module.js';
import { JobQueue } from '../jobs/job-queue.js';
import { MailService } from '../mail/mail.service.js';
import { OrganisationsService, type NewOrganisation } from '../organisations/organisations.service.js';
import { CliInputError } from './errors.js';

export async function createOrganisation(databaseUrl: string, input: NewOrganisation): Promise<object> {
  let links;
  try {
    links = loadLinksConfig(process.env, process.env.HOST || '127.0.0.1', Number(process.env.PORT || 3000));
  } catch (error) {
    if (error instanceof ConfigError) throw new CliInputError(error.message);
    throw error;
  }
  const db = createKnex(databaseUrl);
  const jobs = new JobQueue(databaseUrl, { maintenance: false });
  try {
    const invitations = new InvitationsService(db, new OneTimeTokensRepository(db), new MailService(jobs), links);
    const created = await new OrganisationsService(db, invitations).create(input);
    return {
      ...created,
      invitation: `queued for ${created.admin.email}; a running Plumbline server sends it; the link works for ${links.invitationTtlHours} hours`,
    };
  } catch (error) {
    if (error instanceof ConflictException) throw new CliInputError(`${input.adminEmail} already has an account; nothing was created`);
    throw error;
  } finally {
    await jobs.stop();
    await db.destroy();
  }
}
