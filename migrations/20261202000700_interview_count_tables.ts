import type { Knex } from 'knex';

// One definition of a counted interview, and count tables for the quota board's
// per-interviewer section, the day-by-day history and quality control by interviewer.
//
// `interviews.counted` is a stored generated column: completes not rejected on review.
// The triggers and every query read that column, so the rule lives in this one place.
//
// Four narrow tables rather than one keyed by (project, interviewer, day, categories):
// such a fine table grows almost with the number of interviews (interviewers × days ×
// combinations), so reading it would put the board's cost back where it was. Each table
// here is bounded by what it is read for: cells (interview_counts), days × cells
// (interview_day_counts), interviewers × cells (interviewer_counts), interviewers × days
// (interviewer_day_counts, the board's per-interviewer section). The trigger still reads
// a batch once: one statement groups it at the finest key and upserts every table from
// that grouping, so a 1,000-row insert costs one pass and a few hundred upserted rows.
//
// Every table has the same four measures: contacts (any disposition), n (counted),
// yes (counted with headline answer yes) and over_quota (counted and over quota).

interface CountTable {
  table: string;
  keys: string[];
}

const COUNT_TABLES: CountTable[] = [
  { table: 'interview_counts', keys: ['project_id', 'category_ids'] },
  { table: 'interview_day_counts', keys: ['project_id', 'field_day', 'category_ids'] },
  { table: 'interviewer_counts', keys: ['project_id', 'interviewer_id', 'category_ids'] },
  { table: 'interviewer_day_counts', keys: ['project_id', 'interviewer_id', 'field_day'] },
];
const NEW_TABLES = COUNT_TABLES.filter((s) => s.table !== 'interview_counts');

/** The columns of an interview that any count depends on; other updates change no count. */
const COLS = 'project_id, interviewer_id, field_day, category_ids, counted, headline_answer, over_quota';

/** Rows with a sign: +1 adds an interview to the counts, -1 takes it out. */
const SOURCES = {
  insert: `SELECT ${COLS}, 1 AS sign FROM new_rows`,
  delete: `SELECT ${COLS}, -1 AS sign FROM old_rows`,
  // Only rows whose counted columns changed: re-dating moves them, a flag change moves none.
  update: `SELECT *, -1 AS sign FROM (SELECT ${COLS} FROM old_rows EXCEPT ALL SELECT ${COLS} FROM new_rows) o
           UNION ALL
           SELECT *, 1 AS sign FROM (SELECT ${COLS} FROM new_rows EXCEPT ALL SELECT ${COLS} FROM old_rows) n`,
  fill: `SELECT ${COLS}, 1 AS sign FROM interviews`,
};

function upsert({ table, keys }: CountTable): string {
  const k = keys.join(', ');
  return `INSERT INTO ${table} AS c (${k}, contacts, n, yes, over_quota)
    SELECT ${k}, sum(contacts), sum(n), sum(yes), sum(over_quota) FROM g GROUP BY ${k}
    HAVING sum(contacts) <> 0 OR sum(n) <> 0 OR sum(yes) <> 0 OR sum(over_quota) <> 0
    ORDER BY ${k}
    ON CONFLICT (${k}) DO UPDATE SET contacts = c.contacts + EXCLUDED.contacts, n = c.n + EXCLUDED.n,
      yes = c.yes + EXCLUDED.yes, over_quota = c.over_quota + EXCLUDED.over_quota`;
}

/** One statement: group the signed rows once at the finest key, then upsert every table. */
function applySql(source: string): string {
  const [last, ...others] = [...COUNT_TABLES].reverse() as [CountTable, ...CountTable[]];
  return `WITH d AS (${source}),
    g AS (
      SELECT project_id, interviewer_id, field_day, category_ids,
             sum(sign) AS contacts,
             coalesce(sum(sign) FILTER (WHERE counted), 0) AS n,
             coalesce(sum(sign) FILTER (WHERE counted AND headline_answer), 0) AS yes,
             coalesce(sum(sign) FILTER (WHERE counted AND over_quota), 0) AS over_quota
        FROM d GROUP BY project_id, interviewer_id, field_day, category_ids
    ),
    ${others.map((spec, i) => `u${i} AS (${upsert(spec)})`).join(',\n    ')}
    ${upsert(last)};`;
}

