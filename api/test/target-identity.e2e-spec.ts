// Targets edited mid-field while a device still holds the old ids: a rename keeps the
// category (and its Achieved), a removed category or variable is retired (its interviews
// kept, new ones accepted and flagged), a share edit keeps every id, and the balance says
// what happens to retired categories' interviews or counts them where the lead merged them.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startApp, type Harness } from './harness.js';
import { complete, pick, syncProject, TARGETS, type Targets } from './fieldwork-helpers.js';

let h: Harness;
let p: Awaited<ReturnType<typeof syncProject>>;
let base: string;
/** The ids the interviewer's device was given before the office changed anything. */
let old: Targets;

type Saved = { id: string; name: string; columnName: string; interlocked: boolean; interviews: number; categories: { id: string; label: string; share: number; interviews: number }[] };

beforeAll(async () => {
  h = await startApp();
  p = await syncProject(h, 'Identity');
  base = `/api/projects/${p.org.projectId}`;
  old = p.targets;
});
afterAll(() => h.close());

const respondent = (region: string, age = '18-34', sex = 'female') => pick(old, { age, sex, region });

async function send(...items: ReturnType<typeof complete>[]) {
  const res = await p.interviewer.post(p.syncPath, { interviews: items });
  expect(res.status).toBe(200);
  return res.body.results as { status: string; reason?: string; flags?: string[] }[];
}

async function saved(): Promise<Saved[]> {
  return (await p.lead.get(`${base}/targets`)).body.variables;
}

/** The targets as the set-up screen sends them back: every id carried, edited by `edit`. */
function asSent(variables: Saved[]) {
  return { variables: variables.map(({ id, name, columnName, interlocked, categories }) => ({ id, name, columnName, interlocked, categories: categories.map(({ id, label, share }) => ({ id, label, share })) })) };
}

const achieved = async (label: string) => ((await p.lead.get(`${base}/cells`)).body.cells as { label: string; achieved: number }[]).find((c) => c.label === label)?.achieved;

