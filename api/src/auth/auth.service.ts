import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { APP_CONFIG } from '../config/config.constants.js';
import type { AppConfig } from '../config/config.js';
import { UsersRepository, type UserProfile } from '../users/users.repository.js';
import { accountKey, DeviceCookies } from './device-cookie.js';
import { verifyPassword } from './password.js';
import { RefreshTokensRepository } from './refresh-tokens.repository.js';
import { SignInLimiter } from './sign-in-limiter.js';

export interface Session {
  accessToken: string;
  refreshToken: string;
  expiresIn: number;
  user: UserProfile;
}

/** What the access token carries; the user and the sign-in (`sid`) are re-read on every request. */
export interface AccessTokenPayload {
  sub: string;
  org: string;
  role: string;
  /** The sign-in (refresh-token family) this token belongs to: revoking it ends the token at once. */
  sid: string;
}

/** Where a sign-in attempt comes from. */
export interface SignInClient {
  address: string;
  cookieHeader: string | undefined;
}

const REFRESH_REFUSALS = {
  invalid: 'The refresh token is not valid; sign in again',
  expired: 'The sign-in has expired; sign in again',
  revoked: 'This sign-in was ended; sign in again',
  reused: 'This refresh token was already used, so the sign-in was ended for safety; sign in again',
} as const;

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersRepository,
    private readonly refreshTokens: RefreshTokensRepository,
    private readonly limiter: SignInLimiter,
    private readonly devices: DeviceCookies,
    private readonly jwt: JwtService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** Signs in, within the sign-in limit; also returns the device cookie's new value. */
  async signIn(email: string, password: string, client: SignInClient): Promise<{ session: Session; deviceCookie: string }> {
    const device = this.devices.read(client.cookieHeader);
    const attempt = { account: accountKey(email), address: client.address, device };
    await this.limiter.admit(attempt);
    const user = await this.users.findActiveByEmail(email.trim());
    const ok = await verifyPassword(user?.password_hash ?? null, password);
    if (!user || !ok) throw new UnauthorizedException('E-mail or password is not correct');
    await this.limiter.succeeded(attempt);
    const { sessionId, token } = await this.refreshTokens.startSession(user.id, this.config.refreshTokenTtlSeconds);
    const session = await this.session(user.id, sessionId, token);
    return { session, deviceCookie: this.devices.remember(device, attempt.account) };
  }

  async refresh(token: string): Promise<Session> {
    const outcome = await this.refreshTokens.rotate(token, this.config.refreshTokenTtlSeconds);
    if (outcome.kind !== 'ok') throw new UnauthorizedException(REFRESH_REFUSALS[outcome.kind]);
    return this.session(outcome.userId, outcome.sessionId, outcome.token);
  }

  signOut(token: string): Promise<void> {
    return this.refreshTokens.revokeByToken(token);
  }

  async profile(userId: string): Promise<UserProfile> {
    const profile = await this.users.findProfile(userId);
    if (!profile) throw new UnauthorizedException('This account no longer exists or is disabled');
    return profile;
  }

  private async session(userId: string, sessionId: string, refreshToken: string): Promise<Session> {
    const user = await this.profile(userId);
    const payload: AccessTokenPayload = { sub: user.id, org: user.organisation.id, role: user.role, sid: sessionId };
    const accessToken = await this.jwt.signAsync(payload, { expiresIn: this.config.accessTokenTtlSeconds });
    return { accessToken, refreshToken, expiresIn: this.config.accessTokenTtlSeconds, user };
  }
}
