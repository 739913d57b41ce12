import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { APP_CONFIG } from '../config/config.constants.js';
import type { AppConfig } from '../config/config.js';
import type { AuthUser } from '../common/roles.js';
import { UsersRepository } from '../users/users.repository.js';
import type { AccessTokenPayload } from './auth.service.js';
import { RefreshTokensRepository } from './refresh-tokens.repository.js';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    @Inject(APP_CONFIG) config: AppConfig,
    private readonly users: UsersRepository,
    private readonly sessions: RefreshTokensRepository,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      secretOrKey: config.jwtSecret,
      algorithms: ['HS256'],
      ignoreExpiration: false,
    });
  }

  /**
   * Role and organisation come from the database, so a changed role counts at once; the
   * sign-in must still stand, so sign-out or a revoked refresh family ends the token at once.
   */
  async validate(payload: Partial<AccessTokenPayload>): Promise<AuthUser> {
    if (typeof payload.sub !== 'string' || typeof payload.sid !== 'string' || !UUID.test(payload.sub) || !UUID.test(payload.sid)) {
      throw new UnauthorizedException('The access token is not valid');
    }
    if (!(await this.sessions.isSessionActive(payload.sid, payload.sub))) {
      throw new UnauthorizedException('This sign-in was ended; sign in again');
    }
    const user = await this.users.findProfile(payload.sub);
    if (!user) throw new UnauthorizedException('This account no longer exists or is disabled');
    return { id: user.id, organisationId: user.organisation.id, role: user.role, email: user.email, name: user.name };
  }
}
