// Recognised devices. After a successful sign-in the browser gets a signed, HttpOnly
// cookie (`plumbline_device`: a random device id and hashes of the e-mails that have
// signed in on it). A cookie rather than an id the app keeps: scripts cannot read it, so
// an injected script cannot copy it elsewhere; the app needs no code for it (fetch sends
// it on same-origin requests); and the signature means an attacker cannot make one up.
// A recognised device is exempt from the account's delay (an attacker guessing a known
// e-mail cannot keep its owner out) and from the per-address limit; its own failures are
// counted under the device instead, on the same growing schedule.
import { Inject, Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import type { CookieOptions } from 'express';
import { createHash, randomUUID } from 'node:crypto';
import { APP_CONFIG } from '../config/config.constants.js';
import type { AppConfig } from '../config/config.js';

export const DEVICE_COOKIE = 'plumbline_device';
const DEVICE_AUDIENCE = 'plumbline-device';
const DEVICE_TTL_SECONDS = 365 * 24 * 60 * 60;
/** A shared phone remembers this many accounts; the oldest is forgotten first. */
const MAX_ACCOUNTS_PER_DEVICE = 8;

export interface Device {
  id: string;
  accounts: string[];
}

/** A short, stable name for an e-mail address that does not reveal it. */
export function accountKey(email: string): string {
  return createHash('sha256').update(email.trim().toLowerCase()).digest('hex').slice(0, 32);
}

/** The value of one cookie in a Cookie header (RFC 6265 section 5.4), or null. */
export function readCookie(header: string | undefined, name: string): string | null {
  for (const part of (header ?? '').split(';')) {
    const eq = part.indexOf('=');
    if (eq > 0 && part.slice(0, eq).trim() === name) return part.slice(eq + 1).trim();
  }
  return null;
}

@Injectable()
export class DeviceCookies {
  // A key of its own, derived from the JWT secret, so a device cookie can never pass as an access token.
  private readonly secret: string;

  constructor(
    private readonly jwt: JwtService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {
    this.secret = createHash('sha256').update(`device-cookie:${config.jwtSecret}`).digest('hex');
  }

  read(cookieHeader: string | undefined): Device | null {
    const value = readCookie(cookieHeader, DEVICE_COOKIE);
    if (!value) return null;
    try {
      const payload = this.jwt.verify<{ did?: unknown; acc?: unknown }>(value, {
        secret: this.secret,
        audience: DEVICE_AUDIENCE,
        algorithms: ['HS256'],
      });
      if (typeof payload.did !== 'string' || !Array.isArray(payload.acc)) return null;
      return { id: payload.did, accounts: payload.acc.filter((a): a is string => typeof a === 'string') };
    } catch {
      return null;
    }
  }

  /** The cookie value after a successful sign-in of `account` on this device. */
  remember(device: Device | null, account: string): string {
    const accounts = [...(device?.accounts ?? []).filter((a) => a !== account), account].slice(-MAX_ACCOUNTS_PER_DEVICE);
    return this.jwt.sign(
      { did: device?.id ?? randomUUID(), acc: accounts },
      { secret: this.secret, audience: DEVICE_AUDIENCE, algorithm: 'HS256', expiresIn: DEVICE_TTL_SECONDS },
    );
  }

  options(secureRequest: boolean): CookieOptions {
    return {
      httpOnly: true,
      sameSite: 'strict',
      secure: secureRequest || this.config.tlsInFront,
      path: '/api/auth',
      maxAge: DEVICE_TTL_SECONDS * 1000,
    };
  }
}
