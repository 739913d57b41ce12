// TRUST_PROXY: which peers may tell the API the client's address and protocol
// (X-Forwarded-For, X-Forwarded-Proto). Off by default: the peer's own address counts,
// so a client cannot choose a fresh address on every sign-in attempt.
import { isIP } from 'node:net';
import { ConfigError } from './config-error.js';

/** Express's `trust proxy` value: off, a number of hops, or addresses and named ranges. */
export type TrustProxy = false | number | string[];

const NAMED_RANGES = ['loopback', 'linklocal', 'uniquelocal'];

function validEntry(entry: string): boolean {
  if (NAMED_RANGES.includes(entry)) return true;
  const [address, prefix, ...rest] = entry.split('/');
  const family = isIP(address ?? '');
  if (family === 0 || rest.length > 0) return false;
  if (prefix === undefined) return true;
  return /^\d{1,3}$/.test(prefix) && Number(prefix) <= (family === 4 ? 32 : 128);
}

export function parseTrustProxy(raw: string | undefined): TrustProxy {
  const value = (raw ?? '').trim();
  if (value === '' || value === 'false' || value === 'off') return false;
  if (/^\d+$/.test(value)) {
    const hops = Number(value);
    if (hops < 1 || hops > 10) throw new ConfigError(`TRUST_PROXY as a number of proxy hops must be between 1 and 10, got ${hops}`);
    return hops;
  }
  if (value === 'true') {
    throw new ConfigError('TRUST_PROXY=true would let any client choose its own address; name the proxies (addresses, CIDR ranges, loopback) or a number of hops');
  }
  const entries = value.split(',').map((e) => e.trim());
  const bad = entries.find((e) => !validEntry(e));
  if (bad !== undefined) {
    throw new ConfigError(
      `TRUST_PROXY must be off, a number of proxy hops, or a comma-separated list of addresses, CIDR ranges, ${NAMED_RANGES.join(', ')}; "${bad}" is none of these`,
    );
  }
  return entries;
}
