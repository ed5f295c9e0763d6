import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import type { TestApp } from './test-app.js';

export type Reply = { status: number; headers: Headers; body: unknown; text: string };

export type CallOptions = {
  token?: string;
  /** Sent as JSON. */
  body?: unknown;
  /** Sent as is with a JSON content type, for bodies JSON.stringify cannot write (e.g. 1e999). */
  rawBody?: string;
  form?: FormData;
};

export interface HttpClient {
  baseUrl: string;
  call(method: string, path: string, options?: CallOptions): Promise<Reply>;
}

/**
 * Node's fetch against the app listening on a free port: one keep-alive connection pool instead of
 * supertest's new server per request, which matters when a test sends thousands of requests.
 */
export async function listen(t: TestApp): Promise<HttpClient> {
  await t.app.listen(0, '127.0.0.1');
  const port = ((t.app.getHttpServer() as Server).address() as AddressInfo).port;
  const baseUrl = `http://127.0.0.1:${port}`;
  return {
    baseUrl,
    async call(method, path, { token, body, rawBody, form } = {}) {
      const headers: Record<string, string> = token ? { Authorization: `Bearer ${token}` } : {};
      let payload: string | FormData | undefined = form;
      if (rawBody !== undefined || body !== undefined) {
        headers['Content-Type'] = 'application/json';
        payload = rawBody ?? JSON.stringify(body);
      }
      const response = await fetch(`${baseUrl}${path}`, { method, headers, body: payload });
      const text = await response.text();
      let parsed: unknown = text;
      if (response.headers.get('content-type')?.includes('application/json') && text) parsed = JSON.parse(text);
      return { status: response.status, headers: response.headers, body: parsed, text };
    },
  };
}
