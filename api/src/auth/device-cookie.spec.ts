import { JwtService } from '@nestjs/jwt';
import { describe, expect, it } from 'vitest';
import { loadConfig } from '../config/config.js';
import { accountKey, DEVICE_COOKIE, DeviceCookies, readCookie } from './device-cookie.js';

const config = loadConfig({ DATABASE_URL: 'postgres://u:p@127.0.0.1:1/x', JWT_SECRET: 's'.repeat(40), SMTP_URL: 'smtp://127.0.0.1:1' });
const jwt = new JwtService({ secret: config.jwtSecret });
const devices = new DeviceCookies(jwt, config);

describe('device cookie', () => {
  it('finds one cookie among several (RFC 6265 section 5.4)', () => {
    expect(readCookie('a=1; plumbline_device=abc.def; b=2', DEVICE_COOKIE)).toBe('abc.def');
    expect(readCookie('xplumbline_device=1', DEVICE_COOKIE)).toBeNull();
    expect(readCookie(undefined, DEVICE_COOKIE)).toBeNull();
  });

  it('remembers the accounts that signed in on the device, keeping its id', () => {
    const first = devices.read(`${DEVICE_COOKIE}=${devices.remember(null, accountKey('A@x.example'))}`)!;
    expect(first.accounts).toEqual([accountKey('a@x.example')]);
    const second = devices.read(`${DEVICE_COOKIE}=${devices.remember(first, accountKey('b@x.example'))}`)!;
    expect(second.id).toBe(first.id);
    expect(second.accounts).toEqual([accountKey('a@x.example'), accountKey('b@x.example')]);
  });

  it('refuses a cookie signed with the access-token key, so neither can stand in for the other', () => {
    const asAccessKey = jwt.sign({ did: 'd', acc: [accountKey('a@x.example')] }, { audience: 'plumbline-device' });
    expect(devices.read(`${DEVICE_COOKIE}=${asAccessKey}`)).toBeNull();
    expect(devices.read(`${DEVICE_COOKIE}=garbage`)).toBeNull();
  });
});
