// Cheap polling: every JSON answer to a GET carries a weak ETag over its content and
// `Cache-Control: private, no-cache`, so a browser keeps the answer and asks again each time
// with If-None-Match; Express's res.send answers 304 with no body when the tag still matches
// (req.fresh). Devices and boards that poll then move almost nothing when nothing changed.
import { CallHandler, ExecutionContext, Injectable, NestInterceptor } from '@nestjs/common';
import type { Request, Response } from 'express';
import { createHash } from 'node:crypto';
import { map, type Observable } from 'rxjs';

/**
 * Top-level fields that read the server's clock at answer time (when a board was refreshed,
 * when a balance was computed), not data: two answers that differ only there are the same
 * version. On a 304 the browser hands back the stored answer, clock fields included.
 */
export const CLOCK_FIELDS: readonly string[] = ['refreshedAt', 'computedAt'];

export function contentTag(body: object): string {
  let content: unknown = body;
  if (!Array.isArray(body)) {
    content = Object.fromEntries(Object.entries(body).filter(([key]) => !CLOCK_FIELDS.includes(key)));
  }
  return `W/"${createHash('sha1').update(JSON.stringify(content)).digest('base64url')}"`;
}

function isPlainJson(body: unknown): body is object {
  if (body === null || typeof body !== 'object') return false;
  return Array.isArray(body) || Object.getPrototypeOf(body) === Object.prototype;
}

@Injectable()
export class EtagInterceptor implements NestInterceptor {
  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    const http = context.switchToHttp();
    if (http.getRequest<Request>().method !== 'GET') return next.handle();
    const res = http.getResponse<Response>();
    return next.handle().pipe(
      map((body: unknown) => {
        if (isPlainJson(body) && !res.headersSent) {
          res.setHeader('ETag', contentTag(body));
          res.setHeader('Cache-Control', 'private, no-cache');
        }
        return body;
      }),
    );
  }
}
