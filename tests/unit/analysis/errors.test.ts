import { describe, expect, it } from "vitest";
import { LogError, isLogError } from "@/lib/analysis/errors";

describe("LogError", () => {
  it("carries a code, a message and an optional line", () => {
    const e = new LogError("time-backwards", "Time goes backwards from line 12.", 12);
    expect(e).toBeInstanceOf(Error);
    expect(e).toMatchObject({
      name: "LogError",
      code: "time-backwards",
      message: "Time goes backwards from line 12.",
      line: 12,
    });
    expect(isLogError(e)).toBe(true);
  });

  it("has no line property when none applies", () => {
    const e = new LogError("too-large", "Too large.");
    expect(e.line).toBeUndefined();
    expect(isLogError(new Error("x"))).toBe(false);
  });
});
