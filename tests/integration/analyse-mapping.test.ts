// The column mapping through the API: POST /api/v1/analyse?mapping=<JSON> and the upload route read a
// header-less log of four cycles (invented, from the equivalent-circuit generator) with the mapping given; bad
// JSON, an unusable mapping and columns the log does not have are 422s that say what is wrong.
import { describe, expect, it, vi } from "vitest";
import { POST } from "@/app/api/v1/analyse/route";
import { POST as uploadLogRoute } from "@/app/api/v1/uploads/log/route";
import { CYCLING_MAPPING, cyclingLog } from "../helpers/cycling-log";
import { postRequest } from "../helpers/logs";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);

let ip = 0;
const fresh = () => ({ "content-type": "text/csv", "x-forwarded-for": `10.12.0.${++ip}` });
const analyse = (query: string, csv: string) => POST(postRequest(`/api/v1/analyse?${query}`, csv, fresh()), undefined);
const mappingQuery = (m: unknown) => `mapping=${encodeURIComponent(typeof m === "string" ? m : JSON.stringify(m))}`;

describe("POST /api/v1/analyse with a column mapping", () => {
  const { csv, truth } = cyclingLog(4);

  it("refuses a header-less log without a mapping, saying to pass one", async () => {
    const res = await analyse("cells=4&ratedMah=1300", csv);
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.error.fieldErrors.file[0]).toMatch(/column mapping/);
  });

  it("reads it with the mapping: four discharges listed, the headline one described, never their sum", async () => {
    const res = await analyse(`cells=4&ratedMah=1300&labelledC=25&${mappingQuery(CYCLING_MAPPING)}`, csv);
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.discharges).toHaveLength(4);
    expect(body.headlineDischarge).toBe(1);
    expect(body.warningCodes).toContain("several-discharges");
    // Each discharge against the generator's own truth (exact for piecewise-constant current), within 1 %.
    truth.discharges.forEach((d, i) => {
      expect(body.discharges[i].capacityMah).toBeGreaterThan(d.deliveredMah * 0.99);
      expect(body.discharges[i].capacityMah).toBeLessThan(d.deliveredMah * 1.01);
    });
    expect(body.capacityMah).toBeCloseTo(body.discharges[0].capacityMah, 6);
    expect(body.capacityMah).toBeLessThan(truth.deliveredMah / 2); // not the sum of four
    expect(body.retention.points).toHaveLength(4);
  });

  it("answers 422 on `mapping` for text that is not JSON", async () => {
    const res = await analyse(mappingQuery('{"time":0,'), csv);
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.error.fieldErrors.mapping[0]).toMatch(/not valid JSON/);
  });

  it("answers 422 on `mapping` for JSON that is not a usable mapping", async () => {
    const named = await analyse(mappingQuery({ time: "Time", voltage: 2, current: 1, hasHeader: false }), csv);
    expect(named.status).toBe(422);
    expect((await named.json()).error.fieldErrors.mapping[0]).toMatch(/time must be a column number/);
    const unknown = await analyse(mappingQuery({ time: 0, voltage: 2, current: 1, speed: 3 }), csv);
    expect(unknown.status).toBe(422);
    expect((await unknown.json()).error.fieldErrors.mapping[0]).toMatch(/not usable/);
  });

  it("answers 422 on `mapping` for columns the log does not have", async () => {
    const res = await analyse(mappingQuery({ time: 0, current: 1, voltage: 12, hasHeader: false }), csv);
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.error.fieldErrors.mapping[0]).toMatch(/voltage in column 12 .*only 4 columns/);
    expect(body.error.message).toMatch(/could not be read/);
  });
});

describe("POST /api/v1/uploads/log with a column mapping", () => {
  it("stores the header-less log and previews it with the mapping", async () => {
    const me = await signedIn("contributor");
    const { csv } = cyclingLog(4, 78);
    const res = await uploadLogRoute(
      postRequest(
        `/api/v1/uploads/log?filename=cycles.csv&cells=4&ratedMah=1300&${mappingQuery(CYCLING_MAPPING)}`,
        csv,
        {
          "content-type": "text/csv",
          cookie: `authjs.session-token=${me.token}`,
        },
      ),
      undefined,
    );
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(body.log.key).toMatch(/^incoming\//);
    expect(body.preview.figures.discharges).toHaveLength(4);
  });
});
