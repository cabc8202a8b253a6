// The sections of /methods, in order: each a Markdown file under content/ whose headings (and a few inline
// spans) carry the ids that pages link to (/methods#sag-limited-c, …). The page renders them with
// renderMethods(); tests/integration/methods-anchors.test.ts checks every in-site /methods# link against them.
import "server-only";
import { readContent, renderMarkdown } from "./markdown";

export const METHODS_SECTIONS = [
  { file: "methods/figures", id: "figures", title: "Figures" },
  { file: "methods/like-for-like", id: "like-for-like", title: "Like-for-like groups" },
  { file: "methods/uncertainty", id: "uncertainty", title: "Uncertainty" },
  { file: "methods/checks", id: "checks", title: "Checks" },
  { file: "methods/running-a-test", id: "running-a-test", title: "Running a test" },
  { file: "methods/safety", id: "safety", title: "Safety" },
] as const;

/** The whole /methods body as HTML; a missing section file is an error, never a silently shorter page. */
export async function renderMethods(): Promise<string> {
  const parts: string[] = [];
  for (const section of METHODS_SECTIONS) {
    const text = await readContent(section.file);
    if (text === null) throw new Error(`content/${section.file}.md is missing`);
    parts.push(renderMarkdown(text));
  }
  return parts.join("\n");
}
