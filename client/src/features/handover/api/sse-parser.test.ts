import { describe, expect, it } from 'vitest';
import { createSseParser } from './sse-parser';

// Expected results follow the HTML Living Standard, §9.2.6 "Interpreting an event stream".
describe('createSseParser', () => {
  it('reads the blocks the server sends: event type, JSON data, a blank line', () => {
    const parser = createSseParser();
    const events = parser.push(
      '\nevent: ward-change\ndata: {"wardId":1,"kind":"observation","orderId":2,"at":"2026-12-02T06:00:00.000Z"}\n\nevent: heartbeat\ndata: {"at":"x"}\n\n',
    );
    expect(events).toEqual([
      { event: 'ward-change', data: '{"wardId":1,"kind":"observation","orderId":2,"at":"2026-12-02T06:00:00.000Z"}' },
      { event: 'heartbeat', data: '{"at":"x"}' },
    ]);
  });

  it('completes an event split across chunks at any point', () => {
    const text = 'event: ward-change\r\ndata: {"wardId":1}\r\n\r\n';
    for (let cut = 1; cut < text.length; cut += 1) {
      const parser = createSseParser();
      const events = [...parser.push(text.slice(0, cut)), ...parser.push(text.slice(cut))];
      expect(events, `cut at ${cut}`).toEqual([{ event: 'ward-change', data: '{"wardId":1}' }]);
    }
  });

  it('waits for the blank line before dispatching', () => {
    const parser = createSseParser();
    expect(parser.push('event: ward-change\ndata: {}\n')).toEqual([]);
    expect(parser.push('\n')).toEqual([{ event: 'ward-change', data: '{}' }]);
  });

  it('accepts LF, CR and CRLF line ends', () => {
    const parser = createSseParser();
    expect(parser.push('data: a\r\rdata: b\n\ndata: c\r\n\r\n')).toEqual([
      { event: 'message', data: 'a' },
      { event: 'message', data: 'b' },
      { event: 'message', data: 'c' },
    ]);
  });

  it('joins data lines, skips comments, drops events with no data and strips only one space', () => {
    const parser = createSseParser();
    const events = parser.push(': keep-alive\n\nevent: lonely\n\ndata:first\ndata:  second\nid: 7\n\n');
    expect(events).toEqual([{ event: 'message', data: 'first\n second', id: '7' }]);
  });

  it('resets the event type after each event', () => {
    const parser = createSseParser();
    expect(parser.push('event: ward-change\ndata: 1\n\ndata: 2\n\n').map((event) => event.event)).toEqual(['ward-change', 'message']);
  });
});
