import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOrg, startApp, type Harness, type TestOrg } from './harness.js';
import { client, complete, pick, TARGETS, type Targets } from './fieldwork-helpers.js';

let h: Harness;
let org: TestOrg;
let lead: Awaited<ReturnType<typeof client>>;
let projectPath: string;

beforeAll(async () => {
  h = await startApp();
  org = await createOrg(h.db, 'Targets');
  lead = await client(h, org, 'lead');
  projectPath = `/api/projects/${org.projectId}`;
  await lead.patch(projectPath, { targetSize: 200, headlineQuestion: 'Do you support the plan?' });
});
afterAll(() => h.close());

type Parsed = { id?: string; categories: { id?: string }[] }[];
/** What a file reads as, leaving out the saved ids it is matched to. */
const withoutIds = (variables: Parsed) =>
  variables.map(({ id: _v, ...v }) => ({ ...v, categories: v.categories.map(({ id: _c, ...c }) => c) }));

type Cell = { kind: string; label: string; target: number; categoryIds: string[] };

describe('project set-up', () => {
  it('creates a project with field dates, size and headline question', async () => {
    const res = await lead.post('/api/projects', {
      name: 'Harbour survey', fieldStart: '2026-12-01', fieldEnd: '2026-12-20', targetSize: 600, headlineQuestion: 'Keep the ferry?',
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'Harbour survey', status: 'setup', targetSize: 600, fieldEnd: '2026-12-20' });
  });

  it('refuses a field end before the start, naming the field', async () => {
    const res = await lead.post('/api/projects', {
      name: 'Backwards', fieldStart: '2026-12-10', fieldEnd: '2026-12-01', targetSize: 10, headlineQuestion: 'x?',
    });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual([{ field: 'fieldEnd', message: 'must not be before fieldStart' }]);
  });

  it('starts fieldwork only with quota targets and an interviewer on the team, saying what is missing', async () => {
    const created = (await lead.post('/api/projects', {
      name: 'Not ready', fieldStart: '2026-12-01', fieldEnd: '2026-12-20', targetSize: 100, headlineQuestion: 'Ready?',
    })).body;
    const path = `/api/projects/${created.id}`;
    const early = await lead.patch(path, { status: 'fieldwork' });
    expect(early.status).toBe(400);
    expect(early.body.message).toBe('Fieldwork cannot start yet: save quota targets and add at least one interviewer to the team.');
    expect((await lead.get(path)).body.status).toBe('setup');
    await lead.put(`${path}/targets`, TARGETS);
    expect((await lead.patch(path, { status: 'fieldwork' })).body.message).toBe('Fieldwork cannot start yet: add at least one interviewer to the team.');
    await lead.put(`${path}/members`, { userIds: [org.users.interviewer.id] });
    const started = await lead.patch(path, { status: 'fieldwork' });
    expect(started.status).toBe(200);
    expect(started.body.status).toBe('fieldwork');
  });

  it('duplicates a project for a new wave: facts, targets with joint shares and team, in set-up, without interviews', async () => {
    const created = (await lead.post('/api/projects', {
      name: 'Wave 1', fieldStart: '2026-12-01', fieldEnd: '2026-12-20', targetSize: 200, headlineQuestion: 'Again?',
    })).body;
    const path = `/api/projects/${created.id}`;
    const parsed = (await lead.upload(`${path}/targets/parse`, 'variable,category,share\nage × sex,young × f,20\nage × sex,young × m,30\nage × sex,old × f,30\nage × sex,old × m,20\nregion,North,1\nregion,South,1\n')).body;
    await lead.put(`${path}/targets`, parsed);
    await lead.put(`${path}/members`, { userIds: [org.users.interviewer.id] });
    const res = await lead.post(`${path}/duplicate`);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'Wave 1 (copy)', status: 'setup', targetSize: 200, headlineQuestion: 'Again?', fieldStart: '2026-12-01' });
    const copy = `/api/projects/${res.body.id}`;
    const targets = (await lead.get(copy)).status;
    expect(targets).toBe(200);
    expect((await lead.get(`${copy}/targets`)).body.interlockBasis).toBe('joint shares');
    const cells = (await lead.get(`${copy}/cells`)).body.cells as Cell[];
    expect(cells.find((c) => c.label === 'age: young × sex: m')!.target).toBe(60);
    expect(cells.every((c) => (c as Cell & { achieved: number }).achieved === 0)).toBe(true);
    expect((await lead.get(`${copy}/members`)).body.map((m: { id: string }) => m.id)).toEqual([org.users.interviewer.id]);
    const other = await createOrg(h.db, 'Stranger');
    const stranger = await client(h, other, 'lead');
    expect((await stranger.post(`${path}/duplicate`)).status).toBe(404);
  });

  it('lets no supervisor or client create projects', async () => {
    for (const role of ['supervisor', 'client', 'interviewer'] as const) {
      const c = await client(h, org, role);
      expect((await c.post('/api/projects', { name: 'x', fieldStart: '2026-12-01', fieldEnd: '2026-12-02', targetSize: 1, headlineQuestion: 'q' })).status).toBe(403);
    }
  });

  it('assigns interviewers and supervisors, refusing unknown or foreign user ids', async () => {
    const other = await createOrg(h.db, 'Elsewhere');
    const ids = [org.users.interviewer.id, org.users.supervisor.id, org.users.client.id];
    const res = await lead.put(`${projectPath}/members`, { userIds: ids });
    expect(res.status).toBe(200);
    expect(res.body.map((m: { role: string }) => m.role).sort()).toEqual(['client', 'interviewer', 'supervisor']);
    const foreign = await lead.put(`${projectPath}/members`, { userIds: [...ids, other.users.interviewer.id] });
    expect(foreign.status).toBe(400);
    expect((await lead.get(`${projectPath}/members`)).body).toHaveLength(3);
  });
});

