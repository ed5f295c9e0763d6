import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { followWardStream, reconnectDelayMs, SILENCE_LIMIT_MS, type StreamStatus, type WardStreamOptions } from './ward-stream';

type Answer = { status: number; chunks?: string[]; stayOpen?: boolean } | 'network-error';

const change = (wardId: number) => `event: ward-change\ndata: {"wardId":${wardId},"kind":"observation","orderId":7,"at":"x"}\n\n`;
const HEARTBEAT = 'event: heartbeat\ndata: {"at":"x"}\n\n';

/** A fetch that plays the given answers in turn, records what was asked and can send more on the open stream. */
function scriptedFetch(answers: Answer[]) {
  const calls: { url: string; headers: Record<string, string> }[] = [];
  let open: ReadableStreamDefaultController<Uint8Array> | undefined;
  const fetchFn = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    calls.push({ url: String(input), headers: init?.headers as Record<string, string> });
    const answer = answers.shift() ?? { status: 200, stayOpen: true };
    if (answer === 'network-error') throw new TypeError('Failed to fetch');
    const body = new ReadableStream<Uint8Array>({
      start(controller) {
        for (const chunk of answer.chunks ?? []) controller.enqueue(new TextEncoder().encode(chunk));
        if (!answer.stayOpen) controller.close();
        else open = controller;
        init?.signal?.addEventListener('abort', () => controller.error(new DOMException('Aborted', 'AbortError')));
      },
    });
    return new Response(answer.status === 200 ? body : null, { status: answer.status });
  });
  const send = (text: string) => open?.enqueue(new TextEncoder().encode(text));
  return { fetchFn: fetchFn as unknown as typeof fetch, calls, send };
}

function run(answers: Answer[]) {
  const { fetchFn, calls, send } = scriptedFetch(answers);
  const controller = new AbortController();
  const statuses: StreamStatus[] = [];
  const opens: boolean[] = [];
  const onWardChange = vi.fn();
  const onUnauthorized = vi.fn();
  const options: WardStreamOptions = {
    wardId: 1,
    signal: controller.signal,
    onWardChange,
    onStatus: (status) => statuses.push(status),
    onOpen: (reconnected) => opens.push(reconnected),
    connection: { baseUrl: '/api', getToken: () => 'token-1', onUnauthorized, fetchFn },
    random: () => 0.5,
  };
  const done = followWardStream(options);
  return { controller, statuses, opens, onWardChange, onUnauthorized, calls, send, done };
}

describe('reconnectDelayMs', () => {
  it('doubles from 1 s to at most 30 s, within ±20 %', () => {
    expect([0, 1, 2, 3, 4, 5, 9].map((failures) => reconnectDelayMs(failures, () => 0.5))).toEqual([
      1000, 2000, 4000, 8000, 16000, 30000, 30000,
    ]);
    expect(reconnectDelayMs(0, () => 0)).toBe(800);
    expect(reconnectDelayMs(0, () => 1)).toBe(1200);
  });
});

