// Raw logs of published results (issue 13 item 7): a log submitted and approved through the real flow is served
// by GET /api/v1/results/{id}/log byte for byte (ETag = its SHA-256, 304, attachment name), nothing else is; and
// the command the result's page shows, run with the open CLI on the downloaded file, gives the published figures.
import type { Figures } from "@/lib/analysis";
import { resolveAccuracy } from "@/lib/analysis/uncertainty";
import { figureU95, U95_FIGURES } from "@/lib/figure-u95";
import { spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { GET as getLog } from "@/app/api/v1/results/[id]/log/route";
import { GET as getResult } from "@/app/api/v1/results/[id]/route";
import { db } from "@/db";
import { getPublicResult } from "@/db/queries/results";
import { results } from "@/db/schema";
import { logDownloadName, recomputeCommand } from "@/lib/open-data/recompute";
import { resultFields } from "@/lib/open-data/result-fields";
import { decideResult } from "@/server/review";
import { sampleLog } from "../helpers/logs";
import { requestState } from "../helpers/next-mocks";
import { makePack, submission, uploadLog } from "../helpers/submission";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { submitResult } = await import("@/app/(contributor)/submit/actions/submit-result");

const repoRoot = path.resolve(__dirname, "../..");
const dir = mkdtempSync(path.join(tmpdir(), "sagline-log-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

let ip = 0;
const call = (id: number | string, headers: Record<string, string> = {}) =>
  getLog(
    new Request(`http://localhost:3000/api/v1/results/${id}/log`, {
      headers: { "x-forwarded-for": `10.77.0.${++ip % 250}`, ...headers },
    }),
    { params: Promise.resolve({ id: String(id) }) },
  );

let csv = "";
let published = 0;
let pending = 0;

beforeAll(async () => {
  const { packId } = await makePack({ weightG: 158.5 });
  const me = await signedIn("contributor", "log-tester");
  const mod = await signedIn("moderator", "log-moderator");
  requestState.token = me.token;
  csv = sampleLog({ seed: 731 }).csv;
  const log = await uploadLog(me.token, csv, "my bench 2026-11-03.csv");
  const res = await submitResult(null, submission(packId, log));
  if (!res.ok) throw new Error(`submit failed: ${res.error}`);
  published = res.data.resultId;
  await decideResult(mod.id, published, {
    kind: "approve",
    note: null,
    catalogue: { intoPackId: null, intoMakerId: null },
  });
  const other = await submitResult(
    null,
    submission(packId, await uploadLog(me.token, sampleLog({ seed: 732 }).csv, "second.csv")),
  );
  if (!other.ok) throw new Error("second submit failed");
  pending = other.data.resultId;
  requestState.token = null;
});

describe("GET /api/v1/results/{id}/log", () => {
  it("streams the stored log of a published result byte for byte, as an attachment with its SHA-256 as ETag", async () => {
    const res = await call(published);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(res.headers.get("content-disposition")).toBe(`attachment; filename="sagline-result-${published}-log.csv"`);
    expect(res.headers.get("access-control-allow-origin")).toBe("*");
    expect(res.headers.get("link")).toContain('rel="license"');
    const body = new Uint8Array(await res.arrayBuffer());
    expect(Buffer.from(body).toString("utf8")).toBe(csv);
    const sha = createHash("sha256").update(body).digest("hex");
    expect(res.headers.get("etag")).toBe(`"${sha}"`);
    expect(res.headers.get("content-length")).toBe(String(body.byteLength));
  });

  it("answers a matching If-None-Match with a bodiless 304", async () => {
    const etag = (await call(published)).headers.get("etag") ?? "";
    const again = await call(published, { "if-none-match": etag });
    expect(again.status).toBe(304);
    expect(await again.text()).toBe("");
  });

  it("is 404 for a result that is not published, one that does not exist, and ids that cannot be ids", async () => {
    for (const id of [pending, 2_000_000_000, "abc", "0", "99999999999"]) {
      const res = await call(id);
      expect(res.status, String(id)).toBe(404);
      expect(((await res.json()) as { error: { code: string } }).error.code).toBe("not_found");
    }
  });

  it("is 404, not a crash, when a published result's log is missing from storage", async () => {
    const [row] = await db.select({ logKey: results.logKey }).from(results).where(eq(results.id, published));
    await db.update(results).set({ logKey: "results/none/missing.csv" }).where(eq(results.id, published));
    try {
      expect((await call(published)).status).toBe(404);
    } finally {
      await db
        .update(results)
        .set({ logKey: row?.logKey ?? "" })
        .where(eq(results.id, published));
    }
  });
});

describe("recomputing the figures with the open CLI", () => {
  it("the result page's command, run on the downloaded log, prints the published figures", async () => {
    const detail = await getPublicResult(published);
    if (!detail) throw new Error("not published");
    const file = logDownloadName(published, detail.logFilename);
    const command = recomputeCommand(file, {
      cells: detail.pack.cellsInSeries,
      ratedMah: detail.ratedCapacityMah,
      labelledC: detail.pack.labelledContinuousC,
      weightG: detail.pack.weightG,
      cutoffVPerCell: detail.cutoffVPerCell,
      stopTemperatureC: detail.stopTemperatureC,
      packStartTemperatureC: detail.packStartTemperatureC,
    });
    expect(command).toBe(
      `npm run analyse -- ${file} --cells 4 --rated-mah 1300 --labelled-c 75 --weight-g 158.5 --cutoff-v 3.3 --stop-temp-c 60 --pack-start-temp-c 22.5`,
    );
    writeFileSync(path.join(dir, file), Buffer.from(await (await call(published)).arrayBuffer()));
    // What `npm run analyse --` runs, from the checkout, on the downloaded file.
    const args = command
      .replace(/^npm run analyse -- /, "")
      .split(" ")
      .map((a) => (a === file ? path.join(dir, file) : a));
    const run = spawnSync(
      process.execPath,
      ["--import", "tsx", path.join(repoRoot, "scripts/analyse.ts"), ...args, "--json"],
      {
        cwd: repoRoot,
        encoding: "utf8",
        timeout: 60_000,
      },
    );
    expect(run.stderr).toBe("");
    const cli = JSON.parse(run.stdout) as Record<string, number | string | null>;
    const api = (await (
      await getResult(new Request(`http://localhost:3000/api/v1/results/${published}`), {
        params: Promise.resolve({ id: String(published) }),
      })
    ).json()) as { data: { figures: Record<string, number | string | null> } };
    // The figures themselves; each `<figure>U95` rests on the bench's accuracy, which the CLI is not told (below).
    const figures = resultFields.filter((f) => f.section === "figures" && !f.name.endsWith("U95"));
    expect(figures.length).toBeGreaterThan(10);
    for (const f of figures) {
      const mine = cli[f.name] ?? null;
      const expected = typeof mine === "number" && f.digits !== undefined ? Number(mine.toFixed(f.digits)) : mine;
      expect(api.data.figures[f.name], f.name).toBe(expected);
    }
    expect(api.data.figures.capacityMah).toBeGreaterThan(1000);
    // The ± follows from the recomputed figures too: no bench profile here, so the stated default accuracy applies
    // (lib/figure-u95.ts on the CLI's figures gives the published U95, to its digits).
    const u95 = figureU95(JSON.parse(run.stdout) as Figures, resolveAccuracy(null).accuracy, {
      cells: 4,
      ratedMah: 1300,
      labelledC: 75,
    });
    for (const f of resultFields.filter((x) => x.name.endsWith("U95"))) {
      const name = f.name.replace(/U95$/, "");
      const mine = U95_FIGURES.find((n) => n === name);
      if (!mine) throw new Error(`no U95 figure ${name}`);
      const v = u95[mine];
      expect(api.data.figures[f.name], f.name).toBe(v === null ? null : Number(v.toFixed(f.digits ?? 3)));
    }
    expect(api.data.figures.capacityMahU95).toBeGreaterThan(0);
  });
});
