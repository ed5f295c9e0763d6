import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { Request, Response } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { serverTimingMiddleware } from './server-timing.middleware.js';

// A bare node:http server is enough: the middleware only uses what ServerResponse itself has.
const routes: Record<string, (res: ServerResponse) => void> = {
  '/slow': (res) => void setTimeout(() => res.setHeader('Content-Type', 'application/json').end('{}'), 20),
  '/head': (res) => res.writeHead(204, { 'X-Other': '1' }).end(),
};

describe('serverTimingMiddleware', () => {
  const server = createServer((req: IncomingMessage, res: ServerResponse) => {
    serverTimingMiddleware(req as Request, res as Response, () => routes[req.url ?? '']!(res));
  });
  let base = '';
  beforeAll(
    () =>
      new Promise<void>((resolve) =>
        server.listen(0, '127.0.0.1', () => {
          base = `http://127.0.0.1:${(server.address() as { port: number }).port}`;
          resolve();
        }),
      ),
  );
  afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

  it('reports the handling time, including time spent waiting inside the handler', async () => {
    const response = await fetch(`${base}/slow`);
    const match = /^app;dur=(\d+\.\d{2})$/.exec(response.headers.get('server-timing') ?? '');
    expect(match).not.toBeNull();
    expect(Number(match![1])).toBeGreaterThanOrEqual(19);
  });

  it('keeps the headers passed straight to writeHead', async () => {
    const response = await fetch(`${base}/head`);
    expect(response.status).toBe(204);
    expect(response.headers.get('x-other')).toBe('1');
    expect(response.headers.get('server-timing')).toMatch(/^app;dur=/);
  });
});
