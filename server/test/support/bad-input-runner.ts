import fc from 'fast-check';
import type { DataSource } from 'typeorm';
import { type BadBody, badBodies, related } from './bad-bodies.js';
import type { BodySpec } from './bad-values.js';
import type { HttpClient, Reply } from './http-client.js';

/** At least this many generated bad bodies per write route (issue 8). */
export const BAD_BODIES_PER_ROUTE = Number(process.env.BAD_BODIES_PER_ROUTE ?? 1000);

export type RowCounts = Record<string, number>;

/** Rows in every table of the app's database, table names read from sqlite_master. */
export async function rowCounts(dataSource: DataSource): Promise<RowCounts> {
  const tables: { name: string }[] = await dataSource.query(
    "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name",
  );
  const counts: RowCounts = {};
  for (const { name } of tables) counts[name] = Number((await dataSource.query(`SELECT COUNT(*) AS n FROM "${name}"`))[0].n);
  return counts;
}

/** Row counts once mail sent after earlier requests has landed in the local mailbox (it arrives after the answer). */
export async function settledRowCounts(dataSource: DataSource): Promise<RowCounts> {
  let previous = await rowCounts(dataSource);
  for (let attempt = 0; attempt < 50; attempt++) {
    await new Promise((resolve) => setTimeout(resolve, 150));
    const current = await rowCounts(dataSource);
    if (JSON.stringify(current) === JSON.stringify(previous)) return current;
    previous = current;
  }
  throw new Error('Row counts did not settle within 7.5 s');
}

export type RouteTally = { route: string; sent: number; statuses: Record<number, number>; kinds: Record<string, number>; ms: number };

export type BadInputTarget = {
  api: HttpClient;
  method: 'POST' | 'PUT' | 'PATCH';
  url: string;
  token?: string;
  spec: BodySpec;
  valid: Record<string, unknown>;
};

function problemWith(reply: Reply, bad: BadBody): string | null {
  if (reply.status !== 400) return `expected 400, got ${reply.status}`;
  const body = reply.body as { statusCode?: unknown; message?: unknown; errors?: unknown };
  if (body.statusCode !== 400 || typeof body.message !== 'string' || !Array.isArray(body.errors))
    return 'the body is not {statusCode: 400, message, errors}';
  const errors = body.errors as { field?: unknown; message?: unknown }[];
  if (errors.some((e) => typeof e.field !== 'string' || typeof e.message !== 'string' || e.message === ''))
    return 'an error lacks a field or a message';
  const fields = errors.map((e) => e.field as string);
  const unnamed = bad.broken.filter((broken) => !fields.some((field) => related(field, broken)));
  if (unnamed.length > 0) return `no error names ${unnamed.join(', ')}`;
  const unexpected = fields.filter((field) => ![...bad.broken, ...bad.extraKeys].some((broken) => related(field, broken)));
  if (unexpected.length > 0) return `errors name fields that were not broken: ${unexpected.join(', ')}`;
  return null;
}

/** Requests in flight at once: the server and the test share the process, so a few overlap the waits. */
const IN_FLIGHT = 4;

/**
 * Sends BAD_BODIES_PER_ROUTE generated bad bodies to one route, IN_FLIGHT at a time, and checks
 * each answer is a 400 naming the broken fields. fast-check shrinks a failure to a small body and
 * prints the seed that reproduces it.
 */
export async function sendBadBodies(target: BadInputTarget): Promise<RouteTally> {
  const tally: RouteTally = { route: `${target.method} ${target.url}`, sent: 0, statuses: {}, kinds: {}, ms: 0 };
  const send = async (bad: BadBody): Promise<string | null> => {
    const reply = await target.api.call(target.method, target.url, { token: target.token, rawBody: bad.json });
    tally.sent += 1;
    tally.statuses[reply.status] = (tally.statuses[reply.status] ?? 0) + 1;
    for (const kind of bad.kinds) tally.kinds[kind] = (tally.kinds[kind] ?? 0) + 1;
    const problem = problemWith(reply, bad);
    return (
      problem &&
      `${problem}\n  broke: ${bad.broken.join(', ')} (${bad.kinds.join(', ')})\n  sent: ${bad.json.slice(0, 2000)}\n  answer: ${reply.text.slice(0, 1000)}`
    );
  };
  const started = performance.now();
  await fc.assert(
    fc.asyncProperty(fc.array(badBodies(target.spec, target.valid), { minLength: IN_FLIGHT, maxLength: IN_FLIGHT }), async (batch) => {
      const problems = (await Promise.all(batch.map(send))).filter((problem) => problem !== null);
      if (problems.length > 0) throw new Error(problems[0]);
    }),
    { numRuns: Math.ceil(BAD_BODIES_PER_ROUTE / IN_FLIGHT) },
  );
  tally.ms = Math.round(performance.now() - started);
  return tally;
}

export function describeTallies(file: string, tallies: RouteTally[]): string {
  const sent = tallies.reduce((sum, t) => sum + t.sent, 0);
  const errors5xx = tallies.reduce(
    (sum, t) =>
      sum +
      Object.entries(t.statuses)
        .filter(([status]) => Number(status) >= 500)
        .reduce((s, [, n]) => s + n, 0),
    0,
  );
  const lines = tallies.map((t) => `  ${t.route}: ${t.sent} sent in ${t.ms} ms; statuses ${JSON.stringify(t.statuses)}`);
  const kinds: Record<string, number> = {};
  for (const t of tallies) {
    for (const [kind, n] of Object.entries(t.kinds)) {
      const label = kind.startsWith('bad item') ? 'bad list item' : kind;
      kinds[label] = (kinds[label] ?? 0) + n;
    }
  }
  const mix = Object.entries(kinds)
    .sort(([, a], [, b]) => b - a)
    .map(([kind, n]) => `${kind} ${n}`)
    .join(', ');
  return `${file}: ${sent} bad bodies, ${errors5xx} server errors\n${lines.join('\n')}\n  fields broken by kind: ${mix}`;
}

/** Object.prototype must come out of any request untouched. */
export function prototypeIsClean(): boolean {
  const probe = {} as Record<string, unknown>;
  return (
    probe.polluted === undefined &&
    typeof probe.toString === 'function' &&
    Object.getOwnPropertyNames(Object.prototype).every((name) => name !== 'polluted')
  );
}
