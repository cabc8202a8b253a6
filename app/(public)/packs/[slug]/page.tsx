import { unstable_cache } from "next/cache";
import { notFound } from "next/navigation";
import { z } from "zod";
import { getPackBySlug } from "@/db/queries/packs";
import { listPublishedResultsForPack } from "@/db/queries/published-results";
import { cacheTags } from "@/lib/cache-tags";
import { fmt, labelSpec, packTitle } from "@/lib/format";

export const revalidate = 300;
export async function generateStaticParams() {
  return [];
}

const params = z.object({ slug: z.string().regex(/^[a-z0-9-]{1,120}$/) });

// Tagged reads: approving, flagging or merging revalidates `pack:<slug>` and the page refreshes at once.
const loadPack = (slug: string) =>
  unstable_cache(
    async () => {
      const pack = await getPackBySlug(slug);
      return pack ? { pack, results: await listPublishedResultsForPack(pack.id) } : null;
    },
    ["pack-page", slug],
    { tags: [cacheTags.pack(slug), cacheTags.packs, cacheTags.results], revalidate: 300 },
  )();

export default async function PackPage(props: { params: Promise<{ slug: string }> }) {
  const parsed = params.safeParse(await props.params);
  if (!parsed.success) notFound();
  const data = await loadPack(parsed.data.slug);
  if (!data) notFound();
  const { pack, results } = data;
  return (
    <article className="space-y-6">
      <div className="space-y-1">
        <h1>{packTitle(pack)}</h1>
        <p className="num muted">{labelSpec(pack)} · {fmt(pack.weightG, 0, "g")} · {pack.connector}</p>
      </div>
      <section className="space-y-2" aria-labelledby="results-h">
        <h2 id="results-h">Published results ({results.length})</h2>
        {results.length === 0 ? <p className="muted">No published result yet.</p> : (
          <ul className="divide-y divide-ink/10 rounded-lg border border-ink/10 dark:divide-night-line dark:border-night-line" data-testid="pack-results">
            {results.map((r) => (
              <li key={r.id} className="flex flex-wrap items-baseline justify-between gap-x-4 px-4 py-2 text-sm" data-result-id={r.id}>
                <span>
                  Result #{r.id}
                  {r.status === "disputed" ? <span className="ml-2 rounded-full bg-warn-soft px-2 py-0.5 text-xs text-warn">Disputed</span> : null}
                </span>
                <span className="num muted">{fmt(r.capacityMah, 0, "mAh")} · {fmt(r.loadRateC, 1, "C")} load · label ratio {fmt(r.labelRatio, 2)}</span>
              </li>
            ))}
          </ul>
        )}
      </section>
    </article>
  );
}
