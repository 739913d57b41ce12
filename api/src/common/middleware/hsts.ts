import type { RequestHandler } from 'express';

/** One year, subdomains included: helmet's default value (RFC 6797 section 6.1). */
const HSTS_VALUE = 'max-age=31536000; includeSubDomains';

/**
 * Strict-Transport-Security only on answers to HTTPS requests (RFC 6797 section 7.2: a
 * host must not send it over plain HTTP). `req.secure` is true for a direct TLS connection
 * or, with TRUST_PROXY set, for X-Forwarded-Proto: https from a trusted proxy;
 * TLS_IN_FRONT says every request arrived over HTTPS at a proxy in front.
 */
export function hsts(tlsInFront: boolean): RequestHandler {
  return (req, res, next) => {
    if (tlsInFront || req.secure) res.setHeader('Strict-Transport-Security', HSTS_VALUE);
    next();
  };
}
