// The gate in front of per-request chart pages (lib/open-data/new-chart-gate.ts): seen states pass, unseen
// ones count per client in a fixed window, and memory stays bounded (both maps drop their oldest entries).
import { describe, expect, it } from "vitest";
import { NewChartGate } from "@/lib/open-data/new-chart-gate";

describe("NewChartGate", () => {
  it("lets `limit` new states per client and window through, then answers with the seconds left", () => {
    const gate = new NewChartGate({ limit: 3, windowMs: 60_000, seenCapacity: 100, clientCapacity: 100 });
    for (let i = 0; i < 3; i++) expect(gate.check(`s${i}`, "a", 1000)).toEqual({ ok: true, seen: false });
    expect(gate.check("s3", "a", 31_000)).toEqual({ ok: false, retryAfterS: 30 });
    expect(gate.check("s3", "b", 31_000)).toEqual({ ok: true, seen: false }); // another client
    expect(gate.check("s0", "a", 31_000)).toEqual({ ok: true, seen: true }); // seen: free for anyone
    expect(gate.check("s4", "a", 61_000)).toEqual({ ok: true, seen: false }); // a new window
  });

  it("keeps at most seenCapacity states and clientCapacity clients, forgetting the oldest", () => {
    const gate = new NewChartGate({ limit: 1000, windowMs: 60_000, seenCapacity: 50, clientCapacity: 20 });
    for (let i = 0; i < 500; i++) gate.check(`state-${i}`, `client-${i % 40}`, 0);
    expect(gate.size).toEqual({ seen: 50, clients: 20 });
    expect(gate.check("state-499", "z", 0)).toMatchObject({ seen: true });
    expect(gate.check("state-0", "z", 0)).toMatchObject({ seen: false });
  });
});
