import { ExecutionContext, HttpException, Injectable, UnauthorizedException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { IS_PUBLIC } from '../decorators/public.decorator.js';

/** Applied to every route; @Public() routes skip it. */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  override canActivate(context: ExecutionContext) {
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, [context.getHandler(), context.getClass()]);
    return isPublic ? true : super.canActivate(context);
  }

  override handleRequest<T>(err: unknown, user: T, info: unknown): T {
    // The user look-up failed for another reason than the token (the database is down):
    // let the error filter answer for it rather than call the token invalid.
    if (err && !(err instanceof HttpException)) throw err;
    // The token was sound but its sign-in or account is over: say which.
    if (err instanceof UnauthorizedException) throw err;
    if (err || !user) {
      const reason = info instanceof Error ? info.message : '';
      if (reason === 'jwt expired') throw new UnauthorizedException('Your sign-in has expired; refresh it or sign in again');
      if (reason === 'No auth token') throw new UnauthorizedException('Sign in first: this needs an access token');
      throw new UnauthorizedException('The access token is not valid');
    }
    return user;
  }
}
