// The review queue: a page of interviews, flagged first, with their flags in words and
// figures; and what the queue's filters can choose from.
import { BadRequestException, Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';
import type { ReviewStatus } from '../database/tables.js';
import { FLAG_LABELS } from './flag-labels.js';
import { flagsOfRow, type ReviewFlag } from './review-flags.js';
import { queuePage, type QueueCursor, type QueueFilters } from './review-queue.repository.js';
import type { ReviewQueueQuery } from './dto/review-query.dto.js';

export interface ReviewItem {
  id: string;
  interviewer: { id: string; name: string };
  fieldDay: string;
  startedAt: string;
  endedAt: string;
  durationSeconds: number;
  disposition: string;
  categories: { variable: string; label: string }[];
  headlineAnswer: string | null;
  reviewStatus: ReviewStatus;
  flags: ReviewFlag[];
}

export interface ReviewQueuePage {
  items: ReviewItem[];
  nextCursor: string | null;
}

export interface ReviewOptions {
  flags: { code: string; label: string; explanation: string }[];
  interviewers: { id: string; name: string }[];
  fieldDays: string[];
  cells: { id: string; label: string }[];
}

const encodeCursor = (c: QueueCursor) => Buffer.from(JSON.stringify([c.group, c.startedAt, c.id])).toString('base64url');

function decodeCursor(text: string): QueueCursor {
  try {
    const [group, startedAt, id] = JSON.parse(Buffer.from(text, 'base64url').toString('utf8')) as unknown[];
    const timestamp = /^\d{4}-\d{2}-\d{2} \d{2}:\d{2}:\d{2}(\.\d{1,6})?[+-]\d{2}(:\d{2})?$/;
    const uuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;
    if ((group === 0 || group === 1) && typeof startedAt === 'string' && timestamp.test(startedAt) && typeof id === 'string' && uuid.test(id)) {
      return { group, startedAt, id };
    }
  } catch {
    // answered below
  }
  throw new BadRequestException('after must be the nextCursor of a previous page');
}

@Injectable()
export class ReviewQueueService {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async page(projectId: string, query: ReviewQueueQuery): Promise<ReviewQueuePage> {
    const filters: QueueFilters = { flag: query.flag, interviewerId: query.interviewerId, fieldDay: query.fieldDay, status: query.status };
    if (query.cellId) {
      const cell = await this.db('quota_cells').where({ id: query.cellId, project_id: projectId }).first('category_ids');
      if (!cell) throw new BadRequestException('cellId is not a cell of this project');
      filters.cellCategoryIds = cell.category_ids;
    }
    const after = query.after ? decodeCursor(query.after) : undefined;
    const limit = query.limit ?? 50;
    const { rows, more } = await queuePage(this.db, projectId, filters, after, limit);
    const last = rows.at(-1);
    return {
      items: rows.map((r) => ({
        id: r.id,
        interviewer: { id: r.interviewer_id, name: r.interviewer_name },
        fieldDay: r.field_day,
        startedAt: r.started_at.toISOString(),
        endedAt: r.ended_at.toISOString(),
        durationSeconds: Math.round((r.ended_at.getTime() - r.started_at.getTime()) / 1000),
        disposition: r.disposition,
        categories: r.categories,
        headlineAnswer: r.headline_answer,
        reviewStatus: r.review_status,
        flags: flagsOfRow(r),
      })),
      nextCursor: more && last ? encodeCursor({ group: last.group, startedAt: last.started_key, id: last.id }) : null,
    };
  }

  async options(projectId: string): Promise<ReviewOptions> {
    const [pairs, cells] = await Promise.all([
      this.db('interviewer_day_counts as c').join('users as u', 'u.id', 'c.interviewer_id').where('c.project_id', projectId)
        .distinct('c.interviewer_id', 'u.name', 'c.field_day'),
      this.db('quota_cells').where({ project_id: projectId }).orderBy('position').select('id', 'label'),
    ]);
    const interviewers = new Map(pairs.map((p) => [p.interviewer_id, p.name]));
    return {
      flags: Object.entries(FLAG_LABELS).map(([code, l]) => ({ code, label: l.label, explanation: l.explanation })),
      interviewers: [...interviewers].map(([id, name]) => ({ id, name })).sort((a, b) => a.name.localeCompare(b.name)),
      fieldDays: [...new Set(pairs.map((p) => p.field_day))].sort().reverse(),
      cells,
    };
  }
}
