// The downloads: strict RFC 4180 CSV (no comment lines: Python's csv module reads the header), rounded figures,
// the formula guard, JSON as { data, meta, links }, ETag/304, the README beside the files, 404 for an unknown
// group, and the Data Package descriptor validated by the Frictionless profile and by the `datapackage` library
// reading every file against its Table Schema (types, constraints, primary and foreign keys).
import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import { tmpdir } from "node:os";
import path from "node:path";
import Ajv from "ajv-draft-04";
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { GET as download } from "@/app/(public)/data/download/[file]/route";
import { GET as descriptor } from "@/app/(public)/data/datapackage.json/route";
import { makerFields, packFields } from "@/lib/open-data/fields";
import { PUBLISHED_RULE } from "@/lib/open-data/licence";
import { resultFields } from "@/lib/open-data/result-fields";
import { seedOpenData } from "../helpers/open-data-fixtures";

vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const P = "dlt";
let fx: Awaited<ReturnType<typeof seedOpenData>>;
const dir = mkdtempSync(path.join(tmpdir(), "sagline-downloads-"));
beforeAll(async () => {
  fx = await seedOpenData(P);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const get = (file: string, query = "", headers: Record<string, string> = {}) =>
  download(
    new Request(`http://localhost:3000/data/download/${file}${query}`, {
      headers: { "x-forwarded-for": "198.51.100.9", ...headers },
    }),
    { params: Promise.resolve({ file }) },
  );

/** Strict: no comment option, CRLF records, header first. */
function parseCsv(text: string) {
  return Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true, newline: "\r\n" });
}

const FIELDS = { makers: makerFields, packs: packFields, results: resultFields } as const;
type Dataset = keyof typeof FIELDS;

