import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { COMMAND_NAMES, runLazily } from './command-loaders.js';
import { run } from './run.js';

const dir = mkdtempSync(join(tmpdir(), 'plumbline-lazy-'));
const missing = join(dir, 'missing.csv');

/** Bad input for each command, as the binary receives it. */
const BAD_INPUT: Record<string, string[]> = {
  weight: ['weight', '--data', missing, '--targets', missing, '--out', join(dir, 'out.csv')],
  posterior: ['posterior', '--successes', '7', '--trials', '5'],
  reconcile: ['reconcile', '--input', join(dir, 'missing.json')],
  rates: ['rates', '--input', missing],
  quotas: ['quotas', '--targets', missing, '--total', '0'],
  'quality-check': ['quality-check', '--project', 'not-an-id'],
  org: ['org', 'create', '--name', 'Harrowby Field', '--admin-email', 'not an address'],
};

async function plumbline(...args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await runLazily(args, { out: (t) => (stdout += t), err: (t) => (stderr += t) });
  return { code, stdout, stderr };
}

describe('plumbline loading only the command it runs', () => {
  it.each(Object.keys(BAD_INPUT))('%s: bad input exits 2 with one line naming the command', async (name) => {
    const result = await plumbline(...(BAD_INPUT[name] as string[]));
    expect(result.code).toBe(2);
    expect(result.stdout).toBe('');
    expect(result.stderr.trim().split('\n')).toHaveLength(1);
    expect(result.stderr).toMatch(new RegExp(`^plumbline ${name}: `));
  });

  it('covers every command, with the same help as when all are loaded', async () => {
    expect(Object.keys(BAD_INPUT).sort()).toEqual([...COMMAND_NAMES].sort());
    let allHelp = '';
    run(['--help'], { out: (t) => (allHelp += t), err: () => undefined });
    const lazy = await plumbline('--help');
    expect(lazy.code).toBe(0);
    expect(lazy.stdout).toBe(allHelp);
    for (const name of COMMAND_NAMES) expect(lazy.stdout).toContain(`plumbline ${name} `);
  });

  it('names every command when the one asked for does not exist, and exits 2', async () => {
    const result = await plumbline('wieght');
    expect(result.code).toBe(2);
    expect(result.stderr).toBe(`plumbline wieght: unknown command "wieght" (commands: ${COMMAND_NAMES.join(', ')})\n`);
  });

  it('treats names of built-in object properties as unknown commands', async () => {
    expect((await plumbline('toString')).code).toBe(2);
  });
});
