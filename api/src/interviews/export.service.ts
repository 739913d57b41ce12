// Streams a project's counted completes as CSV, one row per interview, with one column
// per current quota variable (named by its file column name, the category as recorded;
// beside it `<column>_counted_as`, what weighting counts it as, for variables with retired
// categories: category-map.ts), the headline answer (yes, no, dont_know or no_answer: what
// `plumbline weight --outcome headline` reads) and the interview's flag codes
// (separated by ";", empty when none). Respondents appear only through their categories
// and answer.
import { Inject, Injectable } from '@nestjs/common';
import { stringify } from 'csv-stringify';
import type { Knex } from 'knex';
import type { Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { KNEX } from '../database/database.constants.js';
import { loadActiveTargets } from '../quotas/cell-allocator.js';
import { loadCategoryMap } from '../quotas/category-map.js';

@Injectable()
export class ExportService {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async writeCsv(projectId: string, out: Writable): Promise<void> {
    const { variables } = await loadActiveTargets(this.db, projectId);
    const meaning = await loadCategoryMap(this.db, projectId);
    const recorded = [...meaning.values()];
    const labelOf = (id: string | null | undefined) => (id ? (meaning.get(id)?.label ?? '') : '');
    const withRetired = new Set(recorded.filter((m) => m.retired).map((m) => m.variableId));
    const columns = variables.flatMap((v) => (withRetired.has(v.id) ? [v.column_name, `${v.column_name}_counted_as`] : [v.column_name]));
    const rows = this.db('interviews')
      .where({ project_id: projectId, counted: true })
      .orderBy(['field_day', 'ended_at', 'id'])
      .select('id', 'field_day', 'category_ids', 'headline_answer', 'over_quota', 'review_status', 'flags')
      .stream();
    const csv = stringify({
      header: true,
      columns: ['interview_id', 'field_day', ...columns, 'headline', 'over_quota', 'review_status', 'flags'],
      cast: { boolean: (value) => (value ? '1' : '0') },
      // Labels and variable names are typed by people; a spreadsheet would run one starting
      // with = + - @ tab or carriage return as a formula. OWASP's CSV-injection advice
      // (owasp.org/www-community/attacks/CSV_Injection): prefix such cells with a single quote.
      escape_formulas: true,
    });
    const toRecord = async function* (source: AsyncIterable<{ id: string; field_day: string; category_ids: string[]; headline_answer: string; over_quota: boolean; review_status: string; flags: string[] }>) {
      for await (const r of source) {
        const byVariable = variables.flatMap((v) => {
          const id = r.category_ids.find((c) => meaning.get(c)?.variableId === v.id);
          return withRetired.has(v.id) ? [labelOf(id), labelOf(id && meaning.get(id)?.countsAs)] : [labelOf(id)];
        });
        yield [r.id, r.field_day, ...byVariable, r.headline_answer, r.over_quota, r.review_status, r.flags.join(';')];
      }
    };
    await pipeline(rows, toRecord, csv, out);
  }
}
