// POST /api/v1/uploads/log: a signed-in contributor's log streams to storage while it is hashed and analysed.
import { createHash } from "node:crypto";
import { describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.LOG_MAX_BYTES = String(7 * 1024 * 1024);
});

import { POST } from "@/app/api/v1/uploads/log/route";
import { createSession, createUser, signedIn } from "@/tests/helpers/users";
import { postRequest, sampleLog } from "@/tests/helpers/logs";
import { getObjectText, keysUnder } from "@/tests/helpers/storage";

const call = (req: Request) => POST(req, undefined);
const csvHeaders = (token?: string) => ({
  "content-type": "text/csv",
  ...(token ? { cookie: `authjs.session-token=${token}` } : {}),
});

describe("POST /api/v1/uploads/log", () => {
  it("needs a session (401), and an expired one counts as none", async () => {
    const { csv } = sampleLog();
    expect((await call(postRequest("/api/v1/uploads/log?filename=a.csv", csv, csvHeaders()))).status).toBe(401);
    const u = await createUser("contributor");
    const expired = await createSession(u.id, -60);
    expect((await call(postRequest("/api/v1/uploads/log?filename=a.csv", csv, csvHeaders(expired)))).status).toBe(401);
  });

  it("stores the log under the contributor's incoming prefix with its SHA-256, and previews the figures and card checks", async () => {
    const me = await signedIn("contributor");
    const { csv } = sampleLog({ cells: 6 });
    const res = await call(
      postRequest(
        "/api/v1/uploads/log?filename=bench%20run.csv&cells=4&ratedMah=1300&cutoffVPerCell=3.3",
        csv,
        csvHeaders(me.token),
      ),
    );
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(body.log.key).toMatch(new RegExp(`^incoming/${me.id}/[0-9a-f-]{36}\\.csv$`));
    expect(body.log.filename).toBe("bench run.csv");
    expect(body.log.sha256).toBe(createHash("sha256").update(csv).digest("hex"));
    expect(body.log.bytes).toBe(Buffer.byteLength(csv));
    expect(await getObjectText(body.log.key)).toBe(csv);
    expect(body.preview.figures.cells).toBe(4);
    expect(body.preview.checks.map((c: { code: string }) => c.code)).toContain("cells-mismatch");
    expect(body.preview.curve.length).toBeGreaterThan(10);
  });

  it("streams a log larger than one upload part (6 MB) in parts and keeps it byte for byte", async () => {
    const me = await signedIn("moderator");
    const { csv } = sampleLog({ loadCurrentA: 2.2, sampleIntervalS: 0.01, noise: {} });
    expect(Buffer.byteLength(csv)).toBeGreaterThan(5 * 1024 * 1024 + 1);
    const res = await call(postRequest("/api/v1/uploads/log?filename=long.csv&cells=4", csv, csvHeaders(me.token)));
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(body.log.sha256).toBe(createHash("sha256").update(csv).digest("hex"));
    expect((await getObjectText(body.log.key))?.length).toBe(csv.length);
  });

  it("refuses a log that cannot be read with 422 on the log field, and leaves nothing stored", async () => {
    const me = await signedIn("contributor");
    const res = await call(
      postRequest("/api/v1/uploads/log?filename=broken.csv", "time,voltage\n1,2\n", csvHeaders(me.token)),
    );
    expect(res.status).toBe(422);
    expect((await res.json()).error.fieldErrors.log[0]).toMatch(/\w/);
    expect(await keysUnder(`incoming/${me.id}/`)).toEqual([]);
  });

  it("refuses a binary file, a wrong content type and a file that is not named like a log", async () => {
    const me = await signedIn("contributor");
    const pdf = new TextEncoder().encode("%PDF-1.7 not a log");
    const binary = await call(postRequest("/api/v1/uploads/log?filename=a.csv", pdf, csvHeaders(me.token)));
    expect(binary.status).toBe(422);
    expect((await binary.json()).error.fieldErrors.log[0]).toMatch(/PDF/);
    const json = await call(
      postRequest("/api/v1/uploads/log?filename=a.csv", "{}", {
        ...csvHeaders(me.token),
        "content-type": "application/json",
      }),
    );
    expect(json.status).toBe(415);
    const named = await call(
      postRequest("/api/v1/uploads/log?filename=label.jpg", sampleLog().csv, csvHeaders(me.token)),
    );
    expect(named.status).toBe(415);
    expect((await named.json()).error.fieldErrors.log[0]).toMatch(/label\.jpg is not a CSV log/);
    expect(await keysUnder(`incoming/${me.id}/`)).toEqual([]);
  });

  it("answers 413 past the size limit, by Content-Length or by the stream, and leaves nothing stored", async () => {
    const me = await signedIn("contributor");
    const big = "0.000,16.8,0.0,22.0\n".repeat(400_000); // 8 MB
    const declared = await call(
      postRequest("/api/v1/uploads/log?filename=big.csv", big, {
        ...csvHeaders(me.token),
        "content-length": String(big.length),
      }),
    );
    expect(declared.status).toBe(413);
    const streamed = await call(
      postRequest("/api/v1/uploads/log?filename=big.csv", `time,voltage,current\n${big}`, csvHeaders(me.token)),
    );
    expect(streamed.status).toBe(413);
    expect((await streamed.json()).error.fieldErrors.log[0]).toMatch(/larger than the limit of 7 MB/);
    expect(await keysUnder(`incoming/${me.id}/`)).toEqual([]);
  });

  it("refuses bad query values with 422", async () => {
    const me = await signedIn("contributor");
    const res = await call(
      postRequest("/api/v1/uploads/log?filename=a.csv&cutoffVPerCell=9", sampleLog().csv, csvHeaders(me.token)),
    );
    expect(res.status).toBe(422);
    expect(Object.keys((await res.json()).error.fieldErrors)).toEqual(["cutoffVPerCell"]);
  });
});
