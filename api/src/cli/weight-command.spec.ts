import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeEach, describe, expect, it } from 'vitest';
import { run } from './run.js';

const TARGETS = 'variable,category,share\nage,young,40\nage,old,60\nregion,Harrowby,0.5\nregion,Mardon,0.5\n';
const DATA = 'id,age,region,supports\n1,young,Harrowby,1\n2,old,Harrowby,0\n3,old,Mardon,1\n4,young,Mardon,0\n5,old,Mardon,0\n';

let dir: string;
const path = (name: string) => join(dir, name);

function plumbline(...args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = run(args, { out: (t) => (stdout += t), err: (t) => (stderr += t) });
  return { code, stdout, stderr };
}

function weigh(data: string, targets: string, ...extra: string[]) {
  writeFileSync(path('data.csv'), data);
  writeFileSync(path('targets.csv'), targets);
  return plumbline('weight', '--data', path('data.csv'), '--targets', path('targets.csv'), '--out', path('out.csv'), ...extra);
}

/** Bad input: exit 2, one line on stderr that contains every fragment, and no output file. */
function expectRejected(result: ReturnType<typeof plumbline>, ...fragments: string[]) {
  expect(result.code).toBe(2);
  expect(result.stdout).toBe('');
  expect(result.stderr.trim().split('\n')).toHaveLength(1);
  for (const f of fragments) expect(result.stderr).toContain(f);
  expect(existsSync(path('out.csv'))).toBe(false);
}

beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'plumbline-cli-'));
});

