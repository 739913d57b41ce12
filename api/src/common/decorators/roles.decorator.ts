import { SetMetadata } from '@nestjs/common';
import type { Role } from '../roles.js';

export const ROLES_KEY = 'plumbline:roles';
/** Limits a route (or a whole controller) to the given roles. */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);
