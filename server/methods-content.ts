// The sections of /methods, in order: each a Markdown file under content/ (or, for the counting rule, the one
// wording the Data Package, the README and /data use too) whose headings (and a few inline spans) carry the ids
// that pages link to (/methods#sag-limited-c, …). The page renders them with renderMethods();
// tests/unit/server/methods-anchors.test.ts checks every in-site /methods# link against them.
import "server-only";
import { PUBLISHED_RULE } from "@/lib/open-data/licence";
import { readContent, renderMarkdown } from "./markdown";

type Section = { id: string; title: string } & ({ file: string } | { markdown: string });

export const METHODS_SECTIONS: readonly Section[] = [
  { file: "methods/figures", id: "figures", title: "Figures" },
  { file: "methods/like-for-like", id: "like-for-like", title: "Like-for-like groups" },
  {
    markdown: `## Which results count {#which-results-count}\n\n${PUBLISHED_RULE}\n`,
    id: "which-results-count",
    title: "Which results count",
  },
  { file: "methods/uncertainty", id: "uncertainty", title: "Uncertainty" },
  { file: "methods/checks", id: "checks", title: "Checks" },
  { file: "methods/running-a-test", id: "running-a-test", title: "Running a test" },
  { file: "methods/safety", id: "safety", title: "Safety" },
];

/** The whole /methods body as HTML; a missing section file is an error, never a silently shorter page. */
export async function renderMethods(): Promise<string> {
  const parts: string[] = [];
  for (const section of METHODS_SECTIONS) {
    if ("markdown" in section) {
      parts.push(renderMarkdown(section.markdown));
      continue;
    }
    const text = await readContent(section.file);
    if (text === null) throw new Error(`content/${section.file}.md is missing`);
    parts.push(renderMarkdown(text));
  }
  return parts.join("\n");
}
