import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { APP_CONFIG } from '../config/config.constants.js';
import type { AppConfig } from '../config/config.js';
import type { AuthUser } from '../common/roles.js';
import { UsersRepository } from '../users/users.repository.js';
import type { AccessTokenPayload } from './auth.service.js';

@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    @Inject(APP_CONFIG) config: AppConfig,
    private readonly users: UsersRepository,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      secretOrKey: config.jwtSecret,
      algorithms: ['HS256'],
      ignoreExpiration: false,
    });
  }

  /** Role and organisation come from the database, so a changed role counts at once. */
  async validate(payload: AccessTokenPayload): Promise<AuthUser> {
    const user = await this.users.findProfile(payload.sub);
    if (!user) throw new UnauthorizedException('This account no longer exists or is disabled');
    return { id: user.id, organisationId: user.organisation.id, role: user.role, email: user.email, name: user.name };
  }
}
