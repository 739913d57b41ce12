// The supervisor's back-check work list, the outcomes they record and each interviewer's tally.
// Reads and writes only `backchecks` (and reads interviews, users and categories to show them).
import { ConflictException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { Knex } from 'knex';
import type { AuthUser } from '../common/roles.js';
import { KNEX } from '../database/database.constants.js';
import type { BackcheckRow, HeadlineAnswer } from '../database/tables.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import { qualitySettings } from '../quality/quality-settings.js';
import type { BackcheckListResponse, BackcheckResponse, BackcheckSummaryResponse } from './dto/backcheck-response.dto.js';
import type { RecordOutcomeDto } from './dto/record-outcome.dto.js';
import { currentShare } from './selection.js';

type ListRow = BackcheckRow & { interviewer_name: string; recorded_by_name: string | null; field_day: string; category_ids: string[]; headline_answer: HeadlineAnswer | null };

const iso = (d: Date | null) => (d ? d.toISOString() : null);

@Injectable()
export class BackchecksService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly access: ProjectAccess,
  ) {}

  async list(user: AuthUser, projectId: string): Promise<BackcheckListResponse> {
    const project = await this.access.find(user, projectId);
    return { backchecks: await this.read(projectId), ...qualitySettings(project.quality_settings).backChecks };
  }

  /** The project's back-checks (or one of them) as the work list shows them. */
  private async read(projectId: string, interviewId?: string): Promise<BackcheckResponse[]> {
    const query = this.db('backchecks as b')
      .join('interviews as i', 'i.id', 'b.interview_id')
      .join('users as u', 'u.id', 'b.interviewer_id')
      .leftJoin('users as r', 'r.id', 'b.recorded_by')
      .where('b.project_id', projectId)
      .orderByRaw('b.outcome IS NOT NULL, CASE WHEN b.outcome IS NULL THEN b.selected_at END, b.recorded_at DESC, b.interview_id')
      .select('b.*', 'u.name as interviewer_name', 'r.name as recorded_by_name', 'i.field_day', 'i.category_ids', 'i.headline_answer');
    if (interviewId) query.where('b.interview_id', interviewId);
    const [rows, labels] = await Promise.all([
      query as unknown as Promise<ListRow[]>,
      this.db('quota_categories as c')
        .join('quota_variables as v', 'v.id', 'c.variable_id')
        .where('c.project_id', projectId)
        .orderBy(['v.position', 'c.position'])
        .select('c.id', 'c.label', 'v.name as variable'),
    ]);
    const order = new Map(labels.map((l, index) => [l.id as string, index]));
    const byId = new Map(labels.map((l) => [l.id as string, { variable: l.variable as string, category: l.label as string }]));
    return rows.map((r) => ({
      interviewId: r.interview_id,
      interviewerId: r.interviewer_id,
      interviewerName: r.interviewer_name,
      fieldDay: r.field_day,
      categories: [...r.category_ids].sort((a, b) => (order.get(a) ?? 0) - (order.get(b) ?? 0)).flatMap((id) => byId.get(id) ?? []),
      headlineAnswer: r.headline_answer,
      respondentReference: r.respondent_reference,
      referenceDeletedAt: iso(r.reference_deleted_at),
      shareAtSelection: r.share_at_selection,
      selectedAt: r.selected_at.toISOString(),
      outcome: r.outcome,
      outcomeNote: r.outcome_note,
      recordedByName: r.recorded_by_name,
      recordedAt: iso(r.recorded_at),
    }));
  }

  async summary(user: AuthUser, projectId: string): Promise<BackcheckSummaryResponse[]> {
    const project = await this.access.find(user, projectId);
    const settings = qualitySettings(project.quality_settings).backChecks;
    const rows = (await this.db('backchecks as b')
      .join('users as u', 'u.id', 'b.interviewer_id')
      .where('b.project_id', projectId)
      .groupBy('b.interviewer_id', 'u.name')
      .orderBy('u.name')
      .select(
        'b.interviewer_id',
        'u.name',
        this.db.raw('count(*)::int AS selected'),
        ...(['confirmed', 'not_confirmed', 'not_reached'] as const).map((o) => this.db.raw(`count(*) FILTER (WHERE b.outcome = '${o}')::int AS ${o}`)),
        this.db.raw('count(*) FILTER (WHERE b.outcome IS NULL)::int AS pending'),
      )) as unknown as { interviewer_id: string; name: string; selected: number; confirmed: number; not_confirmed: number; not_reached: number; pending: number }[];
    return rows.map((r) => ({
      interviewerId: r.interviewer_id,
      interviewerName: r.name,
      selected: r.selected,
      confirmed: r.confirmed,
      notConfirmed: r.not_confirmed,
      notReached: r.not_reached,
      pending: r.pending,
      currentShare: currentShare(settings, r.not_confirmed),
    }));
  }

  /** Records an outcome; one that could not reach the respondent may be replaced, others are final (409). */
  async recordOutcome(user: AuthUser, projectId: string, interviewId: string, dto: RecordOutcomeDto): Promise<BackcheckResponse> {
    await this.access.findEditable(user, projectId);
    const note = dto.note?.trim() || null;
    const updated = await this.db('backchecks')
      .where({ project_id: projectId, interview_id: interviewId })
      .where((q) => q.whereNull('outcome').orWhere('outcome', 'not_reached'))
      .update({ outcome: dto.outcome, outcome_note: note, recorded_by: user.id, recorded_at: this.db.fn.now() });
    if (updated === 0) {
      const row = await this.db('backchecks').where({ project_id: projectId, interview_id: interviewId }).first('outcome');
      if (!row) throw new NotFoundException('This interview was not selected for a back-check');
      throw new ConflictException(`This back-check is already recorded as ${row.outcome?.replace('_', ' ')}; only "could not reach" can be replaced`);
    }
    return (await this.read(projectId, interviewId))[0]!;
  }
}
