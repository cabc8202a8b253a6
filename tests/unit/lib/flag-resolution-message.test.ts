// The confirmation on /review/flags names the flag, the result and the pack, how the flag was resolved and
// where that leaves the result (wording is ours; common practice for a status message).
import { describe, expect, it } from "vitest";
import { flagResolutionMessage } from "@/lib/flag-resolution-message";

const base = { flagId: 7, resultId: 42, alsoClosed: 0, stillOpen: 0 } as const;

describe("flagResolutionMessage", () => {
  it("kept, the last open flag: the result stays published and counted, no open check left", () => {
    expect(
      flagResolutionMessage({ ...base, resolution: "kept", status: "approved" }, "Ashcombe Cells Ridge 1300"),
    ).toBe(
      "Flag #7 on result #42 (Ashcombe Cells Ridge 1300) resolved: result kept. It stays published and counted, and no longer shows an open check.",
    );
  });

  it("kept with a moderator’s note while other flags stay open: says how many remain", () => {
    const text = flagResolutionMessage(
      { ...base, resolution: "corrected", status: "approved", stillOpen: 2 },
      "Ashcombe Cells Ridge 1300",
    );
    expect(text).toMatch(
      /^Flag #7 on result #42 \(Ashcombe Cells Ridge 1300\) resolved: result kept, with a moderator’s note\. It stays published and counted; 2 other flags on it are still open\.$/,
    );
    expect(flagResolutionMessage({ ...base, resolution: "kept", status: "approved", stillOpen: 1 })).toMatch(
      /; 1 other flag on it is still open\.$/,
    );
  });

  it("taken out of publication: says so and counts the other flags closed with it", () => {
    expect(flagResolutionMessage({ ...base, resolution: "withdrawn", status: "withdrawn" })).toBe(
      "Flag #7 on result #42 resolved: result taken out of publication. It is withdrawn; it and its history stay in the audit log.",
    );
    expect(flagResolutionMessage({ ...base, resolution: "withdrawn", status: "withdrawn", alsoClosed: 1 })).toMatch(
      / 1 other open flag on it was closed with this one\.$/,
    );
    expect(flagResolutionMessage({ ...base, resolution: "withdrawn", status: "withdrawn", alsoClosed: 3 })).toMatch(
      / 3 other open flags on it were closed with this one\.$/,
    );
  });
});
