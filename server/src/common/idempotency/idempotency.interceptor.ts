import { type CallHandler, type ExecutionContext, Injectable, type NestInterceptor } from '@nestjs/common';
import type { Request, Response } from 'express';
import { from, lastValueFrom, type Observable } from 'rxjs';
import type { AuthUser } from '../../auth/auth-user.js';
import {
  bodyHash,
  IDEMPOTENCY_KEY_HEADER,
  IDEMPOTENT_REPLAYED_HEADER,
  IdempotencyService,
  parseIdempotencyKey,
  type RequestFingerprint,
} from './idempotency.service.js';

/**
 * Every POST that carries an `Idempotency-Key` header from a signed-in user runs at most once per
 * user and key (see IdempotencyService): the same request sent again, even while the first is still
 * running, gets the first one's status and body with `Idempotent-Replayed: true`, and writes
 * nothing. The key is claimed before the handler (and its validation pipe) runs and is freed when
 * the request fails, so a corrected form sent with the same key runs. Without the header, without
 * a signed-in user (signing in), or for a file upload (multipart: its body is not parsed yet here,
 * so it cannot be compared), a request runs as it always did. Registered globally
 * (IdempotencyModule), so after the guards: a refused token or role never claims a key.
 */
@Injectable()
export class IdempotencyInterceptor implements NestInterceptor {
  constructor(private readonly store: IdempotencyService) {}

  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    if (context.getType() !== 'http') return next.handle();
    const http = context.switchToHttp();
    const request = http.getRequest<Request & { user?: AuthUser }>();
    if (request.method !== 'POST' || request.is('multipart/form-data')) return next.handle();
    const key = parseIdempotencyKey(request.headers[IDEMPOTENCY_KEY_HEADER.toLowerCase()]);
    const userId = request.user?.id;
    if (key === undefined || userId === undefined) return next.handle();
    const fingerprint = { method: request.method, path: request.originalUrl, bodyHash: bodyHash(request.body) };
    return from(this.once(userId, key, fingerprint, http.getResponse<Response>(), next));
  }

  /**
   * A promise rather than an operator chain, so the answer is stored (or the key freed) even if the
   * client goes away and Nest stops listening: a claim left behind would make every repeat wait.
   */
  private async once(
    userId: number,
    key: string,
    fingerprint: RequestFingerprint,
    response: Response,
    next: CallHandler,
  ): Promise<unknown> {
    const outcome = await this.store.begin(userId, key, fingerprint);
    if (outcome.kind === 'replay') {
      response.status(outcome.status);
      response.setHeader(IDEMPOTENT_REPLAYED_HEADER, 'true');
      return outcome.body;
    }
    let body: unknown;
    try {
      body = await lastValueFrom(next.handle(), { defaultValue: undefined });
    } catch (error) {
      await this.store.release(outcome.claim);
      throw error;
    }
    await this.store.complete(outcome.claim, response.statusCode, body);
    return body;
  }
}
