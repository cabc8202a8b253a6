// Server-side Markdown for pages built from content/ (our own files, so inline HTML is trusted). Headings
// get ids for anchors: "## Safety {#safety}" gives id="safety"; others get a slug of their text.
import "server-only";
import fs from "node:fs/promises";
import path from "node:path";
import { Marked } from "marked";
import { slugify } from "@/lib/slug";

const marked = new Marked({
  gfm: true,
  renderer: {
    heading({ tokens, depth, text }) {
      const explicit = /\s*\{#([a-z0-9-]+)\}\s*$/.exec(text);
      const inner = this.parser.parseInline(tokens).replace(/\s*\{#[a-z0-9-]+\}\s*$/, "");
      const id = explicit?.[1] ?? slugify(text.replace(/<[^>]+>/g, ""));
      return `<h${depth} id="${id}">${inner}</h${depth}>\n`;
    },
  },
});

export function renderMarkdown(source: string): string {
  return marked.parse(source, { async: false });
}

/** Reads content/<name>.md; null when the file is not there. */
export async function readContent(name: string): Promise<string | null> {
  try {
    return await fs.readFile(path.join(process.cwd(), "content", `${name}.md`), "utf8");
  } catch {
    return null;
  }
}
