// POST /api/v1/analyse: anyone may check a log; nothing is stored.
import { describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.LOG_MAX_BYTES = String(400 * 1024);
});

import { POST } from "@/app/api/v1/analyse/route";
import { db } from "@/db";
import { results } from "@/db/schema";
import { SEMICOLON_DIALECT, multipart, postRequest, sampleLog } from "@/tests/helpers/logs";

let ip = 0;
const fresh = () => ({ "x-forwarded-for": `10.9.0.${++ip}` });
const call = (req: Request) => POST(req, undefined);

describe("POST /api/v1/analyse", () => {
  it("answers a raw text/csv body with the command-line tool's JSON fields (IEC 61960-3 two-level log)", async () => {
    const { csv, truth } = sampleLog({ iecPrelude: true });
    const res = await call(
      postRequest("/api/v1/analyse?cells=4&ratedMah=1300&labelledC=75&weightG=150", csv, {
        "content-type": "text/csv",
        ...fresh(),
      }),
    );
    expect(res.status).toBe(200);
    const body = await res.json();
    for (const field of [
      "samples",
      "durationS",
      "cells",
      "capacityMah",
      "energyWh",
      "meanVoltageV",
      "minVoltageV",
      "peakCurrentA",
      "peakTemperatureC",
      "temperatureRiseC",
      "holdVoltagePerCellV",
      "dcResistanceMohm",
      "dcResistanceMethod",
      "resistanceAt25CMohm",
      "sagLimitedC",
      "capacityRatio",
      "labelRatio",
      "specificEnergyWhKg",
      "warnings",
    ])
      expect(body, field).toHaveProperty(field);
    expect(body.cells).toBe(4);
    expect(body.dcResistanceMethod).toBe("iec-61960-two-level");
    expect(body.capacityMah).toBeCloseTo(truth.deliveredMah, -1);
    expect(body.specificEnergyWhKg).toBeGreaterThan(0);
    expect(body.curve).toBeUndefined();
    expect(res.headers.get("cache-control")).toBe("no-store");
  });

  it("reads a multipart field `file` in the semicolon + decimal comma + mV/mA dialect, and adds the curve on request", async () => {
    const { csv } = sampleLog({}, SEMICOLON_DIALECT);
    const before = await db.$count(results);
    const res = await call(
      postRequest("/api/v1/analyse?cells=4&ratedMah=1300&include=curve", multipart("file", "bench.csv", csv), fresh()),
    );
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.capacityMah).toBeGreaterThan(1200);
    expect(body.minVoltageV / 4).toBeGreaterThan(3.2);
    expect(Array.isArray(body.curve)).toBe(true);
    expect(body.curve[0]).toHaveProperty("voltageV");
    expect(await db.$count(results)).toBe(before); // nothing stored
  });

  it("infers the cell count when none is given and warns about it", async () => {
    const { csv } = sampleLog({ cells: 6 });
    const res = await call(postRequest("/api/v1/analyse", csv, { "content-type": "text/csv", ...fresh() }));
    const body = await res.json();
    expect(body.cells).toBe(6);
    expect(body.labelRatio).toBeNull();
  });

  it("refuses a log that cannot be read with 422 and a clear message on the file", async () => {
    const res = await call(
      postRequest("/api/v1/analyse", "hello,world\n1,2\n", { "content-type": "text/csv", ...fresh() }),
    );
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.error.code).toBe("validation");
    expect(body.error.fieldErrors.file[0]).toMatch(/\w/);
    expect(body.error.message).toMatch(/^The log could not be read/);
  });

  it("refuses a binary file sent as CSV with 422", async () => {
    const zip = new Uint8Array([0x50, 0x4b, 0x03, 0x04, 0, 0, 0, 0, 1, 2, 3]);
    const res = await call(postRequest("/api/v1/analyse", zip, { "content-type": "text/csv", ...fresh() }));
    expect(res.status).toBe(422);
    expect((await res.json()).error.fieldErrors.file[0]).toMatch(/spreadsheet/);
  });

  it("refuses a multipart body without a file field with 422", async () => {
    const fd = new FormData();
    fd.append("note", "no log here");
    const res = await call(postRequest("/api/v1/analyse", fd, fresh()));
    expect(res.status).toBe(422);
  });

  it("refuses bad query parameters with 422 and field errors", async () => {
    const { csv } = sampleLog();
    const res = await call(
      postRequest("/api/v1/analyse?cells=4.5&ratedMah=-3", csv, { "content-type": "text/csv", ...fresh() }),
    );
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(Object.keys(body.error.fieldErrors).sort()).toEqual(["cells", "ratedMah"]);
  });

  it("answers 415 for a wrong content type", async () => {
    const res = await call(
      postRequest("/api/v1/analyse", JSON.stringify({ log: "1,2" }), {
        "content-type": "application/json",
        ...fresh(),
      }),
    );
    expect(res.status).toBe(415);
    expect((await res.json()).error.code).toBe("unsupported_media_type");
  });

  it("answers 413 past the body limit, whether Content-Length says so or the stream does", async () => {
    const { csv } = sampleLog({ loadCurrentA: 2.6, sampleIntervalS: 0.1 });
    expect(csv.length).toBeGreaterThan(400 * 1024);
    const declared = await call(
      postRequest("/api/v1/analyse", csv, {
        "content-type": "text/csv",
        "content-length": String(Buffer.byteLength(csv)),
        ...fresh(),
      }),
    );
    expect(declared.status).toBe(413);
    const streamed = await call(postRequest("/api/v1/analyse", csv, { "content-type": "text/csv", ...fresh() }));
    expect(streamed.status).toBe(413);
    const multi = await call(postRequest("/api/v1/analyse", multipart("file", "big.csv", csv), fresh()));
    expect(multi.status).toBe(413);
  });

  it("answers 429 with Retry-After once an address passes its limit", async () => {
    const headers = { "content-type": "text/csv", "x-forwarded-for": "10.9.9.9" };
    let last: Response | null = null;
    for (let k = 0; k < 31; k++) last = await call(postRequest("/api/v1/analyse", "t,v\n", headers));
    expect(last?.status).toBe(429);
    expect(Number(last?.headers.get("retry-after"))).toBeGreaterThan(0);
  });

  it("refuses a cross-site browser request", async () => {
    const res = await call(
      postRequest("/api/v1/analyse", "t,v\n", {
        "content-type": "text/csv",
        origin: "https://elsewhere.example",
        host: "localhost:3013",
        ...fresh(),
      }),
    );
    expect(res.status).toBe(403);
  });
});
