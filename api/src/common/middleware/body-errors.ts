import type { NextFunction, Request, Response } from 'express';
import { errorBody } from '../filters/http-exception.filter.js';

/**
 * Errors raised by the JSON body parser happen before Nest routes a request, so they
 * are shaped here, in the same form as every other error.
 */
export function bodyErrorHandler(err: unknown, _req: Request, res: Response, next: NextFunction): void {
  const e = err as { type?: string; status?: number; limit?: number } | undefined;
  if (e?.type === 'entity.too.large') {
    res.status(413).json(errorBody(413, `The request body is larger than the limit of ${e.limit} bytes`));
  } else if (e?.type === 'entity.parse.failed') {
    // The parser takes only objects and lists: a lone string or number is JSON, but not a request.
    const message = isJson((err as { body?: unknown }).body) ? 'The request body must be a JSON object or list' : 'The request body is not valid JSON';
    res.status(400).json(errorBody(400, message));
  } else if (e?.type === 'encoding.unsupported' || e?.type === 'charset.unsupported') {
    res.status(415).json(errorBody(415, 'The request body must be UTF-8 JSON'));
  } else {
    next(err);
  }
}

function isJson(text: unknown): boolean {
  if (typeof text !== 'string') return false;
  try {
    JSON.parse(text);
    return true;
  } catch {
    return false;
  }
}
