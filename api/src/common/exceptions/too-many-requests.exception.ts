import { HttpException, HttpStatus } from '@nestjs/common';

/** A 429 that knows when to come back; the error filter sends it as `Retry-After`. */
export class TooManyRequestsException extends HttpException {
  constructor(
    message: string,
    readonly retryAfterSeconds: number,
  ) {
    super(message, HttpStatus.TOO_MANY_REQUESTS);
  }
}
