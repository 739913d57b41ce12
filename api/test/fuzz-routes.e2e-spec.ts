// Property: whatever JSON (or file, or text) arrives at any route, from any role, the API never
// answers 5xx, and every error has the one documented shape. The routes come from the OpenAPI
// document, so a new route is fuzzed without touching this file.
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../src/common/roles.js';
import { client, syncProject } from './fieldwork-helpers.js';
import { startApp, type Harness } from './harness.js';

interface Schema {
  $ref?: string;
  type?: string;
  required?: string[];
  properties?: Record<string, Schema>;
  items?: Schema;
  enum?: unknown[];
  example?: unknown;
}
interface Operation {
  requestBody?: { content?: Record<string, { schema?: Schema }> };
}
interface Route {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: string;
  body: Schema | null;
}

let h: Harness;
let routes: Route[];
let schemas: Record<string, Schema>;
let tokens: Record<Role, string>;
let ids: { project: string; user: string; cell: string };

beforeAll(async () => {
  h = await startApp();
  const { org, lead } = await syncProject(h, 'Fuzz');
  tokens = {} as Record<Role, string>;
  for (const role of ROLES) tokens[role] = (await client(h, org, role)).token;
  const cellId = (await lead.get(`/api/projects/${org.projectId}/cells`)).body.cells[0].id as string;
  ids = { project: org.projectId, user: org.users.interviewer.id, cell: cellId };
  const doc = (await h.http().get('/api/docs-json')).body as { paths: Record<string, Record<string, Operation>>; components: { schemas: Record<string, Schema> } };
  schemas = doc.components.schemas;
  routes = Object.entries(doc.paths).flatMap(([path, ops]) =>
    Object.entries(ops)
      .filter(([method]) => ['get', 'post', 'put', 'patch', 'delete'].includes(method))
      .map(([method, op]) => ({ method: method as Route['method'], path, body: op.requestBody?.content?.['application/json']?.schema ?? null })),
  );
});
afterAll(() => h.close());

const nested = (depth: number): unknown => (depth === 0 ? 1 : [nested(depth - 1)]);
/** Values that broke a route somewhere once, mixed with whatever fast-check makes up. */
const awkward = fc.oneof(
  { weight: 2, arbitrary: fc.constant(null) },
  { weight: 4, arbitrary: fc.constantFrom<unknown>(
    '', ' \t ', '\u0000', 'a\u0000b', 'x'.repeat(300), 1e308, -1, 0, 0.5, 1e12 + 1, -0, true, {}, [], '=1+2',
    '2026-W01', '20261201', '2026-324', '2026-02-30', 'US/Pacific-New', 'Europe/London', '00000000-0000-0000-0000-000000000000',
    JSON.parse('{"__proto__": {"admin": true}}'), nested(40), Object.fromEntries(Array.from({ length: 150 }, (_, i) => [`k${i}`, i])),
  ) },
  fc.jsonValue({ maxDepth: 3 }),
  fc.string(),
);

/** Values shaped like the schema (so validation is passed now and then) or awkward ones. */
function shaped(schema: Schema | undefined, depth = 0): fc.Arbitrary<unknown> {
  const s = schema?.$ref ? schemas[schema.$ref.split('/').pop()!] : schema;
  const options: fc.Arbitrary<unknown>[] = [awkward];
  if (!s || depth > 3) return awkward;
  if (s.properties) {
    const fields = Object.fromEntries(Object.entries(s.properties).map(([k, v]) => [k, shaped(v, depth + 1)]));
    options.push(fc.record(fields, { requiredKeys: [] }), fc.record(fields));
  }
  if (s.type === 'array') options.push(fc.array(shaped(s.items, depth + 1), { maxLength: 4 }));
  if (s.type === 'string') options.push(fc.string({ maxLength: 20 }));
  if (s.type === 'number' || s.type === 'integer') options.push(fc.integer({ min: -5, max: 5000 }), fc.double({ noNaN: true, noDefaultInfinity: true }));
  if (s.type === 'boolean') options.push(fc.boolean());
  if (s.enum) options.push(fc.constantFrom(...s.enum));
  if (s.example !== undefined) options.push(fc.constant(s.example));
  return fc.oneof(...options);
}

const resolve = (schema: Schema | undefined) => (schema?.$ref ? schemas[schema.$ref.split('/').pop()!] : schema);

/** A body built from the document's examples (required fields only): valid, or close to it. */
function example(schema: Schema | undefined): unknown {
  const s = resolve(schema);
  if (!s) return undefined;
  if (s.example !== undefined) return s.example;
  if (s.enum) return s.enum[0];
  if (s.type === 'array') return [example(s.items)];
  if (!s.properties) return undefined;
  return Object.fromEntries((s.required ?? []).map((k) => [k, example(s.properties![k])]));
}

/** Every place in a value that can be replaced: each field and list item, at any depth. */
function places(value: unknown, path: (string | number)[] = []): (string | number)[][] {
  if (typeof value !== 'object' || value === null) return [];
  const keys: (string | number)[] = Array.isArray(value) ? value.map((_, i) => i) : Object.keys(value);
  return keys.flatMap((k) => [[...path, k], ...places((value as Record<string | number, unknown>)[k], [...path, k])]);
}