describe('followWardStream', () => {
  beforeEach(() => vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout'] }));
  afterEach(() => vi.useRealTimers());

  it('sends the bearer token, reports itself live and passes a change on its ward on', async () => {
    const stream = run([{ status: 200, chunks: [change(1)], stayOpen: true }]);
    await vi.advanceTimersByTimeAsync(10);
    expect(stream.calls[0]).toEqual({
      url: '/api/wards/1/handover/stream',
      headers: { Accept: 'text/event-stream', Authorization: 'Bearer token-1' },
    });
    expect(stream.statuses).toEqual(['connecting', 'live']);
    expect(stream.opens).toEqual([false]);
    expect(stream.onWardChange).toHaveBeenCalledOnce();
    stream.controller.abort();
    await stream.done;
  });

  it("refetches for its own ward's changes only; one it cannot read counts, heartbeats and other events do not", async () => {
    const stream = run([{ status: 200, stayOpen: true }]);
    await vi.advanceTimersByTimeAsync(10);
    stream.send(change(2) + HEARTBEAT + 'data: {"wardId":1}\n\n' + 'event: other\ndata: {"wardId":1}\n\n');
    await vi.advanceTimersByTimeAsync(10);
    expect(stream.onWardChange).not.toHaveBeenCalled();
    stream.send(change(1));
    await vi.advanceTimersByTimeAsync(10);
    expect(stream.onWardChange).toHaveBeenCalledTimes(1);
    stream.send('event: ward-change\ndata: not json\n\nevent: ward-change\ndata: {"wardId":"one"}\n\n');
    await vi.advanceTimersByTimeAsync(10);
    expect(stream.onWardChange).toHaveBeenCalledTimes(3);
    stream.controller.abort();
    await stream.done;
  });

  it('reconnects with backoff after a failure and after the stream ends, saying it reconnected', async () => {
    const stream = run(['network-error', { status: 503 }, { status: 200 }, { status: 200, stayOpen: true }]);
    await vi.advanceTimersByTimeAsync(10);
    expect(stream.calls).toHaveLength(1);
    await vi.advanceTimersByTimeAsync(1000); // t = 1010: the first retry came after 1 s
    expect(stream.calls).toHaveLength(2);
    await vi.advanceTimersByTimeAsync(1980); // t = 2990: the second retry waits 2 s
    expect(stream.calls).toHaveLength(2);
    await vi.advanceTimersByTimeAsync(20); // t = 3010: it opens, then ends at once
    expect(stream.calls).toHaveLength(3);
    await vi.advanceTimersByTimeAsync(1000); // a stream that had opened returns after 1 s
    expect(stream.calls).toHaveLength(4);
    expect(stream.opens).toEqual([false, true]);
    expect(stream.statuses).toEqual([
      'connecting',
      'reconnecting',
      'reconnecting',
      'reconnecting',
      'reconnecting',
      'live',
      'reconnecting',
      'reconnecting',
      'live',
    ]);
    stream.controller.abort();
    await stream.done;
  });

  it('stays connected while heartbeats come, and reconnects when they stop for longer than the allowance', async () => {
    const stream = run([{ status: 200, stayOpen: true }]);
    await vi.advanceTimersByTimeAsync(10);
    for (let beat = 0; beat < 6; beat += 1) {
      await vi.advanceTimersByTimeAsync(20_000);
      stream.send(HEARTBEAT);
    }
    expect(stream.calls).toHaveLength(1);
    await vi.advanceTimersByTimeAsync(SILENCE_LIMIT_MS - 1_000);
    expect(stream.calls).toHaveLength(1);
    expect(stream.statuses.at(-1)).toBe('live');
    await vi.advanceTimersByTimeAsync(1_000 + 1_200); // silence trips, then the shortest delay
    expect(stream.calls).toHaveLength(2);
    expect(stream.statuses.at(-1)).toBe('live');
    expect(stream.opens).toEqual([false, true]);
    stream.controller.abort();
    await stream.done;
  });

  it('hands a 401 to the sign-out and stops', async () => {
    const stream = run([{ status: 401 }]);
    await stream.done;
    expect(stream.onUnauthorized).toHaveBeenCalledOnce();
    expect(stream.statuses.at(-1)).toBe('stopped');
  });

  it('stops for good on a 403', async () => {
    const stream = run([{ status: 403 }]);
    await stream.done;
    expect(stream.calls).toHaveLength(1);
    expect(stream.onUnauthorized).not.toHaveBeenCalled();
    expect(stream.statuses.at(-1)).toBe('stopped');
  });

  it('ends when aborted, without reconnecting', async () => {
    const stream = run([{ status: 200, stayOpen: true }]);
    await vi.advanceTimersByTimeAsync(10);
    stream.controller.abort();
    await stream.done;
    await vi.advanceTimersByTimeAsync(60_000);
    expect(stream.calls).toHaveLength(1);
    expect(stream.statuses).toEqual(['connecting', 'live']);
  });
});
