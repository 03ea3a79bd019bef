/** One server-sent event as received. */
export interface ReceivedEvent {
  event: string;
  data: any;
}

export interface SseStream {
  status: number;
  contentType: string | null;
  events: ReceivedEvent[];
  /** Comment lines (": heartbeat") received. */
  comments: string[];
  /** Resolves once `predicate` holds for the events received so far. */
  until(predicate: (events: ReceivedEvent[]) => boolean, timeoutMs?: number): Promise<ReceivedEvent[]>;
  close(): void;
}

/**
 * Opens an SSE stream with fetch and parses it as it arrives (event/data lines, blank line ends
 * an event, lines starting with ":" are comments). A non-200 answer is returned with its status.
 */
export async function openSse(url: string, headers: Record<string, string> = {}): Promise<SseStream> {
  const controller = new AbortController();
  const res = await fetch(url, { headers: { accept: "text/event-stream", ...headers }, signal: controller.signal });
  const events: ReceivedEvent[] = [];
  const comments: string[] = [];
  const waiters = new Set<() => void>();
  if (res.ok && res.body) {
    void (async () => {
      const decoder = new TextDecoder();
      let buffer = "";
      let current: { event: string; data: string[] } = { event: "message", data: [] };
      try {
        for await (const chunk of res.body as unknown as AsyncIterable<Uint8Array>) {
          buffer += decoder.decode(chunk, { stream: true });
          let nl: number;
          while ((nl = buffer.indexOf("\n")) >= 0) {
            const line = buffer.slice(0, nl);
            buffer = buffer.slice(nl + 1);
            if (line === "") {
              if (current.data.length > 0) events.push({ event: current.event, data: JSON.parse(current.data.join("\n")) });
              current = { event: "message", data: [] };
              for (const w of waiters) w();
            } else if (line.startsWith(":")) comments.push(line.slice(1).trim());
            else if (line.startsWith("event:")) current.event = line.slice(6).trim();
            else if (line.startsWith("data:")) current.data.push(line.slice(5).trim());
          }
        }
      } catch {
        // aborted by close()
      }
    })();
  }
  return {
    status: res.status,
    contentType: res.headers.get("content-type"),
    events,
    comments,
    until(predicate, timeoutMs = 30_000) {
      return new Promise((resolve, reject) => {
        const check = () => {
          if (predicate(events)) {
            waiters.delete(check);
            clearTimeout(timer);
            resolve(events);
          }
        };
        const timer = setTimeout(() => {
          waiters.delete(check);
          reject(new Error(`SSE condition not met; got ${events.map((e) => e.event).join(", ")}`));
        }, timeoutMs);
        waiters.add(check);
        check();
      });
    },
    close: () => controller.abort(),
  };
}