describe('targets and cells', () => {
  it('stores the targets and allocates whole-number cells that add up to the sample size', async () => {
    const res = await lead.put(`${projectPath}/targets`, TARGETS);
    expect(res.status).toBe(200);
    const cells: Cell[] = (await lead.get(`${projectPath}/cells`)).body.cells;
    const crossed = cells.filter((c) => c.kind === 'interlocked');
    const margins = cells.filter((c) => c.kind === 'margin');
    expect(crossed).toHaveLength(6);
    expect(margins).toHaveLength(3);
    // Largest-remainder allocation (common practice): each set sums exactly to the total,
    // and each cell is within one of its exact expected count.
    expect(crossed.reduce((s, c) => s + c.target, 0)).toBe(200);
    expect(margins.reduce((s, c) => s + c.target, 0)).toBe(200);
    const young = crossed.find((c) => c.label === 'age: 18-34 × sex: female')!;
    expect(Math.abs(young.target - 200 * 0.3 * 0.52)).toBeLessThan(1);
    expect(margins.find((c) => c.label === 'region: Coast')!.target).toBe(40);
  });

  it('reads an uploaded file with BOM, semicolons and decimal commas, saving nothing until asked', async () => {
    const csv = '\uFEFFvariable;category;share\nage;18-34;0,3\nage;35+;0,7\nsex;female;52\nsex;male;48\n';
    const before = (await lead.get(`${projectPath}/targets`)).body;
    const res = await lead.upload(`${projectPath}/targets/parse`, csv, 'targets.csv', { interlock: 'age,sex' });
    expect(res.status).toBe(200);
    expect(withoutIds(res.body.variables)).toEqual([
      { name: 'age', columnName: 'age', interlocked: true, categories: [{ label: '18-34', share: 0.3 }, { label: '35+', share: 0.7 }] },
      { name: 'sex', columnName: 'sex', interlocked: true, categories: [{ label: 'female', share: 52 }, { label: 'male', share: 48 }] },
    ]);
    // Variables and categories already saved come back with their ids, so saving keeps them.
    expect(res.body.variables[0].id).toBe(before.variables[0].id);
    expect((await lead.get(`${projectPath}/targets`)).body).toEqual(before);
  });

  it.each([
    ['negative share', 'variable,category,share\nage,young,0.5\nage,old,-0.1\n', 'line 3: variable age category "old": share "-0.1" is not a non-negative number'],
    ['non-numeric share', 'variable,category,share\nage,young,half\n', 'line 2: variable age category "young": share "half" is not a non-negative number'],
    ['all-zero shares', 'variable,category,share\nage,young,0\nage,old,0\n', 'line 2: variable age: all shares are zero'],
    ['duplicate category', 'variable,category,share\nage,young,1\nage,old,1\nage,young,2\n', 'line 4: variable age category "young" is given twice (first on line 2)'],
    ['wrong columns', 'var,cat,pct\nage,young,1\n', 'line 1: missing column "variable" (expected variable,category,share)'],
    ['empty file', '', 'file is empty'],
    ['header only', 'variable,category,share\n', 'no rows after the header line'],
  ])('refuses a file with %s, naming the line', async (_case, csv, message) => {
    const res = await lead.upload(`${projectPath}/targets/parse`, csv, 'bad.csv');
    expect(res.status).toBe(400);
    expect(res.body.message).toBe(`bad.csv: ${message}`);
  });

  it('refuses an interlock naming a variable the file lacks', async () => {
    const res = await lead.upload(`${projectPath}/targets/parse`, 'variable,category,share\nage,a,1\nage,b,1\n', 't.csv', { interlock: 'age,income' });
    expect(res.status).toBe(400);
    expect(res.body.message).toBe('interlock: unknown variable income; the file has age');
  });

  it('refuses a file that is too large or not UTF-8', async () => {
    const big = 'variable,category,share\n' + 'age,a,1\n'.repeat(40_000);
    expect((await lead.upload(`${projectPath}/targets/parse`, big)).status).toBe(413);
    const latin1 = Buffer.from('variable,category,share\nregion,K\xf6ln,1\n', 'latin1');
    const res = await lead.upload(`${projectPath}/targets/parse`, latin1, 'latin.csv');
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/not UTF-8/);
  });

  it('refuses invalid targets as a whole and changes nothing', async () => {
    const before = (await lead.get(`${projectPath}/cells`)).body.cells;
    const bad = { variables: [TARGETS.variables[0], { name: 'AGE', categories: [{ label: 'x', share: 1 }] }] };
    const res = await lead.put(`${projectPath}/targets`, bad);
    expect(res.status).toBe(400);
    expect(res.body.message).toBe('variable AGE is given twice');
    const negative = await lead.put(`${projectPath}/targets`, { variables: [{ name: 'age', categories: [{ label: 'a', share: -1 }] }] });
    expect(negative.status).toBe(400);
    expect(negative.body.fields[0].field).toBe('variables.0.categories.0.share');
    expect((await lead.get(`${projectPath}/cells`)).body.cells).toEqual(before);
  });

  it('keeps interviews when targets change after fieldwork started, and recounts the new cells', async () => {
    const targets: Targets = (await lead.get(`${projectPath}/targets`)).body;
    const interviewer = await client(h, org, 'interviewer');
    const batch = [
      complete(pick(targets, { age: '18-34', sex: 'female', region: 'North' })),
      complete(pick(targets, { age: '60+', sex: 'male', region: 'Coast' })),
    ];
    expect((await interviewer.post(`${projectPath}/interviews/sync`, { interviews: batch })).body.accepted).toBe(2);
    // Region is dropped and education added; age shares change.
    const edited = {
      variables: [
        { ...TARGETS.variables[0], categories: [{ label: '18-34', share: 0.25 }, { label: '35-59', share: 0.45 }, { label: '60+', share: 0.3 }] },
        TARGETS.variables[1],
      ],
    };
    expect((await lead.put(`${projectPath}/targets`, edited)).status).toBe(200);
    const cells: (Cell & { achieved: number })[] = (await lead.get(`${projectPath}/cells`)).body.cells;
    expect(cells).toHaveLength(6);
    expect(cells.find((c) => c.label === 'age: 18-34 × sex: female')!.achieved).toBe(1);
    expect(cells.find((c) => c.label === 'age: 60+ × sex: male')!.achieved).toBe(1);
    expect(Number((await h.db('interviews').where({ project_id: org.projectId }).count({ n: '*' }))[0]!.n)).toBe(2);
  });

  it('previews the cells new targets would give, with the interviews already in them, and saves nothing', async () => {
    const before = (await lead.get(`${projectPath}/cells`)).body.cells;
    const targetsBefore = (await lead.get(`${projectPath}/targets`)).body;
    const edited = {
      variables: [
        { ...TARGETS.variables[0], categories: [{ label: '18-34', share: 0.5 }, { label: '35-59', share: 0.25 }, { label: '60+', share: 0.25 }] },
        TARGETS.variables[1],
      ],
    };
    const res = await lead.post(`${projectPath}/targets/preview`, edited);
    expect(res.status).toBe(200);
    const cells: (Cell & { achieved: number })[] = res.body.cells;
    // 200 interviews × 0.5 × 0.52 = 52 (whole numbers by largest remainder still add up to 200).
    expect(cells.find((c) => c.label === 'age: 18-34 × sex: female')!.target).toBe(52);
    expect(cells.reduce((n, c) => n + c.target, 0)).toBe(200);
    expect(cells.find((c) => c.label === 'age: 18-34 × sex: female')!.achieved).toBe(1);
    expect((await lead.get(`${projectPath}/cells`)).body.cells).toEqual(before);
    expect((await lead.get(`${projectPath}/targets`)).body).toEqual(targetsBefore);
    const bad = await lead.post(`${projectPath}/targets/preview`, { variables: [{ name: 'age', categories: [{ label: 'x', share: -1 }] }] });
    expect(bad.status).toBe(400);
    const interviewer = await client(h, org, 'interviewer');
    expect((await interviewer.post(`${projectPath}/targets/preview`, edited)).status).toBe(403);
  });

  it('lets no interviewer or client change targets', async () => {
    for (const role of ['interviewer', 'client'] as const) {
      const c = await client(h, org, role);
      expect((await c.put(`${projectPath}/targets`, TARGETS)).status).toBe(403);
    }
  });
});

