import type { NextFunction, Request, Response } from 'express';
import { errorBody } from '../filters/http-exception.filter.js';

/**
 * Limits on the shape of a parsed JSON body, checked before validation and before any
 * route sees it. Validation and class-transformer recurse and list every problem, so a
 * body that is small in bytes but deep or wide could otherwise hold a CPU for seconds
 * (and the other requests with it) or overflow the stack. The largest legitimate body, a
 * sync batch of 1,000 interviews, is about 30 levels shallower, 5 times narrower and has
 * under half as many values as these limits allow.
 */
export const BODY_SHAPE = {
  /** Levels of objects and arrays inside one another (a sync batch uses 4). */
  maxDepth: 32,
  /** Fields of one object (an interview's categories name at most 20 variables). */
  maxFields: 100,
  /** Values of every kind in the whole body (a full sync batch has about 30,000). */
  maxValues: 60_000,
} as const;

export interface ShapeProblem {
  field: string;
  message: string;
}

function join(path: string, key: string | number): string {
  return path ? `${path}.${key}` : String(key);
}

/**
 * The first way the body breaks the limits above; null when it keeps to them. Iterative, so
 * depth cannot overflow it. (Text is checked by the DTOs' rules, and a sync batch's items one by
 * one, so one interview with a NUL character is that item's rejection, not the batch's.)
 */
export function shapeProblem(body: unknown): ShapeProblem | null {
  const stack: { value: unknown; path: string; depth: number }[] = [{ value: body, path: '', depth: 0 }];
  let values = 0;
  while (stack.length > 0) {
    const { value, path, depth } = stack.pop()!;
    if (++values > BODY_SHAPE.maxValues) {
      return { field: '', message: `The request body holds more than ${BODY_SHAPE.maxValues} values` };
    }
    if (typeof value !== 'object' || value === null) continue;
    if (depth >= BODY_SHAPE.maxDepth) {
      return { field: path, message: `The request body is nested more than ${BODY_SHAPE.maxDepth} levels deep` };
    }
    if (Array.isArray(value)) {
      if (values + stack.length + value.length > BODY_SHAPE.maxValues) {
        return { field: '', message: `The request body holds more than ${BODY_SHAPE.maxValues} values` };
      }
      value.forEach((item, i) => stack.push({ value: item, path: join(path, i), depth: depth + 1 }));
      continue;
    }
    const keys = Object.keys(value);
    if (keys.length > BODY_SHAPE.maxFields) {
      return { field: path, message: `${path || 'The request body'} has ${keys.length} fields; at most ${BODY_SHAPE.maxFields} are accepted` };
    }
    for (const key of keys) {
      stack.push({ value: (value as Record<string, unknown>)[key], path: join(path, key), depth: depth + 1 });
    }
  }
  return null;
}

/** Refuses a parsed JSON body that breaks the shape limits, in the common error shape. */
export function bodyShape(req: Request, res: Response, next: NextFunction): void {
  const problem = req.body === undefined ? null : shapeProblem(req.body);
  if (!problem) return next();
  const fields = problem.field ? [{ field: problem.field, message: problem.message }] : undefined;
  res.status(400).json(errorBody(400, problem.message, fields));
}
