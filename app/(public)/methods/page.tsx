import type { Metadata } from "next";
import { METHODS_SECTIONS, renderMethods } from "@/server/methods-content";

export const metadata: Metadata = {
  title: "Methods and safety",
  description:
    "How Sagline computes every figure and how sure each one is, which results it compares, how to run a usable test, and safety cautions.",
};
export const dynamic = "force-static";

export default async function MethodsPage() {
  const html = await renderMethods();
  return (
    <article className="max-w-3xl space-y-4">
      <h1>Methods and safety</h1>
      <p className="muted">
        How each figure is defined and where the definition comes from, how sure each number is, which results are
        compared with which, how to run a test Sagline can use — and how to stay safe doing it.
      </p>
      <nav aria-label="On this page" className="card text-sm">
        <ul className="flex flex-wrap gap-x-4 gap-y-1">
          {METHODS_SECTIONS.map((s) => (
            <li key={s.id}>
              <a href={`#${s.id}`}>{s.title}</a>
            </li>
          ))}
        </ul>
      </nav>
      {/* Our own Markdown from content/, rendered at build time. */}
      <div
        className="prose-sagline [&_table]:block [&_table]:overflow-x-auto"
        dangerouslySetInnerHTML={{ __html: html }}
      />
    </article>
  );
}