describe('plumbline weight', () => {
  it('reads what an export says each interview counts as, leaving out those a retired category keeps out of weighting', () => {
    // As the export writes it: "Old Quay" retired; interview 6 merged into Mardon, interview 7 not weighted.
    const data = 'id,age,region,region_counted_as,supports\n1,young,Harrowby,Harrowby,1\n2,old,Harrowby,Harrowby,0\n3,old,Mardon,Mardon,1\n' +
      '4,young,Mardon,Mardon,0\n5,old,Mardon,Mardon,0\n6,old,Old Quay,Mardon,1\n7,young,Old Quay,,1\n';
    const result = weigh(data, TARGETS, '--outcome', 'supports');
    expect(result.code).toBe(0);
    const report = JSON.parse(result.stdout);
    expect(report).toMatchObject({ n: 6, notWeighted: 1 });
    expect(report.margins.find((m: { category: string }) => m.category === 'Mardon').unweighted).toBeCloseTo(4 / 6, 12);
    const rows = readFileSync(path('out.csv'), 'utf8').trim().split('\n').slice(1).map((r) => r.split(','));
    expect(rows[6]![5]).toBe('');
    expect(rows.slice(0, 6).every((r) => Number(r[5]) > 0)).toBe(true);
  });

  it('writes every input column in order plus a weight column with mean 1, and reports the balance', () => {
    const result = weigh(DATA, TARGETS, '--outcome', 'supports');
    expect(result.code).toBe(0);
    const report = JSON.parse(result.stdout);
    expect(report.converged).toBe(true);
    expect(report.n).toBe(5);
    expect(report.maxMarginError).toBeLessThanOrEqual(1e-6);
    expect(Object.keys(report.outcome)).toEqual(['column', 'unweighted', 'weighted', 'answered', 'otherAnswers', 'standardError', 'interval', 'method', 'marginOfError',
      'impliedBiasFactor', 'impliedBiasFactorInterval', 'impliedBiasFactorMethod']);
    // Five interviews: the share's uncertainty is withheld, with its reasons (docs/methods.md, section 4).
    expect(report.outcome).toMatchObject({ standardError: null, interval: null, marginOfError: null, impliedBiasFactorInterval: null });
    expect(report.withheld.map((w: { figure: string }) => w.figure)).toEqual(['standardError', 'interval', 'marginOfError', 'impliedBiasFactorInterval']);
    expect(report.withheld[0].reason).toMatch(/effective sample size is [\d.]+, under 30/);
    const [header, ...rows] = readFileSync(path('out.csv'), 'utf8').trim().split('\n');
    expect(header).toBe('id,age,region,supports,weight');
    expect(rows.map((r) => r.split(',').slice(0, 4).join(','))).toEqual(DATA.trim().split('\n').slice(1));
    const weights = rows.map((r) => Number(r.split(',')[4]));
    expect(weights.reduce((a, b) => a + b, 0) / weights.length).toBeCloseTo(1, 12);
    // Young share 2/5 in the sample equals its target 40%, so each group keeps its total.
    expect(report.margins[0]).toMatchObject({ variable: 'age', category: 'young', target: 0.4, unweighted: 0.4 });
  });

  it('reads and writes quoted fields (commas inside a category) through the CSV parser', () => {
    const quoted = 'id,age,region\n1,young,"Vale, north"\n2,old,"Vale, north"\n3,old,Mardon\n4,young,Mardon\n';
    const result = weigh(quoted, 'variable,category,share\nage,young,1\nage,old,1\nregion,"Vale, north",1\nregion,Mardon,3\n');
    expect(result.code).toBe(0);
    const lines = readFileSync(path('out.csv'), 'utf8').trim().split('\n');
    expect(lines[0]).toBe('id,age,region,weight');
    expect(lines[1]).toMatch(/^1,young,"Vale, north",0\.5$/);
    expect(lines[3]).toMatch(/^3,old,Mardon,1\.5$/);
  });

  it('reports non-convergence as a result, not an error', () => {
    const result = weigh(DATA, TARGETS.replace('young,40', 'young,10'), '--max-iterations', '1', '--tolerance', '1e-12');
    expect(result.code).toBe(0);
    const report = JSON.parse(result.stdout);
    expect(report.converged).toBe(false);
    expect(report.iterations).toBe(1);
    expect(report.maxMarginError).toBeGreaterThan(1e-12);
    expect(existsSync(path('out.csv'))).toBe(true);
  });

  it('rakes to a joint table of interlocked variables and reports the margins it implies', () => {
    const joint = 'variable,category,share\nage × region,young × Harrowby,20\nage × region,young × Mardon,20\nage × region,old × Harrowby,35\nage × region,old × Mardon,25\n';
    const data = 'id,age,region,supports\n' + Array.from({ length: 40 }, (_, i) =>
      `${i},${['young', 'old'][i % 2]},${['Harrowby', 'Mardon', 'Mardon'][i % 3]},${i % 5 === 0 ? 1 : 0}`).join('\n') + '\n';
    const report = JSON.parse(weigh(data, joint, '--outcome', 'supports').stdout);
    expect(report.converged).toBe(true);
    const cell = report.margins.find((m: { variable: string; category: string }) => m.variable === 'age × region' && m.category === 'old × Harrowby');
    expect(cell.weighted).toBeCloseTo(0.35, 6);
    const young = report.margins.find((m: { variable: string; category: string }) => m.variable === 'age' && m.category === 'young');
    expect(young).toMatchObject({ target: 0.4, unweighted: 0.5 });
  });

  it('rejects a margin that disagrees with the joint table by more than 0.5 points, with both figures', () => {
    const joint = 'variable,category,share\nage × region,young × Harrowby,20\nage × region,young × Mardon,20\nage × region,old × Harrowby,35\nage × region,old × Mardon,25\nage,young,45\nage,old,55\n';
    expectRejected(weigh(DATA, joint), 'targets.csv', 'variable age category "young": its own target is 45.0% but the joint table age × region gives 40.0%');
  });

  it('rejects an unknown category in the data, naming file, line, variable and category', () => {
    expectRejected(weigh(DATA.replace('3,old,Mardon', '3,old,Mardn'), TARGETS), 'data.csv', 'line 4', 'region', '"Mardn"');
  });

  it('rejects a target category with no respondents, naming the targets line', () => {
    expectRejected(weigh(DATA, `${TARGETS}region,Tarnholm,0.2\n`), 'targets.csv', 'line 6', 'region', '"Tarnholm"', 'no respondents');
  });

  it('rejects a variable missing from the data', () => {
    expectRejected(weigh(DATA, `${TARGETS}education,degree,1\n`), 'data.csv', 'line 1', '"education"');
  });

  it('rejects negative, non-numeric and all-zero shares', () => {
    expectRejected(weigh(DATA, TARGETS.replace('old,60', 'old,-60')), 'targets.csv', 'line 3', 'age', '"old"', '"-60"');
    expectRejected(weigh(DATA, TARGETS.replace('old,60', 'old,sixty')), 'targets.csv', 'line 3', '"sixty"');
    expectRejected(weigh(DATA, TARGETS.replace('young,40', 'young,0').replace('old,60', 'old,0')), 'targets.csv', 'age', 'all shares are zero');
  });

  it('rejects missing header columns and empty files', () => {
    expectRejected(weigh(DATA, TARGETS.replace('variable,category,share', 'variable,category,pct')), 'targets.csv', 'line 1', 'missing column "share"');
    expectRejected(weigh('', TARGETS), 'data.csv', 'empty');
    expectRejected(weigh(DATA, ''), 'targets.csv', 'empty');
    expectRejected(weigh('id,age,region\n', TARGETS), 'data.csv', 'no rows');
  });

  it('reads yes, no, don\'t know and no answer: every interview is raked, the share is over yes and no', () => {
    const words = DATA.replace('1,young,Harrowby,1', '1,young,Harrowby,yes').replace('2,old,Harrowby,0', '2,old,Harrowby,dont_know')
      .replace('4,young,Mardon,0', '4,young,Mardon,No_Answer');
    const result = weigh(words, TARGETS, '--outcome', 'supports');
    expect(result.code).toBe(0);
    const report = JSON.parse(result.stdout);
    expect(report.n).toBe(5);
    // Answered: interviews 1 (yes), 3 (yes) and 5 (no).
    expect(report.outcome.answered).toBe(3);
    expect(report.outcome.unweighted).toBeCloseTo(2 / 3, 12);
    expect(report.outcome.otherAnswers.map((o: { answer: string; count: number }) => [o.answer, o.count])).toEqual([['dont_know', 1], ['no_answer', 1]]);
    const weights = readFileSync(path('out.csv'), 'utf8').trim().split('\n').slice(1).map((r) => Number(r.split(',')[4]));
    expect(report.outcome.weighted).toBeCloseTo((weights[0]! + weights[2]!) / (weights[0]! + weights[2]! + weights[4]!), 12);
  });

  it('rejects an outcome value it cannot read, naming the values it takes', () => {
    expectRejected(weigh(DATA.replace('5,old,Mardon,0', '5,old,Mardon,maybe'), TARGETS, '--outcome', 'supports'), 'data.csv', 'line 6', 'supports', '"maybe"',
      '1 or yes, 0 or no, dont_know or no_answer');
    expectRejected(weigh(DATA, TARGETS, '--outcome', 'voted'), 'data.csv', '"voted"');
  });

  it('rejects infeasible cap and floor, naming the category that cannot be met', () => {
    const skewed = TARGETS.replace('young,40', 'young,90').replace('old,60', 'old,10');
    expectRejected(weigh(DATA, skewed, '--cap', '1.5'), 'cap 1.5', 'age', '"young"');
    // Each category alone could be met, but not all together: young/Harrowby would need a weight of at least 1.65.
    const together = TARGETS.replace('young,40', 'young,55').replace('old,60', 'old,45');
    expectRejected(weigh(DATA, together, '--cap', '1.5', '--floor', '0.7'), 'cap 1.5 and floor 0.7', 'infeasible together');
    expectRejected(weigh(DATA, TARGETS, '--floor', '1.2'), '--floor');
    expectRejected(weigh(DATA, TARGETS, '--cap', '0.8'), '--cap');
  });

  it('rejects rows with the wrong number of fields and unknown options', () => {
    expectRejected(weigh(`${DATA}6,old\n`, TARGETS), 'data.csv', 'line 7');
    expectRejected(weigh(DATA, TARGETS, '--trim', '3'), "'--trim'");
  });

  it('leaves an existing output file untouched when the input is bad', () => {
    writeFileSync(path('out.csv'), 'earlier result\n');
    writeFileSync(path('data.csv'), DATA.replace('Harrowby', 'Harowby'));
    writeFileSync(path('targets.csv'), TARGETS);
    const result = plumbline('weight', '--data', path('data.csv'), '--targets', path('targets.csv'), '--out', path('out.csv'));
    expect(result.code).toBe(2);
    expect(readFileSync(path('out.csv'), 'utf8')).toBe('earlier result\n');
  });

  it('keeps the weights within cap and floor when they are feasible', () => {
    const result = weigh(DATA, TARGETS.replace('young,40', 'young,55').replace('old,60', 'old,45'), '--cap', '1.56', '--floor', '0.6');
    expect(result.code).toBe(0);
    const report = JSON.parse(result.stdout);
    expect(report.converged).toBe(true);
    expect(report.weightMax).toBeLessThanOrEqual(1.56 + 1e-9);
    expect(report.weightMin).toBeGreaterThanOrEqual(0.6 - 1e-9);
    // Without bounds these targets need a weight of 1.587 for young/Harrowby, so the cap binds.
  });
});
