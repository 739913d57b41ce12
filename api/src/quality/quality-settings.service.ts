// The lead's quality rules for a project: read by its lead and supervisors, changed by the
// lead. Only what differs from the defaults is stored (projects.quality_settings), so a rule
// the lead never touched follows the defaults; `qualitySettings` merges the two.
import { BadRequestException, Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import type { AuthUser } from '../common/roles.js';
import { KNEX } from '../database/database.constants.js';
import type { ProjectRow } from '../database/tables.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import { QualityScheduler } from './quality-jobs.js';
import { DEFAULT_QUALITY_SETTINGS, qualitySettings, type QualitySettings } from './quality-settings.js';

export interface QualitySettingsView {
  settings: QualitySettings;
  defaults: QualitySettings;
  checkedAt: string | null;
}

/** The fields of each rule that differ from the default. */
export function changesFromDefaults(settings: QualitySettings): Record<string, Record<string, unknown>> {
  const changes: Record<string, Record<string, unknown>> = {};
  for (const rule of Object.keys(DEFAULT_QUALITY_SETTINGS) as (keyof QualitySettings)[]) {
    const defaults = DEFAULT_QUALITY_SETTINGS[rule] as Record<string, unknown>;
    const given = settings[rule] as unknown as Record<string, unknown>;
    for (const field of Object.keys(defaults)) {
      if (given[field] !== defaults[field]) (changes[rule] ??= {})[field] = given[field];
    }
  }
  return changes;
}

const view = (row: Pick<ProjectRow, 'quality_settings' | 'quality_checked_at'>): QualitySettingsView => ({
  settings: qualitySettings(row.quality_settings),
  defaults: DEFAULT_QUALITY_SETTINGS,
  checkedAt: row.quality_checked_at ? new Date(row.quality_checked_at).toISOString() : null,
});

@Injectable()
export class QualitySettingsService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly access: ProjectAccess,
    private readonly scheduler: QualityScheduler,
  ) {}

  async get(user: AuthUser, projectId: string): Promise<QualitySettingsView> {
    return view(await this.access.find(user, projectId));
  }

  /** Replaces the project's rules; the flags are computed again with them. */
  async put(user: AuthUser, projectId: string, settings: QualitySettings): Promise<QualitySettingsView> {
    await this.access.findEditable(user, projectId);
    if (settings.outOfHours.from === settings.outOfHours.to) {
      const message = 'outOfHours.to must differ from outOfHours.from (the working hours would be empty)';
      throw new BadRequestException({ message, fields: [{ field: 'outOfHours.to', message }] });
    }
    // Knex would write a plain object as JSON; the DTO instance is turned into one first.
    const changes = JSON.parse(JSON.stringify(changesFromDefaults(settings))) as Record<string, unknown>;
    const [row] = await this.db('projects').where({ id: projectId }).update({ quality_settings: changes }).returning(['quality_settings', 'quality_checked_at']);
    this.scheduler.queue(projectId);
    return view(row as ProjectRow);
  }
}
