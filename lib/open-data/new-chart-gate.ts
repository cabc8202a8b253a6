// Chart pages are rendered per request (nothing stored per link) behind Cache-Control, so a CDN keeps the
// popular ones; what is left to bound is how many charts nobody has asked for yet one client can have drawn.
// This gate remembers the most recent SEEN_CAPACITY chart states (any visitor's); a state it has seen passes,
// an unseen one counts against its client's window (at most `limit` per `windowMs`). Memory is fixed: both
// maps drop their oldest entries past their capacity. Pure; proxy.ts keeps one per server process.

export type GateOptions = { limit: number; windowMs: number; seenCapacity: number; clientCapacity: number };
export type GateAnswer = { ok: true; seen: boolean } | { ok: false; retryAfterS: number };

const NEW_CHART_GATE: GateOptions = { limit: 30, windowMs: 60_000, seenCapacity: 5000, clientCapacity: 10_000 };

export class NewChartGate {
  private readonly seen = new Map<string, true>();
  private readonly windows = new Map<string, { count: number; resetAt: number }>();

  constructor(private readonly options: GateOptions = NEW_CHART_GATE) {}

  check(stateKey: string, client: string, nowMs: number): GateAnswer {
    if (this.seen.has(stateKey)) {
      this.seen.delete(stateKey); // most recently used last
      this.seen.set(stateKey, true);
      return { ok: true, seen: true };
    }
    let w = this.windows.get(client);
    if (!w || w.resetAt <= nowMs) {
      this.windows.delete(client);
      w = { count: 0, resetAt: nowMs + this.options.windowMs };
      this.windows.set(client, w);
      this.trim(this.windows, this.options.clientCapacity);
    }
    if (w.count >= this.options.limit)
      return { ok: false, retryAfterS: Math.max(1, Math.ceil((w.resetAt - nowMs) / 1000)) };
    w.count++;
    this.seen.set(stateKey, true);
    this.trim(this.seen, this.options.seenCapacity);
    return { ok: true, seen: false };
  }

  /** Entries held (for tests and the memory bound). */
  get size(): { seen: number; clients: number } {
    return { seen: this.seen.size, clients: this.windows.size };
  }

  private trim(map: Map<string, unknown>, capacity: number): void {
    while (map.size > capacity) {
      const oldest = map.keys().next();
      if (oldest.done) return;
      map.delete(oldest.value);
    }
  }
}
