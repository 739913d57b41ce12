// A targets file is held to the very rules saving applies, and labels typed by people cannot
// turn into spreadsheet formulas in the export.
import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { client, complete, pick, type Targets } from './fieldwork-helpers.js';
import { createOrg, startApp, type Harness, type TestOrg } from './harness.js';

let h: Harness;
let org: TestOrg;
let lead: Awaited<ReturnType<typeof client>>;
let projectPath: string;

beforeAll(async () => {
  h = await startApp();
  org = await createOrg(h.db, 'Files');
  lead = await client(h, org, 'lead');
  projectPath = `/api/projects/${org.projectId}`;
  await lead.patch(projectPath, { targetSize: 100, headlineQuestion: 'Support?' });
});
afterAll(() => h.close());

const rows = (variable: string, n: number, label = (i: number) => `c${i}`) =>
  Array.from({ length: n }, (_, i) => `${variable},${label(i)},1`).join('\n');

describe('reading a targets file', () => {
  it('skips the separator rows spreadsheets write and reads shares written with a % sign', async () => {
    const csv = 'variable;category;share\nage;young;30%\n;;\nage;old;70%\n;;\nsex;female;51,5\nsex;male;48,5\n';
    const res = await lead.upload(`${projectPath}/targets/parse`, csv, 'spreadsheet.csv');
    expect(res.status).toBe(200);
    expect(res.body.variables.map((v: { name: string; categories: { share: number }[] }) => [v.name, v.categories.map((c) => c.share)]))
      .toEqual([['age', [30, 70]], ['sex', [51.5, 48.5]]]);
  });

  it.each([
    ['a label over 100 characters', `variable,category,share\nage,young,1\nage,${'o'.repeat(101)},1\n`, 'line 3: variable age: label must be at most 100 characters long'],
    ['over 100 categories', `variable,category,share\n${rows('region', 101)}\n`, 'line 2: variable region: categories may list at most 100 categories'],
    ['over 20 variables', `variable,category,share\n${Array.from({ length: 21 }, (_, v) => rows(`v${v}`, 2)).join('\n')}\n`, 'variables may list at most 20 quota variables'],
    ['shares whose sum overflows', 'variable,category,share\nage,young,1e308\nage,old,1e308\n', 'line 2: variable age category "young": share 1e308 is larger than 1000000000000'],
    ['a NUL character in a label', 'variable,category,share\nage,you\u0000ng,1\nage,old,1\n', 'line 2: variable age: label must not contain the NUL character'],
    ['a variable name of spaces in quotes', 'variable,category,share\n"  ",young,1\n', 'line 2: variable is empty'],
    ['a column given twice', 'variable,category,share,share\nage,young,1,1\n', 'line 1: column "share" is given twice'],
    ['a short row, in words of its own', 'variable,category,share\nage,young,30\nage,old\n', 'line 3: has 2 fields; every row needs 3 (variable,category,share), so a comma inside a name needs the name in double quotes'],
    ['a % sign on some shares of a variable but not others', 'variable,category,share\nage,young,30%\nage,old,0.7\n', 'line 3: variable age: some shares have a % sign and some do not; write them all one way'],
    ['a quote never closed', 'variable,category,share\nage,"young,30\n', 'line 2: a double quote is opened and never closed'],
  ])('refuses %s, naming the line, as saving would', async (_case, csv, message) => {
    const res = await lead.upload(`${projectPath}/targets/parse`, csv, 'bad.csv');
    expect(res.status).toBe(400);
    expect(res.body.message).toBe(`bad.csv: ${message}`);
    expect(res.body.fields[0].field).toBe('file');
  });

  it('refuses a form of thousands of fields beside the file', async () => {
    const fields = Object.fromEntries(Array.from({ length: 5000 }, (_, i) => [`f${i}`, 'x']));
    const res = await lead.upload(`${projectPath}/targets/parse`, 'variable,category,share\nage,young,1\n', 'ok.csv', fields);
    expect(res.status).toBe(400);
    expect(res.body).toEqual({ statusCode: 400, error: 'Bad Request', message: 'Too many fields' });
  });

  it('refuses in saving what it refuses in a file: the same rules', async () => {
    const long = await lead.put(`${projectPath}/targets`, { variables: [{ name: 'age', categories: [{ label: 'o'.repeat(101), share: 1 }] }] });
    expect(long.body.fields).toEqual([{ field: 'variables.0.categories.0.label', message: 'label must be at most 100 characters long' }]);
    const many = await lead.put(`${projectPath}/targets`, {
      variables: Array.from({ length: 21 }, (_, v) => ({ name: `v${v}`, categories: [{ label: 'a', share: 1 }] })),
    });
    expect(many.body.fields).toEqual([{ field: 'variables', message: 'variables may list at most 20 quota variables' }]);
  });

  it('still reads a good file, and what it reads saves as it is', async () => {
    const res = await lead.upload(`${projectPath}/targets/parse`, 'variable,category,share\nage, young ,1\nage,old,3\n', 'ok.csv');
    expect(res.status).toBe(200);
    expect(res.body.variables).toEqual([{ name: 'age', columnName: 'age', interlocked: false, categories: [{ label: 'young', share: 1 }, { label: 'old', share: 3 }] }]);
    expect((await lead.put(`${projectPath}/targets`, res.body)).status).toBe(200);
  });
});

describe('the interviews export', () => {
  it('neutralises labels a spreadsheet would run as formulas (OWASP CSV injection)', async () => {
    const formulas = ['=1+2', '+SUM(A1)', '-2+3', '@cmd', '\tTAB'];
    const saved = await lead.put(`${projectPath}/targets`, {
      variables: [{ name: '=HYPERLINK("x")', categories: formulas.map((label) => ({ label, share: 1 })) }],
    });
    expect(saved.status).toBe(200);
    const targets = saved.body as Targets;
    // Labels are trimmed when saved, so the tab-led one is stored as "TAB".
    expect(targets.variables[0]!.categories.map((c) => c.label)).toEqual(['=1+2', '+SUM(A1)', '-2+3', '@cmd', 'TAB']);
    const interviewer = await client(h, org, 'interviewer');
    const batch = targets.variables[0]!.categories.map((c) => complete(pick(targets, { [targets.variables[0]!.name]: c.label })));
    const synced = await interviewer.post(`${projectPath}/interviews/sync`, { interviews: batch });
    expect(synced.status).toBe(200);
    const csv = await lead.get(`${projectPath}/interviews/export.csv`);
    const [header, ...records] = parse(csv.text) as string[][];
    // The header is the variable's file column name, snake_case, so it cannot start a formula.
    expect(header![2]).toBe('hyperlink_x');
    expect(records.map((r) => r[2]).sort()).toEqual(["'+SUM(A1)", "'-2+3", "'=1+2", "'@cmd", 'TAB']);
  });
});
