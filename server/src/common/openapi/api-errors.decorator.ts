import { applyDecorators } from '@nestjs/common';
import { ApiResponse } from '@nestjs/swagger';
import { ApiErrorModel } from './api-error.model.js';

/** What each error answer means in Lockstep (docs/design.md, "API error conventions"); the body is always ApiErrorModel. */
export const ERROR_DESCRIPTIONS = {
  400: 'Bad input: `errors` names each failing field',
  401: 'No valid sign-in token',
  403: 'The signed-in role may not do this',
  404: 'Nothing with that id',
  409: 'The thing is not in a state that allows this (e.g. verifying an order twice)',
  413: 'The request body is too large',
  429: 'Too many wrong passwords or password checks: wait (see Retry-After) or ask an admin',
} as const;

export type ErrorStatus = keyof typeof ERROR_DESCRIPTIONS;

/** One error answer with a description of its own, e.g. sign-in's 401. */
export function ApiError(status: ErrorStatus, description: string = ERROR_DESCRIPTIONS[status]) {
  return ApiResponse({ status, description, type: ApiErrorModel });
}

/**
 * The error answers a route gives from its own service (404, 409).
 * The answers every route of a kind gives (401 and 403 from the guards; 400, 413 and 429 from
 * the body and parameters) are added to the document from the route itself (document-access.ts).
 */
export const ApiErrors = (...statuses: ErrorStatus[]) => applyDecorators(...statuses.map((status) => ApiError(status)));
