export interface FieldProblem {
  field: string;
  message: string;
}

/**
 * What went wrong with a request, in words a person can read.
 * kind: 'http' the server answered with an error; 'offline' no network;
 * 'signed-out' the sign-in has ended and the user must sign in again.
 */
export class ApiError extends Error {
  constructor(
    message: string,
    readonly kind: 'http' | 'offline' | 'signed-out',
    readonly status = 0,
    readonly fields: FieldProblem[] = [],
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

export function isApiError(value: unknown): value is ApiError {
  return value instanceof ApiError;
}

export const offlineMessage = 'You are offline. This needs the network; it will work again once you are back online.';
export const signedOutMessage = 'Your sign-in has ended. Please sign in again.';