function replaced(value: unknown, path: (string | number)[], by: unknown): unknown {
  if (path.length === 0) return by;
  const [head, ...rest] = path as [string | number, ...(string | number)[]];
  const copy = (Array.isArray(value) ? [...value] : { ...(value as object) }) as Record<string | number, unknown>;
  copy[head] = replaced(copy[head], rest, by);
  return copy;
}

/**
 * A valid-looking body with one or two places made awkward: any field or list item at any depth
 * of the example, or any top-level field the schema names (optional ones too).
 */
function damaged(schema: Schema | undefined): fc.Arbitrary<unknown> {
  const s = resolve(schema);
  const base = example(s) ?? {};
  const all = [...places(base), ...Object.keys(s?.properties ?? {}).map((k) => [k])];
  if (all.length === 0) return awkward;
  const change = fc.record({ path: fc.constantFrom(...all), value: awkward });
  return fc.array(change, { minLength: 1, maxLength: 2 }).map((changes) => changes.reduce<unknown>((body, c) => replaced(body, c.path, c.value), base));
}

const csvLine = fc.tuple(fc.string({ maxLength: 12 }), fc.string({ maxLength: 12 }), fc.oneof(fc.double().map(String), fc.string({ maxLength: 6 }))).map((cells) => cells.join(','));
const upload = fc.array(csvLine, { maxLength: 6 }).map((lines) => ['variable,category,share', ...lines].join('\n'));

type Sent = { kind: 'json'; body: unknown } | { kind: 'file'; content: string } | { kind: 'text'; content: string } | { kind: 'none' };

/** The ids that exist for a path's parameters, so most requests get past the look-up to the body. */
function realParams(path: string): string[] {
  return [...path.matchAll(/\{([^}]+)\}/g)].map(([, name]) => (name === 'cellId' ? ids.cell : path.startsWith('/api/users/') ? ids.user : ids.project));
}

function sendTo(route: Route, role: Role, params: string[], sent: Sent) {
  let i = 0;
  const path = route.path.replace(/\{[^}]+\}/g, () => encodeURIComponent(params[i++]!));
  const req = h.http()[route.method](path).set('Authorization', `Bearer ${tokens[role]}`);
  if (sent.kind === 'json') return req.set('Content-Type', 'application/json').send(JSON.stringify(sent.body));
  if (sent.kind === 'file') return req.attach('file', Buffer.from(sent.content, 'utf8'), 'fuzz.csv');
  if (sent.kind === 'text') return req.set('Content-Type', 'text/plain').send(sent.content);
  return req;
}

function expectDocumentedError(what: string, status: number, body: unknown): void {
  expect(status, what).toBeLessThan(500);
  if (status < 400) return;
  expect(body, what).toEqual({
    statusCode: status,
    error: expect.any(String),
    message: expect.any(String),
    ...((body as { fields?: unknown }).fields === undefined
      ? {}
      : { fields: expect.arrayContaining([]) as unknown }),
  });
  const fields = (body as { fields?: unknown[] }).fields;
  for (const f of fields ?? []) expect(f, what).toEqual({ field: expect.any(String), message: expect.any(String) });
}

describe('every route under random input', () => {
  it('lists the routes from the OpenAPI document', () => {
    expect(routes.length).toBeGreaterThan(20);
    expect(routes).toContainEqual(expect.objectContaining({ method: 'put', path: '/api/projects/{projectId}/targets' }));
  });

  it('never answers 5xx and always in the documented error shape', { timeout: 240_000 }, async () => {
    for (const [n, route] of routes.entries()) {
      const count = realParams(route.path).length;
      const params = fc.oneof(
        { weight: 3, arbitrary: fc.constant(realParams(route.path)) },
        fc.array(fc.oneof(fc.uuid(), fc.string({ minLength: 1, maxLength: 40 })), { minLength: count, maxLength: count }),
      );
      const body: fc.Arbitrary<Sent> =
        route.method === 'get'
          ? fc.constant({ kind: 'none' })
          : fc.oneof(
              { weight: 4, arbitrary: shaped(route.body ?? undefined).map((b) => ({ kind: 'json' as const, body: b })) },
              { weight: 4, arbitrary: damaged(route.body ?? undefined).map((b) => ({ kind: 'json' as const, body: b })) },
              upload.map((content) => ({ kind: 'file' as const, content })),
              fc.string().map((content) => ({ kind: 'text' as const, content })),
              fc.constant({ kind: 'none' as const }),
            );
      for (const [r, role] of ROLES.entries()) {
        await fc.assert(
          fc.asyncProperty(params, body, async (values, sent) => {
            const res = await sendTo(route, role, values, sent);
            expectDocumentedError(`${route.method} ${route.path} as ${role}`, res.status, res.body);
          }),
          // Fixed seed and number of runs: the same inputs every time, so a failure reproduces.
          { seed: 20261202 + 10 * n + r, numRuns: 20 },
        );
      }
    }
  });
});
