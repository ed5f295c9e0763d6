import type { z } from 'zod';
import {
  ApiRequestError,
  isSignatureError,
  NO_RESPONSE_MESSAGE,
  NO_RESPONSE_STATUS,
  toApiRequestError,
  UNREADABLE_ANSWER_MESSAGE,
} from './api-error';
import { endSession, getSession } from './auth/session-store';
import { queryClient } from './query-client';

type HttpMethod = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export interface RequestOptions<T> {
  method?: HttpMethod;
  body?: unknown;
  /** Checks the answer's shape; stray fields are dropped, a wrong shape is an error. */
  schema?: z.ZodType<T>;
  /** Query string values; undefined ones are left out. */
  params?: Record<string, string | number | boolean | undefined>;
  /**
   * Sign-in itself: no token is sent and a 401 is the answer to show, not a sign that the
   * session has ended.
   */
  anonymous?: boolean;
  /**
   * A signed action (the password typed again). A 401 that names `signature.password` is a
   * wrong password to show beside the field; the session goes on.
   */
  signed?: boolean;
  /** More request headers, e.g. a write's `Idempotency-Key`. */
  headers?: Record<string, string>;
  signal?: AbortSignal;
}

export interface ApiClientConfig {
  baseUrl: string;
  getToken: () => string | null;
  onUnauthorized: () => void;
  fetchFn?: typeof fetch;
}

export type ApiRequest = <T>(path: string, options?: RequestOptions<T>) => Promise<T>;

function buildUrl(baseUrl: string, path: string, params: RequestOptions<unknown>['params']): string {
  const query = new URLSearchParams();
  for (const [key, value] of Object.entries(params ?? {})) {
    if (value !== undefined) query.set(key, String(value));
  }
  const search = query.toString();
  return `${baseUrl}${path}${search ? `?${search}` : ''}`;
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return null;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return null;
  }
}

/** A 401 ends the session, except from sign-in itself or a signature with the wrong password. */
export function endsSession(error: ApiRequestError, options: Pick<RequestOptions<unknown>, 'anonymous' | 'signed'>): boolean {
  if (error.status !== 401 || options.anonymous) return false;
  return !(options.signed && isSignatureError(error));
}

export function createApiClient(config: ApiClientConfig): ApiRequest {
  const fetchFn = config.fetchFn ?? ((input, init) => fetch(input, init));

  return async function request<T>(path: string, options: RequestOptions<T> = {}): Promise<T> {
    const headers: Record<string, string> = { ...options.headers, Accept: 'application/json' };
    if (options.body !== undefined) headers['Content-Type'] = 'application/json';
    const token = options.anonymous ? null : config.getToken();
    if (token) headers.Authorization = `Bearer ${token}`;

    let response: Response;
    try {
      response = await fetchFn(buildUrl(config.baseUrl, path, options.params), {
        method: options.method ?? 'GET',
        headers,
        body: options.body === undefined ? undefined : JSON.stringify(options.body),
        signal: options.signal,
      });
    } catch (cause) {
      if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
      throw new ApiRequestError(NO_RESPONSE_STATUS, NO_RESPONSE_MESSAGE);
    }

    const body = await readJson(response);
    if (!response.ok) {
      const error = toApiRequestError(response.status, body);
      if (endsSession(error, options)) config.onUnauthorized();
      throw error;
    }
    if (!options.schema) return body as T;

    const parsed = options.schema.safeParse(body);
    if (!parsed.success) {
      // A shape the client does not expect: show nothing rather than something wrong.
      console.error(`Unexpected answer from ${path}`, parsed.error.issues);
      throw new ApiRequestError(NO_RESPONSE_STATUS, UNREADABLE_ANSWER_MESSAGE);
    }
    return parsed.data;
  };
}

/** The app's connection: '/api', the session's token, and a 401 ends the session. */
export const appApiConfig: ApiClientConfig = {
  baseUrl: '/api',
  getToken: () => getSession()?.accessToken ?? null,
  onUnauthorized: () => {
    // The route guard sees the session go and sends the person to sign-in.
    if (!getSession()) return;
    endSession('expired');
    queryClient.clear();
  },
};

export const apiRequest: ApiRequest = createApiClient(appApiConfig);
