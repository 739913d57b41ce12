// Benchmark polls are kept in benchmark_polls, their method groups (with what is known of each
// group's bias) in benchmark_groups, and the project's spread prior in benchmark_settings.
// Every change runs in one transaction; bad input is refused before anything is written.
import { BadRequestException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';
import type { BenchmarkPollRow } from '../database/tables.js';
import { DEFAULT_SPREAD } from '../estimation/reconcile.js';
import type { BenchmarkPollDto, BiasKind } from './dto/benchmark-poll.dto.js';
import { OWN_GROUP } from './reconciliation-input.js';

export interface BenchmarkPoll {
  id: string;
  source: string;
  fieldStart: string;
  fieldEnd: string;
  yes: number;
  sampleSize: number;
  share: number;
  methodGroup: string;
  groupBias: BiasKind;
  biasFactor: number | null;
}

function invalid(field: string, message: string): BadRequestException {
  return new BadRequestException({ message, fields: [{ field, message }] });
}

/** The checks that span fields; the DTO has checked each field alone. */
function checked(dto: BenchmarkPollDto): { yes: number } {
  if ((dto.share === undefined) === (dto.yes === undefined)) throw invalid('share', 'give either share or yes, not both and not neither');
  const yes = dto.yes ?? Math.round((dto.share as number) * dto.sampleSize);
  if (yes > dto.sampleSize) throw invalid('yes', `yes must be at most the sample size (${dto.sampleSize})`);
  if (dto.fieldEnd < dto.fieldStart) throw invalid('fieldEnd', 'fieldEnd must be on or after fieldStart');
  if (dto.groupBias === 'known' && (dto.biasFactor === undefined || dto.biasFactor <= 0 || dto.biasFactor >= 1)) {
    throw invalid('biasFactor', 'a known bias needs biasFactor strictly between 0 and 1 (0.5 is no bias)');
  }
  if (dto.groupBias !== 'known' && dto.biasFactor !== undefined) throw invalid('biasFactor', 'biasFactor is given only with groupBias "known"');
  if (dto.methodGroup.toLowerCase() === OWN_GROUP.toLowerCase()) throw invalid('methodGroup', `"${OWN_GROUP}" is the project's own group; name the poll's group otherwise`);
  return { yes };
}

@Injectable()
export class BenchmarksService {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async list(projectId: string): Promise<BenchmarkPoll[]> {
    const rows = await this.db('benchmark_polls as p')
      .join('benchmark_groups as g', (j) => j.on('g.project_id', 'p.project_id').andOn('g.name', 'p.method_group'))
      .where('p.project_id', projectId)
      .orderBy([{ column: 'p.field_end', order: 'desc' }, { column: 'p.created_at', order: 'asc' }])
      .select('p.*', 'g.bias_kind', 'g.bias_factor');
    return rows.map((r: BenchmarkPollRow & { bias_kind: BiasKind; bias_factor: number | null }) => ({
      id: r.id,
      source: r.source,
      fieldStart: r.field_start,
      fieldEnd: r.field_end,
      yes: r.yes,
      sampleSize: r.sample_size,
      share: r.yes / r.sample_size,
      methodGroup: r.method_group,
      groupBias: r.bias_kind,
      biasFactor: r.bias_factor,
    }));
  }

  async create(projectId: string, dto: BenchmarkPollDto): Promise<BenchmarkPoll> {
    const { yes } = checked(dto);
    const id = await this.db.transaction(async (trx) => {
      await this.saveGroup(trx, projectId, dto);
      const [row] = await trx('benchmark_polls').insert(this.row(projectId, dto, yes)).returning('id');
      return (row as { id: string }).id;
    });
    return this.one(projectId, id);
  }

  async update(projectId: string, id: string, dto: BenchmarkPollDto): Promise<BenchmarkPoll> {
    const { yes } = checked(dto);
    await this.db.transaction(async (trx) => {
      const existing = await trx('benchmark_polls').where({ project_id: projectId, id }).forUpdate().first();
      if (!existing) throw new NotFoundException('No such benchmark poll');
      await this.saveGroup(trx, projectId, dto);
      await trx('benchmark_polls').where({ id }).update(this.row(projectId, dto, yes));
      await this.dropEmptyGroups(trx, projectId);
    });
    return this.one(projectId, id);
  }

  async remove(projectId: string, id: string): Promise<void> {
    await this.db.transaction(async (trx) => {
      const deleted = await trx('benchmark_polls').where({ project_id: projectId, id }).delete();
      if (deleted === 0) throw new NotFoundException('No such benchmark poll');
      await this.dropEmptyGroups(trx, projectId);
    });
  }

  async spread(projectId: string): Promise<number> {
    const row = await this.db('benchmark_settings').where({ project_id: projectId }).first();
    return row?.unknown_spread ?? DEFAULT_SPREAD;
  }

  async setSpread(projectId: string, spread: number): Promise<void> {
    await this.db('benchmark_settings').insert({ project_id: projectId, unknown_spread: spread }).onConflict('project_id').merge();
  }

  private async one(projectId: string, id: string): Promise<BenchmarkPoll> {
    const poll = (await this.list(projectId)).find((p) => p.id === id);
    if (!poll) throw new NotFoundException('No such benchmark poll');
    return poll;
  }

  /** A group's bias is the one last given for any of its polls: it applies to them all. */
  private async saveGroup(trx: Knex.Transaction, projectId: string, dto: BenchmarkPollDto): Promise<void> {
    await trx('benchmark_groups')
      .insert({ project_id: projectId, name: dto.methodGroup, bias_kind: dto.groupBias, bias_factor: dto.groupBias === 'known' ? (dto.biasFactor as number) : null })
      .onConflict(['project_id', 'name'])
      .merge();
  }

  private async dropEmptyGroups(trx: Knex.Transaction, projectId: string): Promise<void> {
    await trx('benchmark_groups')
      .where({ project_id: projectId })
      .whereNotExists(trx('benchmark_polls').whereRaw('benchmark_polls.project_id = benchmark_groups.project_id AND benchmark_polls.method_group = benchmark_groups.name'))
      .delete();
  }

  private row(projectId: string, dto: BenchmarkPollDto, yes: number) {
    return { project_id: projectId, source: dto.source, field_start: dto.fieldStart, field_end: dto.fieldEnd, method_group: dto.methodGroup, yes, sample_size: dto.sampleSize };
  }
}