describe("CSV downloads", () => {
  it("are strict RFC 4180: header row first, no comment lines, CRLF, UTF-8, a dated and versioned name", async () => {
    const res = await get("packs.csv", `?maker=${P}-voltwren`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8; header=present");
    expect(res.headers.get("content-disposition")).toMatch(
      /attachment; filename="sagline-packs-\d{4}-\d{2}-\d{2}-v2\.2\.0\.csv"/,
    );
    const text = await res.text();
    const lines = text.split("\r\n");
    expect(lines[0]).toBe(packFields.map((f) => f.name).join(","));
    expect(lines.some((l) => l.startsWith("#"))).toBe(false);
    expect(text.endsWith("\r\n")).toBe(true);
    expect(lines.every((line) => !line.includes("\n"))).toBe(true);
    const parsed = parseCsv(text);
    expect(parsed.errors).toEqual([]);
    expect(parsed.data.map((r) => r.slug).sort()).toEqual([`${P}-voltwren-1300-4s`, `${P}-voltwren-2200-3s`]);
    expect(parsed.data[0]).toMatchObject({ makerSlug: `${P}-voltwren`, resultCount: expect.stringMatching(/^\d+$/) });
  });

  it("round every figure to its field's digits (no float noise) and guard free text against formulas", async () => {
    const results = parseCsv(await (await get("results.csv", `?group=${fx.group}`)).text());
    expect(results.data.every((r) => r.capacityMah === "1250" && r.energyWh === "18.2")).toBe(true);
    expect(results.data.every((r) => r.meanVoltagePerCellV === "3.652" && r.cutoffVPerCell === "3.3")).toBe(true);
    expect(results.data.every((r) => /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}Z$/.test(r.publishedAt ?? ""))).toBe(true);
    // Each figure's expanded uncertainty follows it (issue 16): a column beside it, a number or empty.
    const header = Object.keys(results.data[0] ?? {});
    expect(header.indexOf("capacityMahU95")).toBe(header.indexOf("capacityMah") + 1);
    expect(results.data.every((r) => /^(\d+(\.\d+)?)?$/.test(r.capacityMahU95 ?? "x"))).toBe(true);
    const notes = results.data
      .map((r) => r.notes)
      .filter(Boolean)
      .sort();
    expect(notes).toEqual(["'=cmd|' /C calc'!A0", "'@SUM(A1) warm room"]);
    const packsCsv = parseCsv(await (await get("packs.csv", `?maker=${P}-pikecell`)).text());
    expect(packsCsv.data[0]?.model).toBe("'=Formula 1300 4S 75C");
  });

  it("contain published results only", async () => {
    const results = parseCsv(await (await get("results.csv", `?group=${fx.group}`)).text());
    const approved = fx.results
      .filter((r) => r.status === "approved")
      .map((r) => String(r.id))
      .sort();
    expect(results.data.map((r) => r.id).sort()).toEqual(approved);
  });

  it("read cleanly with Python's csv.DictReader: the header is the field list, every row complete", async (ctx) => {
    const python = spawnSync("python3", ["--version"], { encoding: "utf8" });
    if (python.error || python.status !== 0)
      ctx.skip("python3 is not on PATH here, so the check with Python's csv module cannot run");
    const script = [
      "import csv, json, sys",
      "out = {}",
      "for name in sys.argv[1:]:",
      "    with open(name, newline='', encoding='utf-8') as f:",
      "        r = csv.DictReader(f, strict=True)",
      "        rows = list(r)",
      "        out[name] = {'fields': r.fieldnames, 'rows': len(rows),",
      "                     'complete': all(None not in row and None not in row.values() for row in rows)}",
      "print(json.dumps(out))",
    ].join("\n");
    const files: Record<string, { dataset: Dataset; rows: number }> = {};
    for (const dataset of Object.keys(FIELDS) as Dataset[]) {
      const text = await (await get(`${dataset}.csv`)).text();
      const file = path.join(dir, `${dataset}.csv`);
      writeFileSync(file, text);
      files[file] = { dataset, rows: parseCsv(text).data.length };
    }
    const run = spawnSync("python3", ["-c", script, ...Object.keys(files)], { encoding: "utf8" });
    expect(run.stderr).toBe("");
    const out = JSON.parse(run.stdout) as Record<string, { fields: string[]; rows: number; complete: boolean }>;
    for (const [file, { dataset, rows }] of Object.entries(files)) {
      expect(out[file]?.fields, dataset).toEqual(FIELDS[dataset].map((f) => f.name));
      expect(out[file]?.rows, dataset).toBe(rows);
      expect(out[file]?.complete, dataset).toBe(true);
    }
  });

  it("come as JSON too, as { data, meta, links } with the licence", async () => {
    const res = await get("makers.json");
    expect(res.headers.get("content-type")).toContain("application/json");
    const body = (await res.json()) as {
      data: { slug: string; packCount: number; resultCount: number }[];
      meta: { licence: { identifier: string }; dataset: string; total: number };
      links: { describedby: string; readme: string };
    };
    expect(body.meta).toMatchObject({ licence: { identifier: "CC-BY-4.0" }, dataset: "makers" });
    expect(body.meta.total).toBe(body.data.length);
    expect(body.links.readme).toMatch(/\/data\/download\/README\.txt$/);
    // Each maker's own counts: Voltwren has two packs with three published results, Pikecell one with one.
    expect(body.data.find((m) => m.slug === `${P}-voltwren`)).toMatchObject({ packCount: 2, resultCount: 3 });
    expect(body.data.find((m) => m.slug === `${P}-pikecell`)).toMatchObject({ packCount: 1, resultCount: 1 });
  });

  it("send an ETag and answer a matching If-None-Match with a bodiless 304", async () => {
    const first = await get("results.csv", `?group=${fx.group}`);
    const etag = first.headers.get("etag") ?? "";
    expect(etag).toMatch(/^"[\w-]+"$/);
    expect((await get("results.csv", `?group=${fx.group}`)).headers.get("etag")).toBe(etag);
    const again = await get("results.csv", `?group=${fx.group}`, { "if-none-match": etag });
    expect(again.status).toBe(304);
    expect(await again.text()).toBe("");
    expect((await get("results.json", `?group=${fx.group}`, { "if-none-match": etag })).status).toBe(200);
  });

  it("refuse unknown files and groups with 404 and bad filters with 422", async () => {
    expect((await get("secrets.csv")).status).toBe(404);
    expect((await get("packs.csv", "?cells=99")).status).toBe(422);
    expect((await get("results.csv", "?group=nope")).status).toBe(404);
    expect((await get("packs.json", `?group=${P}_no_such_group`)).status).toBe(404);
  });
});

