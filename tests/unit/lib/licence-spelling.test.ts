// One licence identifier: the SPDX id "CC-BY-4.0" for machines (written once, in lib/open-data/licence.ts) and
// "CC BY 4.0" for people. No third spelling anywhere in the code, content or guides.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

const root = path.resolve(__dirname, "../../..");
const FOLDERS = ["app", "components", "lib", "server", "db", "content", "scripts"];
const FILES = ["README.md", "DEVELOPERS.md"];
const TEXT = /\.(ts|tsx|mjs|md|txt|json)$/;

function files(): string[] {
  const out = FILES.map((f) => path.join(root, f));
  for (const dir of FOLDERS)
    for (const f of fs.readdirSync(path.join(root, dir), { recursive: true }) as string[])
      if (TEXT.test(f) && !f.includes("migrations") && fs.statSync(path.join(root, dir, f)).isFile())
        out.push(path.join(root, dir, f));
  return out;
}

describe("licence spellings", () => {
  it("uses only 'CC-BY-4.0' (identifier) and 'CC BY 4.0' (shown), and writes the identifier in one place", () => {
    const odd: string[] = [];
    const identifierIn: string[] = [];
    for (const file of files()) {
      const text = fs.readFileSync(file, "utf8");
      for (const m of text.matchAll(/c\s*c[\s_-]*by[\s_-]*4(?:\.0)?\b/gi))
        if (m[0] !== "CC BY 4.0" && m[0] !== "CC-BY-4.0") odd.push(`${path.relative(root, file)}: ${m[0]}`);
      if (text.includes('"CC-BY-4.0"') && !file.endsWith(".md")) identifierIn.push(path.relative(root, file));
    }
    expect(odd).toEqual([]);
    expect(identifierIn).toEqual([path.join("lib", "open-data", "licence.ts")]);
  });
});
