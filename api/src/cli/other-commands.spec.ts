import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { run } from './run.js';

const dir = mkdtempSync(join(tmpdir(), 'plumbline-cli-'));
const file = (name: string, text: string) => {
  writeFileSync(join(dir, name), text);
  return join(dir, name);
};

function plumbline(...args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = run(args, { out: (t) => (stdout += t), err: (t) => (stderr += t) });
  return { code, stdout, stderr };
}

function expectRejected(result: ReturnType<typeof plumbline>, ...fragments: string[]) {
  expect(result.code).toBe(2);
  expect(result.stdout).toBe('');
  expect(result.stderr.trim().split('\n')).toHaveLength(1);
  for (const f of fragments) expect(result.stderr).toContain(f);
}

describe('plumbline posterior', () => {
  it('prints alpha, beta, mean, median, lower and upper', () => {
    const result = plumbline('posterior', '--successes', '62', '--trials', '100', '--prior', '2,2', '--level', '0.9');
    expect(result.code).toBe(0);
    const out = JSON.parse(result.stdout);
    expect(Object.keys(out)).toEqual(['alpha', 'beta', 'mean', 'median', 'lower', 'upper']);
    expect([out.alpha, out.beta]).toEqual([64, 40]);
  });

  it('rejects impossible counts, priors and levels', () => {
    expectRejected(plumbline('posterior', '--successes', '7', '--trials', '5'), '--successes 7', '--trials 5');
    expectRejected(plumbline('posterior', '--successes', '2.5', '--trials', '5'), '--successes');
    expectRejected(plumbline('posterior', '--successes', '2', '--trials', '5', '--prior', '1'), '--prior');
    expectRejected(plumbline('posterior', '--successes', '2', '--trials', '5', '--level', '95'), '--level');
    expectRejected(plumbline('posterior', '--trials', '5'), '--successes is required');
  });
});

describe('plumbline reconcile', () => {
  const input = {
    groups: [{ id: 'phone', bias: { kind: 'known', factor: 0.48 } }, { id: 'door', bias: { kind: 'none' } }],
    polls: [
      { id: 'a', group: 'phone', successes: 500, trials: 1000 },
      { id: 'b', group: 'door', successes: 620, trials: 1000 },
    ],
  };

  it('prints truth, groups and polls with the documented fields', () => {
    const result = plumbline('reconcile', '--input', file('ok.json', JSON.stringify(input)));
    expect(result.code).toBe(0);
    const out = JSON.parse(result.stdout);
    expect(Object.keys(out.truth)).toEqual(['mean', 'median', 'lower', 'upper']);
    expect(Object.keys(out.groups[0])).toEqual(['id', 'meanFactor', 'lower', 'upper', 'probOverstates', 'probUnderstates']);
    expect(out.polls.map((p: { id: string }) => p.id)).toEqual(['a', 'b']);
  });

  it('rejects malformed JSON with its line, and bad fields by their path', () => {
    expectRejected(plumbline('reconcile', '--input', file('broken.json', '{\n"groups": [\n}')), 'broken.json', 'line');
    const badGroup = { ...input, polls: [{ id: 'a', group: 'mail', successes: 5, trials: 10 }] };
    expectRejected(plumbline('reconcile', '--input', file('g.json', JSON.stringify(badGroup))), 'polls[0]', '"mail"');
    const badCount = { ...input, polls: [{ id: 'a', group: 'door', successes: 15, trials: 10 }] };
    expectRejected(plumbline('reconcile', '--input', file('c.json', JSON.stringify(badCount))), 'polls[0]', 'successes');
    const badBias = { ...input, groups: [{ id: 'door', bias: { kind: 'unknown', spread: 0.7 } }] };
    expectRejected(plumbline('reconcile', '--input', file('b.json', JSON.stringify(badBias))), 'groups[0]', 'spread');
    expectRejected(plumbline('reconcile', '--input', file('e.json', '')), 'e.json', 'empty');
    expectRejected(plumbline('reconcile', '--input', join(dir, 'missing.json')), 'missing.json', 'no such file');
  });
});