/** Rows whose counts fell to zero go, so the tables hold only what exists. */
function pruneSql({ table, keys }: CountTable): string {
  const match = keys.map((k) => `c.${k} = o.${k}`).join(' AND ');
  return `DELETE FROM ${table} c USING (SELECT DISTINCT ${keys.join(', ')} FROM old_rows) o WHERE ${match} AND c.contacts = 0;`;
}

const COUNTS_FUNCTION = `
  CREATE OR REPLACE FUNCTION interview_counts_apply() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    IF TG_OP = 'INSERT' THEN ${applySql(SOURCES.insert)}
    ELSIF TG_OP = 'UPDATE' THEN ${applySql(SOURCES.update)}
    ELSE ${applySql(SOURCES.delete)}
    END IF;
    IF TG_OP IN ('UPDATE', 'DELETE') THEN ${COUNT_TABLES.map(pruneSql).join('\n      ')} END IF;
    RETURN NULL;
  END $$`;

export async function up(knex: Knex): Promise<void> {
  await knex.raw(`ALTER TABLE interviews ADD COLUMN counted boolean NOT NULL
    GENERATED ALWAYS AS (disposition = 'complete' AND review_status <> 'rejected') STORED`);
  await knex.schema.alterTable('interview_counts', (t) => {
    t.integer('contacts').notNullable().defaultTo(0);
  });
  for (const spec of NEW_TABLES) {
    await knex.schema.createTable(spec.table, (t) => {
      t.uuid('project_id').notNullable().references('projects.id').onDelete('CASCADE');
      if (spec.keys.includes('interviewer_id')) t.uuid('interviewer_id').notNullable().references('users.id');
      if (spec.keys.includes('field_day')) t.date('field_day').notNullable();
      if (spec.keys.includes('category_ids')) t.specificType('category_ids', 'uuid[]').notNullable();
      for (const m of ['contacts', 'n', 'yes', 'over_quota']) t.integer(m).notNullable();
      t.primary(spec.keys);
    });
  }
  // Replacing the function keeps the three statement triggers of migration 20261202000400.
  // The ALTER TABLE above holds its lock on interviews until this migration commits, so no
  // interview arrives between the fill and the new triggers.
  await knex.raw(COUNTS_FUNCTION);
  await knex.raw('DELETE FROM interview_counts');
  await knex.raw(applySql(SOURCES.fill));
}

// The function as migration 20261202000400 created it (counted completes per combination).
const ORIGINAL_APPLY = (table: string, sign: string) => `
  INSERT INTO interview_counts AS c (project_id, category_ids, n, yes, over_quota)
  SELECT project_id, category_ids, ${sign}count(*), ${sign}count(*) FILTER (WHERE headline_answer),
         ${sign}count(*) FILTER (WHERE over_quota)
    FROM ${table}
   WHERE disposition = 'complete' AND review_status <> 'rejected'
   GROUP BY project_id, category_ids
  ON CONFLICT (project_id, category_ids) DO UPDATE
    SET n = c.n + EXCLUDED.n, yes = c.yes + EXCLUDED.yes, over_quota = c.over_quota + EXCLUDED.over_quota;`;

export async function down(knex: Knex): Promise<void> {
  await knex.raw(`
    CREATE OR REPLACE FUNCTION interview_counts_apply() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF TG_OP IN ('UPDATE', 'DELETE') THEN ${ORIGINAL_APPLY('old_rows', '-')} END IF;
      IF TG_OP IN ('INSERT', 'UPDATE') THEN ${ORIGINAL_APPLY('new_rows', '')} END IF;
      RETURN NULL;
    END $$`);
  for (const spec of [...NEW_TABLES].reverse()) await knex.schema.dropTable(spec.table);
  await knex.raw('DELETE FROM interview_counts WHERE n = 0');
  await knex.schema.alterTable('interview_counts', (t) => {
    t.dropColumn('contacts');
  });
  await knex.raw('ALTER TABLE interviews DROP COLUMN counted');
}
