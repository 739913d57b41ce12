// Helpers for the fieldwork suites: an API client per signed-in user and a standard
// set of quota targets (invented, for tests only).
import { randomUUID } from 'node:crypto';
import { expect } from 'vitest';
import { createOrg, signIn, type Harness, type TestOrg } from './harness.js';

export async function client(h: Harness, org: TestOrg, role: keyof TestOrg['users']) {
  const { accessToken } = await signIn(h, org.users[role].email);
  const auth = { Authorization: `Bearer ${accessToken}` };
  return {
    get: (path: string) => h.http().get(path).set(auth),
    post: (path: string, body?: object) => h.http().post(path).set(auth).send(body),
    put: (path: string, body: object) => h.http().put(path).set(auth).send(body),
    patch: (path: string, body: object) => h.http().patch(path).set(auth).send(body),
    upload: (path: string, content: string | Buffer, name = 'targets.csv', fields: Record<string, string> = {}) => {
      const req = h.http().post(path).set(auth);
      for (const [k, v] of Object.entries(fields)) req.field(k, v);
      return req.attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content, 'utf8'), name);
    },
    token: accessToken,
  };
}

export const TARGETS = {
  variables: [
    { name: 'age', interlocked: true, categories: [{ label: '18-34', share: 0.3 }, { label: '35-59', share: 0.4 }, { label: '60+', share: 0.3 }] },
    { name: 'sex', interlocked: true, categories: [{ label: 'female', share: 0.52 }, { label: 'male', share: 0.48 }] },
    { name: 'region', categories: [{ label: 'North', share: 0.5 }, { label: 'South', share: 0.3 }, { label: 'Coast', share: 0.2 }] },
  ],
};

export interface Targets {
  variables: { id: string; name: string; categories: { id: string; label: string }[] }[];
}

/** Category ids for a respondent described by labels, e.g. { age: '18-34', sex: 'female', region: 'North' }. */
export function pick(targets: Targets, labels: Record<string, string>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const v of targets.variables) {
    const label = labels[v.name];
    if (label === undefined) continue;
    const c = v.categories.find((x) => x.label === label);
    if (!c) throw new Error(`no category ${label} in ${v.name}`);
    out[v.id] = c.id;
  }
  return out;
}

export function complete(categories: Record<string, string>, headlineAnswer = true, at = '2026-11-20T10:00:00.000Z') {
  const end = new Date(Date.parse(at) + 15 * 60_000).toISOString();
  return { id: randomUUID(), disposition: 'complete', categories, headlineAnswer, startedAt: at, endedAt: end };
}

/** An organisation with a project taking interviews: the standard targets set, its lead and interviewer signed in. */
export async function syncProject(h: Harness, name: string, project: Record<string, unknown> = {}) {
  const org = await createOrg(h.db, name);
  const lead = await client(h, org, 'lead');
  const { status, ...details } = project;
  await lead.patch(`/api/projects/${org.projectId}`, { targetSize: 100, headlineQuestion: 'Support?', ...details });
  const targets = (await lead.put(`/api/projects/${org.projectId}/targets`, TARGETS)).body as Targets;
  // Fieldwork starts only once there are targets (and a team, which createOrg assigns).
  if (status !== undefined) expect((await lead.patch(`/api/projects/${org.projectId}`, { status })).status).toBe(200);
  const interviewer = await client(h, org, 'interviewer');
  return { org, lead, targets, interviewer, syncPath: `/api/projects/${org.projectId}/interviews/sync` };
}
