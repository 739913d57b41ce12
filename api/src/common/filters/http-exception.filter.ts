import { ArgumentsHost, Catch, ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { Response } from 'express';
import { STATUS_CODES } from 'node:http';

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
      res.status(status).json(errorBody(status, message, fields));
      return;
    }
    this.logger.error(exception instanceof Error ? exception.stack : String(exception));
    const status = HttpStatus.INTERNAL_SERVER_ERROR;
    res.status(status).json(errorBody(status, 'Something went wrong on the server; nothing was changed'));
  }
}
