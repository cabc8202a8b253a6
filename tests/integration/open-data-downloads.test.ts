import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import Ajv from "ajv-draft-04";
import Papa from "papaparse";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as download } from "@/app/(public)/data/download/[file]/route";
import { GET as descriptor } from "@/app/(public)/data/datapackage.json/route";
import { seedOpenData } from "../helpers/open-data-fixtures";

const P = "dlt";
let fx: Awaited<ReturnType<typeof seedOpenData>>;
beforeAll(async () => {
  fx = await seedOpenData(P);
});

const get = (file: string, query = "") =>
  download(
    new Request(`http://localhost:3000/data/download/${file}${query}`, {
      headers: { "x-forwarded-for": "198.51.100.9" },
    }),
    { params: Promise.resolve({ file }) },
  );

function parseCsv(text: string) {
  return Papa.parse<Record<string, string>>(text, {
    header: true,
    comments: "#",
    skipEmptyLines: true,
    newline: "\r\n",
  });
}

describe("CSV downloads", () => {
  it("are RFC 4180 CSV in UTF-8 with a licence note, CRLF lines and a dated, versioned file name", async () => {
    const res = await get("packs.csv", `?q=${P}`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8; header=present");
    expect(res.headers.get("content-disposition")).toMatch(
      /attachment; filename="sagline-packs-\d{4}-\d{2}-\d{2}-v1\.0\.0\.csv"/,
    );
    const text = await res.text();
    expect(text.startsWith("# Sagline open data")).toBe(true);
    expect(text).toContain("CC-BY-4.0");
    expect(text.split("\r\n").every((line) => !line.includes("\n"))).toBe(true);
    const parsed = parseCsv(text);
    expect(parsed.errors).toEqual([]);
    expect(parsed.data).toHaveLength(3);
  });

  it("guards free text against formula injection (OWASP) but not numbers", async () => {
    const packsCsv = parseCsv(await (await get("packs.csv", `?maker=${P}-pikecell`)).text());
    expect(packsCsv.data[0]?.model).toBe("'=Formula 1300 4S 75C");
    const results = parseCsv(await (await get("results.csv", `?group=${fx.group}`)).text());
    const notes = results.data
      .map((r) => r.notes)
      .filter(Boolean)
      .sort();
    expect(notes).toEqual(["'=cmd|' /C calc'!A0", "'@SUM(A1) warm room"]);
    expect(results.data.every((r) => r.ambientTemperatureC === "22")).toBe(true);
  });

  it("contain approved results only", async () => {
    const results = parseCsv(await (await get("results.csv", `?group=${fx.group}`)).text());
    const approved = fx.results
      .filter((r) => r.status === "approved")
      .map((r) => String(r.id))
      .sort();
    expect(results.data.map((r) => r.id).sort()).toEqual(approved);
  });

  it("come as JSON too, with the licence", async () => {
    const res = await get("makers.json");
    expect(res.headers.get("content-type")).toContain("application/json");
    const body = (await res.json()) as { licence: { name: string }; note: string[]; data: { slug: string }[] };
    expect(body.licence.name).toBe("CC-BY-4.0");
    expect(body.data.map((m) => m.slug)).toEqual(expect.arrayContaining([`${P}-voltwren`, `${P}-pikecell`]));
  });

  it("refuse unknown files and bad filters with 422", async () => {
    expect((await get("secrets.csv")).status).toBe(422);
    expect((await get("packs.csv", "?cells=99")).status).toBe(422);
  });
});

describe("Data Package descriptor", () => {
  it("validates against the published Tabular Data Package profile", async () => {
    const desc = (await (
      await descriptor(new Request("http://localhost:3000/data/datapackage.json"), { params: Promise.resolve({}) })
    ).json()) as Record<string, unknown>;
    // No registry package ships the Data Package v2 profiles yet; the `datapackage` package ships the
    // published Frictionless profiles (draft-04 JSON Schema), which v2 descriptors stay compatible with.
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

  it("declares v2, a semantic version, the licence, and keys that resolve", async () => {
    type Res = {
      name: string;
      path: string;
      schema: {
        fields: { name: string; description: string }[];
        primaryKey: string[];
        foreignKeys?: { fields: string[]; reference: { resource: string; fields: string[] } }[];
      };
    };
    const desc = (await (
      await descriptor(new Request("http://localhost:3000/data/datapackage.json"), { params: Promise.resolve({}) })
    ).json()) as { $schema: string; version: string; licenses: { name: string }[]; resources: Res[] };
    expect(desc.$schema).toBe("https://datapackage.org/profiles/2.0/datapackage.json");
    expect(desc.version).toMatch(/^\d+\.\d+\.\d+$/);
    expect(desc.licenses[0]?.name).toBe("CC-BY-4.0");
    const byName = new Map(desc.resources.map((r) => [r.name, r]));
    for (const r of desc.resources) {
      const names = r.schema.fields.map((f) => f.name);
      expect(names).toEqual(expect.arrayContaining(r.schema.primaryKey));
      for (const fk of r.schema.foreignKeys ?? []) {
        expect(names).toEqual(expect.arrayContaining(fk.fields));
        expect(byName.get(fk.reference.resource)?.schema.fields.map((f) => f.name)).toEqual(
          expect.arrayContaining(fk.reference.fields),
        );
      }
      // The header of the file matches the Table Schema, field for field.
      const file = r.path.split("/").pop() ?? "";
      const text = await (await get(file)).text();
      expect(parseCsv(text).meta.fields).toEqual(names);
    }
    const results = byName.get("results");
    expect(results?.schema.fields.find((f) => f.name === "capacityMah")?.description).toContain("mAh");
  });
});
