import type { Type } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { createValidationPipe } from '../../src/common/validation/validation.pipe.js';
import { routeKey } from './app-routes.js';
import type { BodySpec } from './bad-values.js';
import { BAD_INPUT_COVERAGE } from './bad-input-specs.js';
import { describeTallies, prototypeIsClean, rowCounts, type RouteTally, sendBadBodies, settledRowCounts } from './bad-input-runner.js';
import { type HttpClient, listen } from './http-client.js';
import { createTestApp, DEMO_USER_BY_ROLE, type TestApp } from './test-app.js';

export type Role = keyof typeof DEMO_USER_BY_ROLE;

export type BadInputRoute = {
  method: 'POST' | 'PUT' | 'PATCH';
  /** As the controller declares it (checked against the app's routes in bad-input-admin). */
  path: string;
  /** A real request: an entity in the state the route expects, found during setup. */
  url: () => string;
  /** Who may call it, so the guards let the body through to the validation pipe. */
  role: Role | 'anonymous';
  spec: BodySpec;
  dto: Type;
  /** A body the DTO accepts; every generated body breaks it. */
  valid: () => Record<string, unknown>;
};

/** Not one of them is valid JSON for a DTO: malformed text, or JSON whose top level is not an object. */
const MALFORMED_JSON = [
  '{"demandDose": NaN}',
  '{',
  '{"a":1,}',
  "{'a':1}",
  '{"a":1}{"b":2}',
  '"text"',
  'null',
  '42',
  'true',
  '[]',
  '[{}]',
  '\u0000',
];
/** Over the 100 kB JSON body limit (JSON_BODY_LIMIT_KB). */
const OVERSIZED_JSON = JSON.stringify({ note: 'x'.repeat(150 * 1024) });

export interface BadInputApp {
  t: TestApp;
  api: HttpClient;
  dataSource: DataSource;
  tokens: Record<Role, string>;
  tallies: RouteTally[];
}

/**
 * The app listening on a free port, one sign-in per role, and the tests every write route gets:
 * generated bad bodies, malformed JSON, and a check that the valid starting body really is valid.
 */
export function badInputSuite(
  file: string,
  routes: BadInputRoute[],
  setup: (app: BadInputApp) => Promise<void> = async () => {},
): BadInputApp {
  const context = { tokens: {} as Record<Role, string>, tallies: [] as RouteTally[] } as BadInputApp;
  const tokenFor = (role: Role | 'anonymous') => (role === 'anonymous' ? undefined : context.tokens[role]);

  beforeAll(async () => {
    context.t = await createTestApp();
    context.api = await listen(context.t);
    context.dataSource = context.t.app.get(DataSource);
    // Sign in once per role and reuse the tokens: sign-in is rate-limited.
    for (const role of Object.keys(DEMO_USER_BY_ROLE) as Role[]) context.tokens[role] = await context.t.tokenFor(DEMO_USER_BY_ROLE[role]);
    await setup(context);
  });
  afterAll(async () => {
    console.log(describeTallies(file, context.tallies));
    await context.t?.close();
  });

  const named = routes.map((route) => [`${route.method} ${route.path}`, route] as const);

  it('covers the routes BAD_INPUT_COVERAGE assigns to this file', () => {
    const assigned = Object.entries(BAD_INPUT_COVERAGE)
      .filter(([, where]) => where === file)
      .map(([key]) => key);
    expect(routes.map((route) => routeKey(route.method, route.path)).sort()).toEqual(assigned.sort());
  });

  it.each(named)('%s: the starting body passes the validation pipe', async (_name, route) => {
    await expect(createValidationPipe().transform(route.valid(), { type: 'body', metatype: route.dto })).resolves.toBeDefined();
  });

  it.each(named)(
    '%s: generated bad bodies are all 400 naming the broken fields, and nothing is written',
    { timeout: 300_000 },
    async (_name, route) => {
      const before = await settledRowCounts(context.dataSource);
      context.tallies.push(
        await sendBadBodies({
          api: context.api,
          method: route.method,
          url: route.url(),
          token: tokenFor(route.role),
          spec: route.spec,
          valid: route.valid(),
        }),
      );
      expect(await rowCounts(context.dataSource)).toEqual(before);
      expect(prototypeIsClean(), 'Object.prototype was polluted').toBe(true);
    },
  );

  it.each(named)('%s: malformed and oversized JSON get a clear 4xx, never a 500', async (_name, route) => {
    const before = await settledRowCounts(context.dataSource);
    const answers: string[] = [];
    const statuses: Record<number, number> = {};
    for (const rawBody of [...MALFORMED_JSON, OVERSIZED_JSON]) {
      const reply = await context.api.call(route.method, route.url(), { token: tokenFor(route.role), rawBody });
      statuses[reply.status] = (statuses[reply.status] ?? 0) + 1;
      const message = (reply.body as { message?: unknown }).message;
      answers.push(`${rawBody.slice(0, 20)} → ${reply.status} ${typeof message === 'string' ? message : reply.text.slice(0, 80)}`);
    }
    const expected = [...MALFORMED_JSON.map((raw) => `${raw.slice(0, 20)} → 400`), `${OVERSIZED_JSON.slice(0, 20)} → 413`];
    expect(answers.map((answer) => answer.replace(/^(.* → \d{3}) .+$/s, '$1'))).toEqual(expected);
    // A clear message of our own, not the parser's ("Unexpected token … is not valid JSON") echoing the body back.
    expect(
      answers.every((answer) => / → \d{3} \S/.test(answer) && !/Unexpected token|at position/.test(answer)),
      answers.join('\n'),
    ).toBe(true);
    context.tallies.push({ route: `${route.method} ${route.url()} (malformed JSON)`, sent: answers.length, statuses, kinds: {}, ms: 0 });
    expect(await rowCounts(context.dataSource)).toEqual(before);
  });

  return context;
}
