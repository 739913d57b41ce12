import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { AuthUser } from '../roles.js';

export const CurrentUser = createParamDecorator(
  (_data: unknown, context: ExecutionContext): AuthUser => context.switchToHttp().getRequest().user,
);
