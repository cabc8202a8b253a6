import { describe, expect, it, vi } from "vitest";
import { z } from "zod";
import { AppError, errorResponse, isDatabaseDown, toAppError } from "@/lib/errors";

describe("one error map (lib/errors.ts)", () => {
  it("maps a database outage wrapped by the ORM to 503, looking through `cause`", () => {
    const refused = Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:54329"), { code: "ECONNREFUSED" });
    const wrapped = Object.assign(new Error("Failed query: insert into results"), { cause: refused });
    expect(isDatabaseDown(wrapped)).toBe(true);
    expect(toAppError(wrapped).status).toBe(503);
    const shutdown = Object.assign(new Error("terminating connection due to administrator command"), { code: "57P01" });
    expect(toAppError(new Error("x", { cause: shutdown })).code).toBe("unavailable");
  });

  it("keeps unknown errors' internals out of the response", async () => {
    const log = vi.spyOn(console, "error").mockImplementation(() => {});
    const res = errorResponse(new Error("secret stack detail at /work/main/db/index.ts:12"));
    const body = await res.json();
    expect(res.status).toBe(500);
    expect(JSON.stringify(body)).not.toContain("secret");
    expect(log).toHaveBeenCalled();
    log.mockRestore();
  });

  it("turns zod failures into 422 with field errors, and sets Retry-After on 429", async () => {
    const parsed = z.object({ ambientC: z.number().max(60, "At most 60 °C") }).safeParse({ ambientC: 70 });
    const res = errorResponse(parsed.error);
    expect(res.status).toBe(422);
    expect((await res.json()).error.fieldErrors).toEqual({ ambientC: ["At most 60 °C"] });
    const limited = errorResponse(new AppError("rate_limited", "slow down", undefined, 12.2));
    expect(limited.status).toBe(429);
    expect(limited.headers.get("Retry-After")).toBe("13");
  });
});