describe('targets edited mid-field', () => {
  it('gives each variable a column name and each category the interviews it holds', async () => {
    expect((await send(complete(respondent('North')), complete(respondent('Coast')), complete(respondent('South')))).map((r) => r.status)).toEqual(['accepted', 'accepted', 'accepted']);
    const region = (await saved()).find((v) => v.name === 'region')!;
    expect(region.columnName).toBe('region');
    expect(region.interviews).toBe(3);
    expect(region.categories.map((c) => [c.label, c.interviews])).toEqual([['North', 1], ['South', 1], ['Coast', 1]]);
  });

  it('renames a category as the same category: Achieved kept, the old id still syncs to it', async () => {
    const variables = await saved();
    const region = variables.find((v) => v.name === 'region')!;
    region.categories[0]!.label = 'Northside';
    region.name = 'Region of residence';
    const res = await p.lead.put(`${base}/targets`, asSent(variables));
    expect(res.status).toBe(200);
    const renamed = (res.body.variables as Saved[]).find((v) => v.id === old.variables[2]!.id)!;
    expect(renamed).toMatchObject({ name: 'Region of residence', columnName: 'region' });
    expect(renamed.categories[0]).toMatchObject({ id: old.variables[2]!.categories[0]!.id, label: 'Northside', interviews: 1 });
    expect(await achieved('Region of residence: Northside')).toBe(1);

    const [result] = await send(complete(respondent('North')));
    expect(result).toMatchObject({ status: 'accepted', flags: [] });
    expect(await achieved('Region of residence: Northside')).toBe(2);
  });

  it('keeps every id through a share edit, and the device keeps syncing', async () => {
    const variables = await saved();
    const age = variables.find((v) => v.name === 'age')!;
    age.categories.forEach((c, i) => (c.share = [0.2, 0.5, 0.3][i]!));
    const res = await p.lead.put(`${base}/targets`, asSent(variables));
    expect(res.status).toBe(200);
    expect((res.body.variables as Saved[]).flatMap((v) => v.categories.map((c) => c.id))).toEqual(old.variables.flatMap((v) => v.categories.map((c) => c.id)));
    expect((res.body.variables as Saved[])[0]!.categories.map((c) => c.share)).toEqual([0.2, 0.5, 0.3]);
    expect((await send(complete(respondent('South', '35-59', 'male'))))[0]!.status).toBe('accepted');
  });

  it('retires a removed category: its interviews kept, a late complete accepted and flagged', async () => {
    const variables = await saved();
    const edited = variables.find((v) => v.columnName === 'region')!;
    edited.categories = edited.categories.filter((c) => c.label !== 'Coast');
    expect((await p.lead.put(`${base}/targets`, asSent(variables))).status).toBe(200);
    const region = (await saved()).find((v) => v.columnName === 'region')!;
    expect(region.categories.map((c) => c.label)).toEqual(['Northside', 'South']);
    // The variable still holds the interviews of its retired category.
    expect(region.interviews).toBe(5);

    const [late] = await send(complete(respondent('Coast')));
    expect(late).toMatchObject({ status: 'accepted', flags: ['retired_category'] });
    const flags = (await p.lead.get(`${base}/interviews/flags`)).body;
    expect(JSON.stringify(flags)).toContain('retired_category');

    const balance = (await p.lead.get(`${base}/balance`)).body;
    expect(balance.notWeighted).toBe(2);
    expect(balance.retired).toEqual([{
      id: old.variables[2]!.categories[2]!.id, variable: 'Region of residence', category: 'Coast', interviews: 2, mergedInto: null, mergedIntoLabel: null,
      choices: [{ id: old.variables[2]!.categories[0]!.id, label: 'Northside' }, { id: old.variables[2]!.categories[1]!.id, label: 'South' }],
    }]);
    expect(balance.n).toBe(4);
  });

  it('counts a retired category as the current category the lead merges it into, on the balance and in the export', async () => {
    const coast = old.variables[2]!.categories[2]!.id;
    const south = old.variables[2]!.categories[1]!.id;
    const res = await p.lead.put(`${base}/balance/retired/${coast}`, { mergedInto: south });
    expect(res.status).toBe(200);
    expect(res.body.notWeighted).toBe(0);
    expect(res.body.n).toBe(6);
    expect(res.body.retired[0]).toMatchObject({ category: 'Coast', mergedInto: south, mergedIntoLabel: 'South' });
    const southShare = res.body.margins.find((m: { variable: string; category: string }) => m.category === 'South');
    expect(southShare.unweighted).toBeCloseTo(4 / 6, 12);

    const lines = (await p.lead.get(`${base}/interviews/export.csv`)).text.trim().split('\n').map((l: string) => l.split(','));
    const header = lines[0]!;
    expect(header).toEqual(expect.arrayContaining(['age', 'sex', 'region', 'region_counted_as']));
    const [region, countedAs] = [header.indexOf('region'), header.indexOf('region_counted_as')];
    const coastRows = lines.slice(1).filter((r) => r[region] === 'Coast');
    expect(coastRows).toHaveLength(2);
    expect(coastRows.every((r) => r[countedAs] === 'South')).toBe(true);
  });

  it('refuses a merge into a category of another variable, changing nothing', async () => {
    const coast = old.variables[2]!.categories[2]!.id;
    const res = await p.lead.put(`${base}/balance/retired/${coast}`, { mergedInto: old.variables[0]!.categories[0]!.id });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/current category of the same variable/);
    expect((await p.lead.get(`${base}/balance`)).body.retired[0].mergedIntoLabel).toBe('South');
  });

  it('retires a removed variable: a complete still naming it is accepted and flagged', async () => {
    const variables = (await saved()).filter((v) => v.columnName !== 'region');
    expect((await p.lead.put(`${base}/targets`, asSent(variables))).status).toBe(200);
    const [late, current] = await send(complete(respondent('South')), complete(pick(old, { age: '60+', sex: 'male' })));
    expect(late).toMatchObject({ status: 'accepted', flags: ['retired_variable'] });
    expect(current).toMatchObject({ status: 'accepted', flags: [] });
  });

  it('refuses ids from another project with a clear 400 that changes nothing', async () => {
    const other = await syncProject(h, 'Other');
    const before = await saved();
    const sent = asSent(before);
    sent.variables[0]!.categories[0]!.id = other.targets.variables[0]!.categories[0]!.id;
    const res = await p.lead.put(`${base}/targets`, sent);
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/^variable age: category "18-34": [0-9a-f-]{36} is not a category of this variable$/);
    const foreignVariable = asSent(before);
    foreignVariable.variables[1]!.id = other.targets.variables[1]!.id;
    expect((await p.lead.put(`${base}/targets`, foreignVariable)).status).toBe(400);
    expect(await saved()).toEqual(before);
  });

  it('reads a targets file in again with the saved ids where names and labels match', async () => {
    const csv = 'variable,category,share\nage,18-34,30\nage,35-59,40\nage,60+,30\nsex,female,52\nsex,male,48\nregion,Harbour,100\n';
    const res = await p.lead.upload(`${base}/targets/parse`, csv);
    expect(res.status).toBe(200);
    const [age, , region] = res.body.variables;
    expect(age.id).toBe(old.variables[0]!.id);
    expect(age.categories.map((c: { id?: string }) => c.id)).toEqual(old.variables[0]!.categories.map((c) => c.id));
    // The retired region variable is not offered again by id: the file makes a new one.
    expect(region.id).toBeUndefined();
  });

  it('makes the column name from the display name, and refuses a column name used twice', async () => {
    const res = await p.lead.put(`${base}/targets`, { variables: [{ name: 'Age band', categories: [{ label: 'young', share: 1 }, { label: 'old', share: 1 }] }] });
    expect(res.status).toBe(200);
    expect(res.body.variables[0]).toMatchObject({ name: 'Age band', columnName: 'age_band' });
    const twice = await p.lead.put(`${base}/targets`, { variables: [...TARGETS.variables, { name: 'Age?', categories: [{ label: 'x', share: 1 }] }] });
    expect(twice.status).toBe(400);
  });
});
