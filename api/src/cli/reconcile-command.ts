import { parseArgs } from 'node:util';
import { EstimationInputError } from '../estimation/errors.js';
import { reconcile, type BenchmarkPoll, type BiasSpec, type MethodGroup, type ReconcileInput } from '../estimation/reconcile.js';
import { readText } from './csv-files.js';
import { CliInputError } from './errors.js';
import { required } from './values.js';

export const RECONCILE_USAGE = 'plumbline reconcile --input FILE.json';

type Json = Record<string, unknown>;
const isObject = (v: unknown): v is Json => typeof v === 'object' && v !== null && !Array.isArray(v);

/** Reconciles benchmark polls across method groups with their bias factors. */
export function reconcileCommand(args: string[]): object {
  const { values } = parseArgs({ args, strict: true, options: { input: { type: 'string' } } });
  const file = required(values.input, 'input');
  const input = parseInput(file, readText(file));
  try {
    return reconcile(input);
  } catch (error) {
    if (error instanceof EstimationInputError) throw new CliInputError(`${file}: ${error.message}`);
    throw error;
  }
}

function parseInput(file: string, text: string): ReconcileInput {
  if (text.trim() === '') throw new CliInputError(`${file}: file is empty`);
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (error) {
    throw new CliInputError(`${file}: not valid JSON${locate(text, (error as Error).message)}`);
  }
  const fail = (where: string, rule: string): never => {
    throw new CliInputError(`${file}: ${where} ${rule}`);
  };
  if (!isObject(raw)) return fail('top level', 'must be an object with "groups" and "polls"');
  allowOnly(raw, ['prior', 'groups', 'polls'], 'top level', fail);
  let prior: [number, number] | undefined;
  if (raw.prior !== undefined) {
    const p = raw.prior;
    if (!Array.isArray(p) || p.length !== 2 || !p.every((x) => typeof x === 'number' && x > 0 && Number.isFinite(x))) {
      return fail('prior', 'must be [a, b] with two positive numbers');
    }
    prior = [p[0] as number, p[1] as number];
  }
  if (!Array.isArray(raw.groups) || raw.groups.length === 0) return fail('groups', 'must be a non-empty array');
  if (!Array.isArray(raw.polls) || raw.polls.length === 0) return fail('polls', 'must be a non-empty array');
  const groups: MethodGroup[] = raw.groups.map((g: unknown, i: number) => {
    const where = `groups[${i}]`;
    if (!isObject(g)) return fail(where, 'must be an object');
    allowOnly(g, ['id', 'bias'], where, fail);
    if (typeof g.id !== 'string' || g.id === '') return fail(`${where}.id`, 'must be a non-empty string');
    return { id: g.id, bias: parseBias(g.bias, `${where} ("${g.id}").bias`, fail) };
  });
  const polls: BenchmarkPoll[] = raw.polls.map((p: unknown, i: number) => {
    const where = `polls[${i}]`;
    if (!isObject(p)) return fail(where, 'must be an object');
    allowOnly(p, ['id', 'group', 'successes', 'trials'], where, fail);
    if (typeof p.id !== 'string' || p.id === '') return fail(`${where}.id`, 'must be a non-empty string');
    if (typeof p.group !== 'string') return fail(`${where} ("${p.id}").group`, 'must be a string naming a group');
    for (const key of ['successes', 'trials'] as const) {
      if (typeof p[key] !== 'number' || !Number.isInteger(p[key]) || (p[key] as number) < 0) {
        return fail(`${where} ("${p.id}").${key}`, 'must be a whole number, 0 or more');
      }
    }
    return { id: p.id, group: p.group, successes: p.successes as number, trials: p.trials as number };
  });
  return { prior, groups, polls };
}

function parseBias(b: unknown, where: string, fail: (w: string, r: string) => never): BiasSpec {
  if (!isObject(b)) return fail(where, 'must be an object with "kind"');
  switch (b.kind) {
    case 'none':
      allowOnly(b, ['kind'], where, fail);
      return { kind: 'none' };
    case 'known':
      allowOnly(b, ['kind', 'factor'], where, fail);
      if (typeof b.factor !== 'number' || !(b.factor > 0 && b.factor < 1)) return fail(`${where}.factor`, 'must be a number strictly between 0 and 1');
      return { kind: 'known', factor: b.factor };
    case 'unknown':
      allowOnly(b, ['kind', 'mean', 'spread'], where, fail);
      for (const key of ['mean', 'spread'] as const) {
        if (b[key] !== undefined && (typeof b[key] !== 'number' || !((b[key] as number) > 0 && (b[key] as number) < 1))) {
          return fail(`${where}.${key}`, 'must be a number strictly between 0 and 1');
        }
      }
      return { kind: 'unknown', mean: b.mean as number | undefined, spread: b.spread as number | undefined };
    default:
      return fail(`${where}.kind`, 'must be "none", "known" or "unknown"');
  }
}

function allowOnly(o: Json, keys: string[], where: string, fail: (w: string, r: string) => never): void {
  for (const key of Object.keys(o)) if (!keys.includes(key)) fail(where, `has an unknown field "${key}" (allowed: ${keys.join(', ')})`);
}

/** " at line L" when the parser's message gives a character position. */
function locate(text: string, message: string): string {
  const position = /position (\d+)/.exec(message);
  if (!position) return `: ${message}`;
  const line = text.slice(0, Number(position[1])).split('\n').length;
  return ` at line ${line}: ${message.replace(/\s*\(line \d+ column \d+\)/, '')}`;
}
