// Every in-site link to /methods#… lands on an element with that id. The ids come from /methods as it is
// rendered (server/methods-content.ts, the same Markdown files and renderer the page uses); the links come
// from the source: literal "/methods#id" hrefs anywhere in app/, components/, lib/, server/ and content/,
// every anchor in lib/figure-words.ts METHODS_ANCHORS (pages build hrefs from it), and "#id" links inside the
// methods content itself. tests/e2e/methods-anchors.spec.ts crawls the built pages for the same thing.
import fs from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { METHODS_ANCHORS } from "@/lib/figure-words";
import { METHODS_SECTIONS, renderMethods } from "@/server/methods-content";

const ROOT = path.resolve(__dirname, "../../..");
const SCANNED = ["app", "components", "lib", "server", "content"];

function files(dir: string): string[] {
  const out: string[] = [];
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const p = path.join(dir, entry.name);
    if (entry.isDirectory()) out.push(...files(p));
    else if (/\.(ts|tsx|md|mjs)$/.test(entry.name)) out.push(p);
  }
  return out;
}

let ids: string[] = [];
beforeAll(async () => {
  const html = await renderMethods();
  ids = [...html.matchAll(/\sid="([^"]+)"/g)].map((m) => m[1] ?? "");
});

describe("/methods anchors", () => {
  it("renders every section file, with no id used twice", () => {
    expect(ids.length).toBeGreaterThan(20);
    const seen = new Set<string>();
    const twice = ids.filter((id) => (seen.has(id) ? true : (seen.add(id), false)));
    expect(twice).toEqual([]);
    for (const s of METHODS_SECTIONS) expect(ids, `section ${s.title}`).toContain(s.id);
  });

  it("has an element for every literal /methods#… link in the source", () => {
    const links: { file: string; id: string }[] = [];
    for (const dir of SCANNED)
      for (const file of files(path.join(ROOT, dir))) {
        const text = fs.readFileSync(file, "utf8");
        for (const m of text.matchAll(/\/methods#([a-z0-9-]+)/g))
          links.push({ file: path.relative(ROOT, file), id: m[1] ?? "" });
      }
    expect(links.length).toBeGreaterThan(3);
    const dangling = links.filter((l) => !ids.includes(l.id)).map((l) => `${l.file} → #${l.id}`);
    expect(dangling).toEqual([]);
  });

  it("builds no /methods# link from a value the test cannot see (only methodsHref with METHODS_ANCHORS)", () => {
    const dynamic: string[] = [];
    for (const dir of SCANNED)
      for (const file of files(path.join(ROOT, dir))) {
        const rel = path.relative(ROOT, file);
        if (rel === path.join("lib", "figure-words.ts")) continue;
        if (/\/methods#\$\{/.test(fs.readFileSync(file, "utf8"))) dynamic.push(rel);
      }
    expect(dynamic).toEqual([]);
  });

  it("has an element for every anchor pages link through METHODS_ANCHORS", () => {
    const missing = Object.entries(METHODS_ANCHORS)
      .filter(([, id]) => !ids.includes(id))
      .map(([k, id]) => `${k} → #${id}`);
    expect(missing).toEqual([]);
  });

  it("has an element for every #… link inside the methods content", () => {
    const dangling: string[] = [];
    for (const file of files(path.join(ROOT, "content")))
      for (const m of fs.readFileSync(file, "utf8").matchAll(/\]\(#([a-z0-9-]+)\)/g))
        if (!ids.includes(m[1] ?? "")) dangling.push(`${path.relative(ROOT, file)} → #${m[1]}`);
    expect(dangling).toEqual([]);
  });

  it("names the sources of its definitions (a standard, a paper or 'common practice' beside each rating)", async () => {
    const html = await renderMethods();
    const section = (id: string) =>
      html.slice(html.indexOf(`id="${id}"`), html.indexOf("<h3", html.indexOf(`id="${id}"`) + 1));
    expect(section("sag-limited-c")).toMatch(/DOE\/ID-11069/);
    expect(section("sustained-c")).toMatch(/common practice/);
    expect(section("readings")).toMatch(/von Neumann/);
    expect(html).toMatch(/IEC 61960-3/);
  });
});
