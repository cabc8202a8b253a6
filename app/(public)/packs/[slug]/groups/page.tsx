import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { z } from "zod";
import { StaticIsland } from "@/components/static-island";
import { packTitle } from "@/lib/format";
import { cachedPackDetail } from "@/server/public-data";
import { GroupFiguresTable } from "../_components/group-figures";

// Every like-for-like group of one pack: the full table behind the pack page's figures, which shows the groups with
// the most results (lib/bounded-lists.ts PACK_PAGE_MAX_GROUPS). Same data and revalidation as the pack page.
export const revalidate = 3600;
export async function generateStaticParams() {
  return [];
}

const params = z.object({ slug: z.string().regex(/^[a-z0-9-]{1,120}$/) });
type Props = { params: Promise<{ slug: string }> };

export async function generateMetadata(props: Props): Promise<Metadata> {
  const parsed = params.safeParse(await props.params);
  const detail = parsed.success ? await cachedPackDetail(parsed.data.slug) : null;
  return detail ? { title: `${packTitle(detail.pack)}: every like-for-like group` } : {};
}

export default async function PackGroupsPage(props: Props) {
  const parsed = params.safeParse(await props.params);
  if (!parsed.success) notFound();
  const detail = await cachedPackDetail(parsed.data.slug);
  if (!detail) notFound();
  const { pack, groups } = detail;
  return (
    <article className="space-y-6">
      <header className="space-y-1">
        <p className="text-sm">
          <a href={`/packs/${pack.slug}`}>← {packTitle(pack)}</a>
        </p>
        <h1>Label vs measured, every like-for-like group</h1>
      </header>
      <StaticIsland id="pack-groups">
        <GroupFiguresTable
          groups={groups}
          labelledC={pack.labelledContinuousC}
          ratedMah={pack.ratedCapacityMah}
          cells={pack.cellsInSeries}
        />
      </StaticIsland>
    </article>
  );
}
