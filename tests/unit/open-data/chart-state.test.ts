import { describe, expect, it } from "vitest";
import {
  STATE_SEGMENT,
  canonicalStatePath,
  decodeChartState,
  encodeChartState,
  stateFromSegments,
  statePath,
  type ChartState,
} from "@/lib/open-data/chart-state";

const state: ChartState = {
  v: 1,
  kind: "label-check",
  group: "dc-step_a15-25_co3.3_r5-10_new",
  title: "Ränge – “quoted” & <tagged>",
  note: "A note",
};

describe("chart state in the URL", () => {
  it("round-trips through base64url, including non-ASCII text", () => {
    const encoded = encodeChartState(state);
    expect(encoded).toMatch(/^[A-Za-z0-9_-]+$/);
    expect(decodeChartState(encoded)).toEqual(state);
  });
  it("gives one URL per state whatever the key order", () => {
    const shuffled = { note: "A note", title: state.title, group: state.group, kind: "label-check", v: 1 } as const;
    expect(encodeChartState(shuffled)).toBe(encodeChartState(state));
  });
  it("refuses garbage, unknown versions and invalid fields", () => {
    expect(decodeChartState("not base64!")).toBeNull();
    expect(decodeChartState(Buffer.from("{}").toString("base64url"))).toBeNull();
    expect(decodeChartState(Buffer.from(JSON.stringify({ ...state, v: 2 })).toString("base64url"))).toBeNull();
    expect(
      decodeChartState(Buffer.from(JSON.stringify({ ...state, group: "../etc" })).toString("base64url")),
    ).toBeNull();
  });
});

describe("statePath: the state as short path segments", () => {
  const long: ChartState = {
    v: 1,
    kind: "label-check",
    group: "dc-step_a15-25_co3.3_r5-10_new",
    title: "T".repeat(120),
    note: "A long note, ".repeat(30).trim().slice(0, 400),
  };

  it("splits a long state into segments of at most STATE_SEGMENT characters that join back to it", () => {
    const encoded = encodeChartState(long);
    expect(encoded.length).toBeGreaterThan(255); // one segment would pass the file-name limit
    const segments = statePath(encoded).split("/");
    expect(segments.length).toBeGreaterThan(2);
    for (const s of segments) expect(s.length).toBeLessThanOrEqual(STATE_SEGMENT);
    expect(stateFromSegments(segments)).toBe(encoded);
    expect(decodeChartState(stateFromSegments(segments) ?? "")).toEqual(long);
  });

  it("leaves a short state in one segment, and names the canonical split of an old one-segment link", () => {
    const short = encodeChartState({ v: 1, kind: "curves", group: "g1", title: "Short" });
    expect(statePath(short)).toBe(short);
    expect(canonicalStatePath([short])).toBeNull();
    const encoded = encodeChartState(long);
    expect(canonicalStatePath([encoded])).toBe(statePath(encoded));
    expect(canonicalStatePath(statePath(encoded).split("/"))).toBeNull();
  });

  it("refuses segments that are not base64url", () => {
    expect(stateFromSegments([])).toBeNull();
    expect(stateFromSegments(["abc", "d.e"])).toBeNull();
    expect(stateFromSegments(["abc", ""])).toBeNull();
    expect(canonicalStatePath(["%%"])).toBeNull();
  });
});
