import { HttpException, HttpStatus } from '@nestjs/common';

/** A 429 in the API's error shape; the exception filter turns `retryAfterSeconds` into Retry-After. */
export class TooManyAttemptsException extends HttpException {
  constructor(
    message: string,
    readonly retryAfterSeconds: number,
  ) {
    super({ statusCode: HttpStatus.TOO_MANY_REQUESTS, message }, HttpStatus.TOO_MANY_REQUESTS);
  }
}

/** "1 minute", "15 minutes": whole minutes, rounded up, so nobody retries a moment too soon. */
export function minutesText(ms: number): string {
  const minutes = Math.max(1, Math.ceil(ms / 60_000));
  return minutes === 1 ? '1 minute' : `${minutes} minutes`;
}
