// The statement-trigger function that keeps the four count tables (introduced by migration
// 20261202000700, which explains the design), built from a list of measures so later
// migrations can redefine it with more measures, or a narrower definition of a counted
// interview, without restating its SQL. `interviews.counted` stays the one definition of a
// counted interview; the measures only filter on it.

export interface CountTable {
  table: string;
  keys: string[];
}

export const COUNT_TABLES: CountTable[] = [
  { table: 'interview_counts', keys: ['project_id', 'category_ids'] },
  { table: 'interview_day_counts', keys: ['project_id', 'field_day', 'category_ids'] },
  { table: 'interviewer_counts', keys: ['project_id', 'interviewer_id', 'category_ids'] },
  { table: 'interviewer_day_counts', keys: ['project_id', 'interviewer_id', 'field_day'] },
];

/** One measure of every count table: its column and which interviews it counts. */
export interface Measure {
  column: string;
  /** SQL condition over the columns in `CountShape.columns`. */
  when: string;
}

export interface CountShape {
  /** The interview columns any count depends on (other updates change no count). */
  columns: string;
  /** The first measure decides when a row of a count table is empty and removed. */
  measures: Measure[];
}

function upsert({ table, keys }: CountTable, measures: Measure[]): string {
  const k = keys.join(', ');
  const names = measures.map((m) => m.column);
  return `INSERT INTO ${table} AS c (${k}, ${names.join(', ')})
    SELECT ${k}, ${names.map((m) => `sum(${m})`).join(', ')} FROM g GROUP BY ${k}
    HAVING ${names.map((m) => `sum(${m}) <> 0`).join(' OR ')}
    ORDER BY ${k}
    ON CONFLICT (${k}) DO UPDATE SET ${names.map((m) => `${m} = c.${m} + EXCLUDED.${m}`).join(', ')}`;
}

/** One statement: group the signed rows once at the finest key, then upsert every table. */
export function applySql(shape: CountShape, source: string): string {
  const [last, ...others] = [...COUNT_TABLES].reverse() as [CountTable, ...CountTable[]];
  const sums = shape.measures.map((m) => `coalesce(sum(sign) FILTER (WHERE ${m.when}), 0) AS ${m.column}`);
  return `WITH d AS (${source}),
    g AS (
      SELECT project_id, interviewer_id, field_day, category_ids, ${sums.join(',\n             ')}
        FROM d GROUP BY project_id, interviewer_id, field_day, category_ids
    ),
    ${others.map((spec, i) => `u${i} AS (${upsert(spec, shape.measures)})`).join(',\n    ')}
    ${upsert(last, shape.measures)};`;
}

/** Rows with a sign: +1 adds an interview to the counts, -1 takes it out. */
export function sources(shape: CountShape) {
  const cols = shape.columns;
  return {
    insert: `SELECT ${cols}, 1 AS sign FROM new_rows`,
    delete: `SELECT ${cols}, -1 AS sign FROM old_rows`,
    update: `SELECT *, -1 AS sign FROM (SELECT ${cols} FROM old_rows EXCEPT ALL SELECT ${cols} FROM new_rows) o
           UNION ALL
           SELECT *, 1 AS sign FROM (SELECT ${cols} FROM new_rows EXCEPT ALL SELECT ${cols} FROM old_rows) n`,
    fill: `SELECT ${cols}, 1 AS sign FROM interviews`,
  };
}

function pruneSql({ table, keys }: CountTable, first: string): string {
  const match = keys.map((k) => `c.${k} = o.${k}`).join(' AND ');
  return `DELETE FROM ${table} c USING (SELECT DISTINCT ${keys.join(', ')} FROM old_rows) o WHERE ${match} AND c.${first} = 0;`;
}

/** CREATE OR REPLACE of the trigger function (the three triggers of migration 20261202000400 stay). */
export function countsFunction(shape: CountShape): string {
  const s = sources(shape);
  const first = shape.measures[0]?.column as string;
  return `
  CREATE OR REPLACE FUNCTION interview_counts_apply() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    IF TG_OP = 'INSERT' THEN ${applySql(shape, s.insert)}
    ELSIF TG_OP = 'UPDATE' THEN ${applySql(shape, s.update)}
    ELSE ${applySql(shape, s.delete)}
    END IF;
    IF TG_OP IN ('UPDATE', 'DELETE') THEN ${COUNT_TABLES.map((t) => pruneSql(t, first)).join('\n      ')} END IF;
    RETURN NULL;
  END $$`;
}

/** Empties every count table and counts every interview again under the given shape. */
export function recountSql(shape: CountShape): string[] {
  return [...COUNT_TABLES.map((t) => `DELETE FROM ${t.table}`), applySql(shape, sources(shape).fill)];
}

/** The shape of migration 20261202000700: a yes/no headline answer held as a boolean. */
export const SHAPE_0700: CountShape = {
  columns: 'project_id, interviewer_id, field_day, category_ids, counted, headline_answer, over_quota',
  measures: [
    { column: 'contacts', when: 'true' },
    { column: 'n', when: 'counted' },
    { column: 'yes', when: 'counted AND headline_answer' },
    { column: 'over_quota', when: 'counted AND over_quota' },
  ],
};
