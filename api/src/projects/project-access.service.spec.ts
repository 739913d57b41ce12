// ProjectAccess decides who sees which project. No database here: Knex builds the real SQL,
// and a stand-in connection answers it from a small in-memory organisation, so each role's
// query is checked by what it returns (and a typo in a column is seen in the SQL it prints).
import { ForbiddenException, NotFoundException } from '@nestjs/common';
import knex, { type Knex } from 'knex';
import { describe, expect, it } from 'vitest';
import type { AuthUser, Role } from '../common/roles.js';
import { ProjectAccess } from './project-access.service.js';

interface Query {
  sql: string;
  bindings: readonly unknown[];
}

const ORG = 'org-1';
const OTHER_ORG = 'org-2';
const PROJECTS = [
  { id: 'p-assigned', organisation_id: ORG, name: 'Assigned' },
  { id: 'p-unassigned', organisation_id: ORG, name: 'Not assigned' },
  { id: 'p-foreign', organisation_id: OTHER_ORG, name: 'Another agency' },
];
/** Memberships: the field staff of ORG are on p-assigned only. */
const MEMBERS = new Set(['p-assigned/u-interviewer', 'p-assigned/u-client', 'p-assigned/u-supervisor']);

/**
 * Answers the three statements ProjectAccess sends, by meaning: projects of an organisation,
 * optionally only those the user is a member of, optionally one id. Anything else fails loudly.
 */
function answer({ sql, bindings }: Query): Record<string, unknown>[] {
  const text = sql.replace(/\s+/g, ' ');
  if (!/^select .* from "projects" where /.test(text)) throw new Error(`unexpected query: ${text}`);
  const args = [...bindings];
  const memberOf = (projectId: string, userId: unknown) => MEMBERS.has(`${projectId}/${String(userId)}`);
  if (text.includes('AS is_member')) {
    // findForInterviewer: EXISTS(... user_id = $1) AS is_member ... where id = $2 and organisation_id = $3
    const [userId, id, organisationId] = args;
    return PROJECTS.filter((p) => p.id === id && p.organisation_id === organisationId).map((p) => ({ ...p, is_member: memberOf(p.id, userId) }));
  }
  const organisationId = args.shift();
  let rows = PROJECTS.filter((p) => p.organisation_id === organisationId);
  if (text.includes('exists (select * from "project_members" where project_members.project_id = projects.id and "project_members"."user_id" = ')) {
    const userId = args.shift();
    rows = rows.filter((p) => memberOf(p.id, userId));
  }
  if (text.includes('"projects"."id" = ')) {
    const id = args.shift();
    rows = rows.filter((p) => p.id === id);
  }
  return rows;
}

function fakeDb(): Knex {
  const db = knex({ client: 'pg' });
  const client = db.client as unknown as Record<string, unknown>;
  client.acquireConnection = async () => ({});
  client.releaseConnection = async () => undefined;
  client._query = async (_connection: unknown, obj: Query & { response?: unknown }) => {
    const bindings = obj.bindings ?? [];
    obj.response = { rows: answer({ sql: obj.sql.replace(/\$\d+/g, '?'), bindings }), rowCount: 0, command: 'SELECT' };
    return obj;
  };
  return db;
}

const user = (role: Role, organisationId = ORG): AuthUser => ({ id: `u-${role}`, organisationId, role, email: `${role}@example.test`, name: role });
const access = new ProjectAccess(fakeDb());

describe('ProjectAccess, role by role', () => {
  it.each<[Role, string[]]>([
    ['admin', ['p-assigned', 'p-unassigned']],
    ['lead', ['p-assigned', 'p-unassigned']],
    ['supervisor', ['p-assigned', 'p-unassigned']],
    ['interviewer', ['p-assigned']],
    ['client', ['p-assigned']],
  ])('lets %s see %j of its organisation, never another’s', async (role, expected) => {
    const rows: { id: string }[] = await access.visibleProjects(user(role)).select('projects.*');
    expect(rows.map((r) => r.id).sort()).toEqual(expected);
  });

  it.each<Role>(['admin', 'lead', 'supervisor', 'interviewer', 'client'])('answers 404 to %s for another organisation’s project', async (role) => {
    await expect(access.find(user(role), 'p-foreign')).rejects.toBeInstanceOf(NotFoundException);
  });

  it.each<[Role, boolean]>([
    ['admin', true],
    ['lead', true],
    ['supervisor', true],
    ['interviewer', false],
    ['client', false],
  ])('finds a project nobody assigned %s to: %s', async (role, found) => {
    const result = access.find(user(role), 'p-unassigned');
    if (found) expect((await result).name).toBe('Not assigned');
    else await expect(result).rejects.toThrow('No such project');
  });

  it('lets an interviewer log interviews only on an assigned project of the organisation', async () => {
    const interviewer = user('interviewer');
    expect(await access.findForInterviewer(interviewer, 'p-assigned')).toEqual(PROJECTS[0]);
    await expect(access.findForInterviewer(interviewer, 'p-unassigned')).rejects.toBeInstanceOf(ForbiddenException);
    await expect(access.findForInterviewer(interviewer, 'p-foreign')).rejects.toBeInstanceOf(NotFoundException);
    await expect(access.findForInterviewer(user('interviewer', OTHER_ORG), 'p-assigned')).rejects.toBeInstanceOf(NotFoundException);
  });
});
