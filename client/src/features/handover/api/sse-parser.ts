/** One server-sent event: its type ('message' when the server names none) and its data lines. */
export interface SseEvent {
  event: string;
  data: string;
  id?: string;
}

export interface SseParser {
  /** Feeds decoded text as it arrives (any split, even mid-line) and returns the events it completes. */
  push(text: string): SseEvent[];
}

/**
 * A parser for the text/event-stream format as the HTML standard defines it (§9.2.6): lines end
 * in LF, CR or CRLF; a blank line ends an event; ':' starts a comment; 'data' lines join with
 * LF; an event with no data is dropped. The browser's EventSource cannot send a bearer token,
 * so the board reads the stream with fetch and parses it here.
 */
export function createSseParser(): SseParser {
  let buffer = '';
  let eventType = '';
  let dataLines: string[] = [];
  let id: string | undefined;

  const dispatch = (events: SseEvent[]) => {
    if (dataLines.length > 0) {
      events.push({ event: eventType || 'message', data: dataLines.join('\n'), ...(id === undefined ? {} : { id }) });
    }
    eventType = '';
    dataLines = [];
  };

  const field = (line: string) => {
    if (line.startsWith(':')) return;
    const colon = line.indexOf(':');
    const name = colon === -1 ? line : line.slice(0, colon);
    let value = colon === -1 ? '' : line.slice(colon + 1);
    if (value.startsWith(' ')) value = value.slice(1);
    if (name === 'event') eventType = value;
    else if (name === 'data') dataLines.push(value);
    else if (name === 'id' && !value.includes('\0')) id = value;
    // 'retry' and unknown fields: the reconnect delay is the client's own (see ward-stream.ts).
  };

  return {
    push(text) {
      buffer += text;
      const events: SseEvent[] = [];
      let start = 0;
      for (let index = 0; index < buffer.length; index += 1) {
        const char = buffer[index];
        if (char !== '\n' && char !== '\r') continue;
        // A CR at the very end may be the first half of a CRLF split across chunks: wait for more.
        if (char === '\r' && index === buffer.length - 1) break;
        const line = buffer.slice(start, index);
        if (char === '\r' && buffer[index + 1] === '\n') index += 1;
        start = index + 1;
        if (line === '') dispatch(events);
        else field(line);
      }
      buffer = buffer.slice(start);
      return events;
    },
  };
}