describe("README beside the files", () => {
  it("states the files, the format, the counting rule, the licence and the credit", async () => {
    const res = await get("README.txt");
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("text/plain; charset=utf-8");
    const text = await res.text();
    for (const part of [
      "results.csv",
      "RFC 4180",
      PUBLISHED_RULE,
      "CC BY 4.0",
      "CC-BY-4.0",
      "https://creativecommons.org/licenses/by/4.0/",
      "Sagline contributors",
      "/api/v1/results/{id}/log",
      "npm run analyse",
      "capacityMahU95",
      "JCGM 100:2008",
    ])
      expect(text).toContain(part);
  });
});

async function getDescriptor() {
  const res = await descriptor(new Request("http://localhost:3000/data/datapackage.json"), {
    params: Promise.resolve({}),
  });
  return (await res.json()) as {
    $schema: string;
    version: string;
    description: string;
    licenses: { name: string }[];
    resources: {
      name: string;
      path: string;
      dialect: Record<string, unknown>;
      schema: { fields: { name: string }[] };
    }[];
  };
}

describe("Data Package", () => {
  it("validates against the published Tabular Data Package profile", async () => {
    const desc = await getDescriptor();
    // The `datapackage` package ships the published Frictionless profiles (draft-04 JSON Schema), which v2
    // descriptors stay compatible with.
    const req = createRequire(import.meta.url);
    const profile = JSON.parse(
      readFileSync(req.resolve("datapackage/lib/profiles/tabular-data-package.json"), "utf8"),
    ) as object;
    const ajv = new Ajv({ allErrors: true, strict: false, validateFormats: false });
    const validate = ajv.compile(profile);
    expect(validate({ resources: [] })).toBe(false); // the profile really is enforced
    const ok = validate(desc);
    expect(validate.errors ?? []).toEqual([]);
    expect(ok).toBe(true);
  });

  it("declares v2, a semantic version, the SPDX licence, the counting rule and a dialect without comments", async () => {
    const desc = await getDescriptor();
    expect(desc.$schema).toBe("https://datapackage.org/profiles/2.0/datapackage.json");
    expect(desc.version).toBe("2.2.0");
    expect(desc.licenses[0]?.name).toBe("CC-BY-4.0");
    expect(desc.description).toContain(PUBLISHED_RULE);
    for (const r of desc.resources) {
      expect(r.dialect).not.toHaveProperty("commentChar");
      expect(r.dialect).toMatchObject({ header: true, delimiter: ",", lineTerminator: "\r\n" });
    }
  });

  it("reads every file against its Table Schema with the Frictionless `datapackage` library: types, keys, relations", async () => {
    const desc = await getDescriptor();
    // The files as downloaded, beside a copy of the descriptor whose paths point at them.
    const local = {
      ...desc,
      resources: desc.resources.map((r) => ({ ...r, path: `${r.name}.csv` })),
    };
    const counts: Record<string, number> = {};
    for (const r of desc.resources) {
      const text = await (await get(`${r.name}.csv`)).text();
      writeFileSync(path.join(dir, `${r.name}.csv`), text);
      counts[r.name] = parseCsv(text).data.length;
    }
    const { Package } = await import("datapackage");
    const pkg = await Package.load(local, { basePath: dir, strict: true });
    expect(pkg.errors).toEqual([]);
    expect(pkg.valid).toBe(true);
    for (const r of desc.resources) {
      // Casts every cell to its declared type and checks constraints, the primary key and foreign keys; throws
      // on the first file that disagrees with its schema.
      const rows = (await pkg.getResource(r.name)?.read({ keyed: true, relations: true })) ?? [];
      expect(rows.length, r.name).toBe(counts[r.name]);
    }
    const results = (await pkg.getResource("results")?.read({ keyed: true })) ?? [];
    const mine = results.filter((row) => row.groupKey === fx.group);
    expect(mine.every((row) => row.capacityMah === 1250 && row.publishedAt instanceof Date)).toBe(true);
  });
});
