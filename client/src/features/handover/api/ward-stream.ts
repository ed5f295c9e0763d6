import { createParser, type EventSourceMessage } from 'eventsource-parser';
import { appApiConfig, type ApiClientConfig } from '@/lib/api-client';
import { wardChangeSchema } from './ward-change';

/** What the board says about its live connection. */
export type StreamStatus = 'connecting' | 'live' | 'reconnecting' | 'stopped';

export interface WardStreamOptions {
  wardId: number;
  /** Aborting it closes the connection and ends the loop (the board unmounted or changed ward). */
  signal: AbortSignal;
  /** Something on this ward changed: the board should be read again. */
  onWardChange: () => void;
  onStatus: (status: StreamStatus) => void;
  /** Each time the stream opens; `reconnected` after a drop, when changes may have been missed. */
  onOpen?: (reconnected: boolean) => void;
  connection?: Pick<ApiClientConfig, 'baseUrl' | 'getToken' | 'onUnauthorized' | 'fetchFn'>;
  random?: () => number;
}

const FIRST_DELAY_MS = 1_000;
const MAX_DELAY_MS = 30_000;
// The server sends a heartbeat every 20 s; silence for longer than two of them means a dead
// connection that no error announced (a sleeping laptop, a proxy that dropped it).
export const SILENCE_LIMIT_MS = 45_000;

/** Exponential backoff from 1 s to 30 s, ±20 % so a ward's screens do not all return at once. */
export function reconnectDelayMs(failures: number, random: () => number = Math.random): number {
  const base = Math.min(MAX_DELAY_MS, FIRST_DELAY_MS * 2 ** Math.max(0, failures));
  return Math.round(base * (0.8 + 0.4 * random()));
}

/** A `ward-change` for this ward. One that cannot be read counts too: refetching is always safe. */
function isWardChange(message: EventSourceMessage, wardId: number): boolean {
  if (message.event !== 'ward-change') return false;
  try {
    const parsed = wardChangeSchema.safeParse(JSON.parse(message.data));
    return !parsed.success || parsed.data.wardId === wardId;
  } catch {
    return true;
  }
}

function sleep(ms: number, signal: AbortSignal): Promise<void> {
  return new Promise((resolve) => {
    const timer = setTimeout(done, ms);
    function done() {
      clearTimeout(timer);
      signal.removeEventListener('abort', done);
      resolve();
    }
    signal.addEventListener('abort', done, { once: true });
  });
}

type Outcome = 'ended' | 'unauthorized' | 'refused';

/**
 * One connection: resolves when it ends; reports 'refused' for answers asking again cannot fix.
 * The browser's EventSource cannot send a bearer token, so the stream is read with fetch.
 */
async function connectOnce(
  options: WardStreamOptions,
  connection: NonNullable<WardStreamOptions['connection']>,
  opened: () => void,
): Promise<Outcome> {
  const attempt = new AbortController();
  const stop = () => attempt.abort();
  options.signal.addEventListener('abort', stop, { once: true });
  let watchdog: ReturnType<typeof setTimeout> | undefined;
  const feed = () => {
    clearTimeout(watchdog);
    watchdog = setTimeout(stop, SILENCE_LIMIT_MS);
  };
  try {
    const token = connection.getToken();
    const fetchFn = connection.fetchFn ?? ((input, init) => fetch(input, init));
    const response = await fetchFn(`${connection.baseUrl}/wards/${options.wardId}/handover/stream`, {
      headers: { Accept: 'text/event-stream', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
      signal: attempt.signal,
      cache: 'no-store',
    });
    if (response.status === 401) return 'unauthorized';
    if (response.status >= 400 && response.status < 500) return 'refused';
    if (!response.ok || !response.body) return 'ended';

    opened();
    feed();
    const reader = response.body.getReader();
    const decoder = new TextDecoder();
    const parser = createParser({
      onEvent: (message) => {
        if (isWardChange(message, options.wardId)) options.onWardChange();
      },
    });
    for (;;) {
      const { done, value } = await reader.read();
      if (done) return 'ended';
      feed();
      parser.feed(decoder.decode(value, { stream: true }));
    }
  } catch {
    // A network failure, the watchdog or the caller's abort: the loop decides what comes next.
    return 'ended';
  } finally {
    clearTimeout(watchdog);
    options.signal.removeEventListener('abort', stop);
    attempt.abort();
  }
}

/**
 * Follows a ward's change stream until `signal` aborts: reconnects with backoff whenever the
 * stream ends or fails; a 401 goes to the API client's sign-out; a 403 or 404 stops for good.
 */
export async function followWardStream(options: WardStreamOptions): Promise<void> {
  const connection = options.connection ?? appApiConfig;
  let failures = 0;
  let everOpened = false;
  while (!options.signal.aborted) {
    options.onStatus(everOpened || failures > 0 ? 'reconnecting' : 'connecting');
    let openedNow = false;
    const outcome = await connectOnce(options, connection, () => {
      openedNow = true;
      failures = 0;
      options.onStatus('live');
      options.onOpen?.(everOpened);
      everOpened = true;
    });
    if (options.signal.aborted) return;
    if (outcome === 'unauthorized') {
      connection.onUnauthorized();
      options.onStatus('stopped');
      return;
    }
    if (outcome === 'refused') {
      options.onStatus('stopped');
      return;
    }
    // A stream that opened and then ended starts again after the shortest delay.
    if (!openedNow) failures += 1;
    options.onStatus('reconnecting');
    await sleep(reconnectDelayMs(openedNow ? 0 : failures - 1, options.random), options.signal);
  }
}
