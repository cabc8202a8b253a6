import type { Metadata } from "next";
import { PUBLISHED_RULE } from "@/lib/open-data/licence";
import { readContent, renderMarkdown } from "@/server/markdown";

export const metadata: Metadata = {
  title: "Methods and safety",
  description:
    "How Sagline computes every figure, which results it compares, how to run a usable test, and safety cautions.",
};
export const dynamic = "force-static";

// The measurement core's own definitions (content/methods-figures.md, written with lib/analysis) win over
// this page's summary table when present.
const SECTIONS = [
  ["methods-figures", "methods/figures"],
  ["methods/like-for-like"],
  ["methods/checks"],
  ["methods/running-a-test"],
  ["methods/safety"],
] as const;

export default async function MethodsPage() {
  const parts: string[] = [];
  for (const names of SECTIONS) {
    for (const name of names) {
      const text = await readContent(name);
      if (text) {
        parts.push(renderMarkdown(text));
        // The counting rule, in the one wording the Data Package, the README and /data use too.
        if (name === "methods/like-for-like")
          parts.push(renderMarkdown(`## Which results count {#which-results-count}\n\n${PUBLISHED_RULE}\n`));
        break;
      }
    }
  }
  return (
    <article className="max-w-3xl space-y-4">
      <h1>Methods and safety</h1>
      <p className="muted">
        How each figure is defined and where the definition comes from, which results are compared with which, how to
        run a test Sagline can use — and how to stay safe doing it.
      </p>
      <nav aria-label="On this page" className="card text-sm">
        <ul className="flex flex-wrap gap-x-4 gap-y-1">
          <li>
            <a href="#figures">Figures</a>
          </li>
          <li>
            <a href="#like-for-like">Like-for-like groups</a>
          </li>
          <li>
            <a href="#which-results-count">Which results count</a>
          </li>
          <li>
            <a href="#checks">Checks</a>
          </li>
          <li>
            <a href="#running-a-test">Running a test</a>
          </li>
          <li>
            <a href="#safety">Safety</a>
          </li>
        </ul>
      </nav>
      {/* Our own Markdown from content/, rendered at build time. */}
      <div
        className="prose-sagline [&_table]:block [&_table]:overflow-x-auto"
        dangerouslySetInnerHTML={{ __html: parts.join("\n") }}
      />
    </article>
  );
}
