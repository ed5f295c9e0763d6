import autocannon, { type Client, type Request, type Result } from 'autocannon';
import { type Percentiles, percentiles } from './stats.js';

export type LoadSpec = {
  name: string;
  baseUrl: string;
  connections: number;
  seconds: number;
  /** One request shape every connection repeats; `setupRequest` may vary it each time. */
  request: Request;
  /** Instead: each connection's own requests (connection 0, 1, ...), e.g. its own orders to write to. */
  requestsFor?: (connection: number) => Request[];
};

export type LoadResult = {
  name: string;
  requests: number;
  requestsPerSecond: number;
  /** What the client saw: from sending the request to the whole answer, queueing included. */
  latency: Percentiles;
  /** The server's own handling time, from its Server-Timing header (null when it sends none). */
  serverTime: Percentiles | null;
  /** Answers outside 200-299, counted from the answers themselves. */
  non2xx: number;
  /** Connection errors and timeouts (autocannon's count). */
  errors: number;
  /** Answers by status code, as autocannon counted them. */
  statusCodes: Record<string, number>;
  /** A few distinct non-2xx answers, to say why. */
  failures: string[];
};

/** Runs one autocannon load and measures every answer, not autocannon's per-second summary. */
export async function runLoad(spec: LoadSpec): Promise<LoadResult> {
  const latencies: number[] = [];
  const serverTimes: number[] = [];
  const failures = new Set<string>();
  let non2xx = 0;
  const onResponse = (status: number, body: string, _context: object, headers: Request['headers']) => {
    const timing = headerValue(headers, 'server-timing');
    const match = timing ? /app;dur=([\d.]+)/.exec(timing) : null;
    if (match) serverTimes.push(Number(match[1]));
    if (status >= 200 && status <= 299) return;
    non2xx++;
    if (failures.size < 5) failures.add(`${status} ${body.slice(0, 200)}`);
  };
  let connections = 0;
  const requestsFor = spec.requestsFor;
  const setupClient = requestsFor
    ? (client: Client) => client.setRequests(requestsFor(connections++).map((request) => ({ ...request, onResponse })))
    : undefined;
  const started = performance.now();
  const result = await new Promise<Result>((resolve, reject) => {
    const options = {
      url: spec.baseUrl,
      connections: spec.connections,
      duration: spec.seconds,
      requests: [{ ...spec.request, onResponse }],
      setupClient,
    };
    const instance = autocannon(options, (error: unknown, done: Result) => (error ? reject(error) : resolve(done)));
    instance.on('response', (_client: Client, _status: number, _bytes: number, responseTime: number) => latencies.push(responseTime));
  });
  const elapsed = (performance.now() - started) / 1000;
  return {
    name: spec.name,
    requests: latencies.length,
    requestsPerSecond: latencies.length / elapsed,
    latency: percentiles(latencies),
    serverTime: serverTimes.length > 0 ? percentiles(serverTimes) : null,
    non2xx,
    errors: result.errors + result.timeouts,
    statusCodes: Object.fromEntries(Object.entries(result.statusCodeStats ?? {}).map(([code, stat]) => [code, stat.count ?? 0])),
    failures: [...failures],
  };
}

/** A short load whose figures are thrown away, so the JIT and the caches are warm. */
export async function warmUp(spec: LoadSpec, seconds: number): Promise<void> {
  if (seconds > 0) await runLoad({ ...spec, seconds });
}

function headerValue(headers: Request['headers'], name: string): string | undefined {
  for (const [key, value] of Object.entries(headers ?? {})) if (key.toLowerCase() === name) return String(value);
  return undefined;
}