describe('plumbline rates', () => {
  it('rejects unknown codes, negative counts, missing columns and all-zero counts', () => {
    expectRejected(plumbline('rates', '--input', file('r1.csv', 'code,count\nI,5\nXX,3\n')), 'r1.csv', 'line 3', '"XX"');
    expectRejected(plumbline('rates', '--input', file('r2.csv', 'code,count\nI,5\nR,-3\n')), 'r2.csv', 'line 3', '"-3"');
    expectRejected(plumbline('rates', '--input', file('r3.csv', 'code,n\nI,5\n')), 'r3.csv', 'line 1', 'missing column "count"');
    expectRejected(plumbline('rates', '--input', file('r4.csv', 'code,count\nI,0\n')), 'r4.csv', 'all counts are zero');
    expectRejected(plumbline('rates', '--input', file('r5.csv', 'code,count\nI,5\n'), '--e', '1.5'), '--e');
  });
});

describe('plumbline quotas', () => {
  const targets = file('q.csv', 'variable,category,share\nage,young,1\nage,mid,1\nage,old,1\nsex,female,51\nsex,male,49\nregion,north,2\nregion,south,1\n');

  it('allocates interlocked and margin cells that each sum to the total', () => {
    const result = plumbline('quotas', '--targets', targets, '--total', '100', '--interlock', 'age,sex');
    expect(result.code).toBe(0);
    const out = JSON.parse(result.stdout);
    expect(out.sets.map((s: { variables: string[] }) => s.variables)).toEqual([['age', 'sex'], ['region']]);
    for (const set of out.sets) expect(set.cells.reduce((a: number, c: { target: number }) => a + c.target, 0)).toBe(100);
    // By hand: 100 × 1/3 × 0.51 = 17 for each female cell, 16.33 for each male cell; floors sum to 99,
    // and the one unit left goes to the first of the tied male remainders (young, male).
    expect(out.sets[0].cells.map((c: { target: number }) => c.target)).toEqual([17, 17, 17, 16, 17, 16]);
    expect(out.sets[1].cells.map((c: { target: number }) => c.target)).toEqual([67, 33]);
  });

  it('takes interlocked cells from a joint table, which interlocks its variables by itself', () => {
    const joint = file('j.csv', 'variable,category,share\nage × sex,young × female,20\nage × sex,young × male,30\nage × sex,old × female,35\nage × sex,old × male,15\nregion,north,2\nregion,south,1\n');
    const out = JSON.parse(plumbline('quotas', '--targets', joint, '--total', '100').stdout);
    expect(out.sets.map((s: { variables: string[] }) => s.variables)).toEqual([['age', 'sex'], ['region']]);
    // The table's own shares (young men 30%), where the product of its margins would give 50% × 45% = 22.5%.
    expect(out.sets[0].cells.map((c: { target: number }) => c.target)).toEqual([20, 30, 35, 15]);
    expectRejected(plumbline('quotas', '--targets', joint, '--total', '100', '--interlock', 'age,region'), 'j.csv', 'the joint table interlocks age, sex');
  });

  it('rejects an interlock variable that is not in the targets, and a bad total', () => {
    expectRejected(plumbline('quotas', '--targets', targets, '--total', '100', '--interlock', 'age,edu'), '"edu"', 'q.csv');
    expectRejected(plumbline('quotas', '--targets', targets, '--total', '0'), '--total');
  });
});

describe('the plumbline executable', () => {
  const bin = join(process.cwd(), 'api/bin/plumbline.js');

  it('prints one JSON object and exits 0 on good input', () => {
    const out = execFileSync(process.execPath, [bin, 'posterior', '--successes', '1', '--trials', '2'], { encoding: 'utf8' });
    expect(JSON.parse(out).alpha).toBe(2);
  });

  it('exits with code 2 and a one-line reason on bad input', () => {
    let status = 0;
    let stderr = '';
    try {
      execFileSync(process.execPath, [bin, 'rates', '--input', join(dir, 'nothing.csv')], { encoding: 'utf8', stdio: 'pipe' });
    } catch (error) {
      ({ status, stderr } = error as { status: number; stderr: string });
    }
    expect(status).toBe(2);
    expect(stderr.trim().split('\n')).toHaveLength(1);
    expect(stderr).toContain('nothing.csv');
  });
});