describe('joint shares of interlocked variables', () => {
  const JOINT_CSV = 'variable,category,share\nage × sex,18-34 × female,14\nage × sex,18-34 × male,16\nage × sex,35-59 × female,21\n' +
    'age × sex,35-59 × male,19\nage × sex,60+ × female,17\nage × sex,60+ × male,13\nregion,North,5\nregion,South,3\nregion,Coast,2\n';

  it('reads a joint table from a file: its variables are interlocked, their margins summed from it', async () => {
    const res = await lead.upload(`${projectPath}/targets/parse`, JOINT_CSV);
    expect(res.status).toBe(200);
    expect(res.body.variables.map((v: { name: string; interlocked: boolean }) => [v.name, v.interlocked])).toEqual([['age', true], ['sex', true], ['region', false]]);
    // Shares come back as proportions of the table.
    expect(withoutIds(res.body.variables)[1]!.categories).toEqual([{ label: 'female', share: expect.closeTo(0.52, 12) }, { label: 'male', share: expect.closeTo(0.48, 12) }]);
    expect(res.body.jointShares).toHaveLength(6);
    expect(res.body.jointShares[1]).toEqual({ categories: ['18-34', 'male'], share: expect.closeTo(0.16, 12) });
  });

  it('saves it: cells take the joint shares, and the targets say so', async () => {
    const parsed = (await lead.upload(`${projectPath}/targets/parse`, JOINT_CSV)).body;
    const saved = await lead.put(`${projectPath}/targets`, parsed);
    expect(saved.status).toBe(200);
    expect(saved.body.interlockBasis).toBe('joint shares');
    const cells: Cell[] = (await lead.get(`${projectPath}/cells`)).body.cells;
    // 16% of 200 young men from the table; the product of the margins would give 30% × 48% = 14.4%.
    expect(cells.find((c) => c.label === 'age: 18-34 × sex: male')!.target).toBe(32);
    expect(cells.find((c) => c.label === 'age: 60+ × sex: male')!.target).toBe(26);
  });

  it('refuses a margin more than 0.5 points off the joint table, naming both figures, and keeps the saved targets', async () => {
    const parsed = (await lead.upload(`${projectPath}/targets/parse`, JOINT_CSV)).body;
    parsed.variables[1].categories = [{ label: 'female', share: 50 }, { label: 'male', share: 50 }];
    const res = await lead.put(`${projectPath}/targets`, parsed);
    expect(res.status).toBe(400);
    expect(res.body.message).toContain('variable sex category "female": its own target is 50.0% but the joint table age × sex gives 52.0%');
    expect((await lead.get(`${projectPath}/targets`)).body.interlockBasis).toBe('joint shares');
  });

  it('refuses a table with a combination missing, and goes back to the product of the margins without one', async () => {
    const short = JOINT_CSV.replace('age × sex,60+ × male,13\n', '');
    const res = await lead.upload(`${projectPath}/targets/parse`, short);
    expect(res.status).toBe(400);
    expect(res.body.message).toContain('no share for "60+ × male"');
    const product = await lead.put(`${projectPath}/targets`, TARGETS);
    expect(product.body.interlockBasis).toBe('product of margins');
    expect(product.body.jointShares).toEqual([]);
  });
});
