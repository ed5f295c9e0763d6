import { apiErrorSchema, type FieldError } from '@lockstep/shared';

/** An answer from the API that was not a success, or one the client could not read. */
export class ApiRequestError extends Error {
  readonly status: number;
  readonly errors: FieldError[];

  constructor(status: number, message: string, errors: FieldError[] = []) {
    super(message);
    this.name = 'ApiRequestError';
    this.status = status;
    this.errors = errors;
  }
}

/** Status used when no HTTP answer arrived (network down) or the answer could not be read. */
export const NO_RESPONSE_STATUS = 0;

export const NO_RESPONSE_MESSAGE = 'Lockstep cannot reach the server. Check the network and try again.';

export const UNREADABLE_ANSWER_MESSAGE = 'The server sent an answer Lockstep could not read.';

const FALLBACK_MESSAGES: Record<number, string> = {
  400: 'Some of the details are not valid.',
  401: 'Please sign in again.',
  403: 'Your role may not do this.',
  404: 'This could not be found.',
  409: 'This conflicts with a change someone else made. Reload and try again.',
  429: 'Too many attempts. Wait a moment and try again.',
};

function fallbackMessage(status: number): string {
  if (FALLBACK_MESSAGES[status]) return FALLBACK_MESSAGES[status];
  if (status >= 500) return 'Lockstep could not complete this. Try again, and tell support if it keeps happening.';
  return `The request failed (status ${status}).`;
}

/**
 * Builds the typed error for a failed answer. The body is whatever JSON came back (or null):
 * the API's own `{statusCode, message, errors}` shape, or anything a proxy put in its place.
 */
export function toApiRequestError(status: number, body: unknown): ApiRequestError {
  const parsed = apiErrorSchema.safeParse(body);
  if (parsed.success) {
    return new ApiRequestError(status, parsed.data.message || fallbackMessage(status), parsed.data.errors ?? []);
  }
  // Nest's default validation answer carries `message` as a list of strings.
  if (body && typeof body === 'object' && 'message' in body) {
    const message = (body as { message: unknown }).message;
    if (Array.isArray(message) && message.every((m) => typeof m === 'string') && message.length > 0) {
      return new ApiRequestError(status, message.join('. '));
    }
    if (typeof message === 'string' && message.length > 0) return new ApiRequestError(status, message);
  }
  return new ApiRequestError(status, fallbackMessage(status));
}

export function isApiRequestError(error: unknown): error is ApiRequestError {
  return error instanceof ApiRequestError;
}

/**
 * A signed action refused for the password typed, not for the session: the signer's own
 * `signature.password`, or a colleague's `password` / `witness.password` typed on the same screen.
 */
export function isSignatureError(error: unknown): boolean {
  return (
    isApiRequestError(error) &&
    error.errors.some(({ field }) => field.startsWith('signature') || field === 'password' || field.endsWith('.password'))
  );
}

/** A message fit to show a person for any error thrown by a query or mutation. */
export function errorMessage(error: unknown): string {
  if (isApiRequestError(error)) return error.message;
  return 'Something went wrong. Try again.';
}
