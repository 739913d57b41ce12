import { ForbiddenException, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { describe, expect, it } from 'vitest';
import { BalanceController } from '../../balance/balance.controller.js';
import { InterviewsController } from '../../interviews/interviews.controller.js';
import { ProjectsController } from '../../projects/projects.controller.js';
import { QuotasController } from '../../quotas/quotas.controller.js';
import { UsersController } from '../../users/users.controller.js';
import { Roles } from '../decorators/roles.decorator.js';
import { ROLES, type AuthUser, type Role } from '../roles.js';
import { RolesGuard } from './roles.guard.js';

type Handler = (...args: never[]) => unknown;

function contextFor(controller: abstract new (...args: never[]) => object, method: string, user: AuthUser | undefined): ExecutionContext {
  const handler = (controller.prototype as Record<string, Handler>)[method];
  if (!handler) throw new Error(`${controller.name} has no method ${method}`);
  return {
    getHandler: () => handler,
    getClass: () => controller,
    switchToHttp: () => ({ getRequest: () => ({ user }) }),
  } as unknown as ExecutionContext;
}

const userWith = (role: Role): AuthUser => ({ id: 'u1', organisationId: 'o1', role, email: `${role}@example.test`, name: role });

/** True when the guard lets the role through; false when it answers 403. */
function allows(controller: abstract new (...args: never[]) => object, method: string, role: Role | undefined): boolean {
  const guard = new RolesGuard(new Reflector());
  try {
    return guard.canActivate(contextFor(controller, method, role ? userWith(role) : undefined));
  } catch (error) {
    if (error instanceof ForbiddenException) return false;
    throw error;
  }
}

@Roles('supervisor')
class Sample {
  @Roles()
  closed() {}
  @Roles('lead', 'admin')
  leadsOnly() {}
  inheritsClass() {}
}
class Unmarked {
  anyone() {}
}

describe('RolesGuard, role by role', () => {
  it.each(ROLES)('lets %s through a route with no roles given', (role) => {
    expect(allows(Unmarked, 'anyone', role)).toBe(true);
  });

  it.each(ROLES)('lets %s through a route limited to lead and admin only if it is one of them', (role) => {
    expect(allows(Sample, 'leadsOnly', role)).toBe(role === 'lead' || role === 'admin');
  });

  it.each(ROLES)('applies the controller’s roles to %s where the route names none', (role) => {
    expect(allows(Sample, 'inheritsClass', role)).toBe(role === 'supervisor');
  });

  it.each(ROLES)('refuses %s on a route that names an empty list of roles', (role) => {
    expect(allows(Sample, 'closed', role)).toBe(false);
  });

  it('refuses a limited route when no user is signed in, and says which roles it needs', () => {
    const guard = new RolesGuard(new Reflector());
    expect(() => guard.canActivate(contextFor(Sample, 'leadsOnly', undefined))).toThrow('This needs one of the roles: lead, admin');
  });
});

// Who may do what (the roles table in the product design: admins manage people, leads set up
// projects, supervisors run the board, interviewers send interviews, clients only read), as the
// real controllers declare it.
const RULES: [string, abstract new (...args: never[]) => object, string, Role[]][] = [
  ['add a person', UsersController, 'create', ['admin']],
  ['list people', UsersController, 'list', ['admin', 'lead']],
  ['create a project', ProjectsController, 'create', ['lead', 'admin']],
  ['see the projects one may see', ProjectsController, 'list', [...ROLES]],
  ['save quota targets', QuotasController, 'saveTargets', ['lead', 'admin']],
  ['close a cell', QuotasController, 'close', ['supervisor', 'lead']],
  ['read the quota board', QuotasController, 'board', ['supervisor', 'lead', 'admin']],
  ['send interviews', InterviewsController, 'sync', ['interviewer']],
  ['export interviews', InterviewsController, 'export', ['lead', 'admin']],
  ['read the balance', BalanceController, 'balance', ['lead', 'admin', 'supervisor', 'client']],
];

describe('who may do what on the real routes', () => {
  it.each(RULES)('%s', (_what, controller, method, allowed) => {
    for (const role of ROLES) expect([role, allows(controller, method, role)]).toEqual([role, allowed.includes(role)]);
  });
});
