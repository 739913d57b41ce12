import { ArgumentsHost, Catch, ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { Response } from 'express';
import { STATUS_CODES } from 'node:http';
import { isDatabaseUnavailable, RETRY_AFTER_SECONDS } from '../database-unavailable.js';
import { TooManyRequestsException } from '../exceptions/too-many-requests.exception.js';

/** Retry-After for a 429 that does not say how long to wait (RFC 9110 section 10.2.3, RFC 6585 section 4). */
const DEFAULT_TOO_MANY_RETRY_AFTER_SECONDS = 60;

/** The one error shape every route answers with. */
export interface ErrorBody {
  statusCode: number;
  error: string;
  message: string;
  fields?: { field: string; message: string }[];
}

export function errorBody(statusCode: number, message: string, fields?: ErrorBody['fields']): ErrorBody {
  return { statusCode, error: STATUS_CODES[statusCode] ?? 'Error', message, ...(fields ? { fields } : {}) };
}

@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const res = host.switchToHttp().getResponse<Response>();
    if (isDatabaseUnavailable(exception)) {
      // An outage, not a fault of the request: the device keeps its session and outbox and retries.
      this.logger.warn(`database unavailable: ${(exception as Error).message}`);
      const status = HttpStatus.SERVICE_UNAVAILABLE;
      res.setHeader('Retry-After', String(RETRY_AFTER_SECONDS));
      res.status(status).type('json').json(errorBody(status, 'The database cannot be reached just now; try again in a few seconds.'));
      return;
    }
    if (exception instanceof HttpException) {
      const status = exception.getStatus();
      const payload = exception.getResponse();
      let message = exception.message;
      let fields: ErrorBody['fields'];
      if (typeof payload === 'object' && payload !== null) {
        const p = payload as { message?: unknown; fields?: ErrorBody['fields'] };
        if (typeof p.message === 'string') message = p.message;
        else if (Array.isArray(p.message)) message = p.message.join('; ');
        fields = p.fields;
      }
      if (status === HttpStatus.SERVICE_UNAVAILABLE) res.setHeader('Retry-After', String(RETRY_AFTER_SECONDS));
      if (status === HttpStatus.TOO_MANY_REQUESTS) {
        const wait = exception instanceof TooManyRequestsException ? exception.retryAfterSeconds : DEFAULT_TOO_MANY_RETRY_AFTER_SECONDS;
        res.setHeader('Retry-After', String(Math.max(1, Math.ceil(wait))));
      }
      // Errors are JSON even from a route that declared another type for its answer (the CSV export).
      res.status(status).type('json').json(errorBody(status, message, fields));
      return;
    }
    this.logger.error(exception instanceof Error ? exception.stack : String(exception));
    const status = HttpStatus.INTERNAL_SERVER_ERROR;
    res.status(status).type('json').json(errorBody(status, 'Something went wrong on the server; nothing was changed'));
  }
}
