import { CallHandler, ExecutionContext, Injectable, NestInterceptor, UnsupportedMediaTypeException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { DECORATORS } from '@nestjs/swagger';
import type { Request } from 'express';
import type { Observable } from 'rxjs';

const JSON_ONLY = ['application/json'];
const WITH_BODY = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/**
 * A request body in a type the route does not read is answered 415, naming both types, rather
 * than being ignored and then reported as missing fields. Routes take JSON unless their
 * OpenAPI description says otherwise (`@ApiConsumes`), so the documentation and the rule agree.
 */
@Injectable()
export class ContentTypeInterceptor implements NestInterceptor {
  constructor(private readonly reflector: Reflector) {}

  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    const req = context.switchToHttp().getRequest<Request>();
    if (context.getType() === 'http' && WITH_BODY.has(req.method) && hasContent(req)) {
      const consumes =
        this.reflector.getAllAndOverride<string[] | undefined>(DECORATORS.API_CONSUMES, [context.getHandler(), context.getClass()]) ?? JSON_ONLY;
      if (!req.is(consumes)) {
        const sent = req.headers['content-type'] ? `was sent as ${req.headers['content-type'].split(';')[0]}` : 'has no Content-Type';
        throw new UnsupportedMediaTypeException(`This request takes ${consumes.join(' or ')}; its body ${sent}`);
      }
    }
    return next.handle();
  }
}

function hasContent(req: Request): boolean {
  const length = Number(req.headers['content-length']);
  return req.headers['transfer-encoding'] !== undefined || (Number.isFinite(length) && length > 0);
}
