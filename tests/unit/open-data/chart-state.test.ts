import { describe, expect, it } from "vitest";
import { decodeChartState, encodeChartState, type ChartState } from "@/lib/open-data/chart-state";

const state: ChartState = { v: 1, kind: "label-check", group: "dc-step_a15-25_co3.3_r5-10_new", title: "Ränge – “quoted” & <tagged>", note: "A note" };

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
    expect(decodeChartState(Buffer.from(JSON.stringify({ ...state, group: "../etc" })).toString("base64url"))).toBeNull();
  });
});
