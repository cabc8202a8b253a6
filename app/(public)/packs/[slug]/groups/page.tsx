import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { packDetailFor, type PackPageProps } from "../_components/pack-detail-for";
import { StaticIsland } from "@/components/static-island";
import { packTitle } from "@/lib/format";
import { GroupFiguresTable } from "../_components/group-figures";

// Every like-for-like group of one pack: the full table behind the pack page's figures, which shows the groups with
// the most results (lib/bounded-lists.ts PACK_PAGE_MAX_GROUPS). Same data and revalidation as the pack page.
export const revalidate = 3600;
export async function generateStaticParams() {
  return [];
}

export async function generateMetadata(props: PackPageProps): Promise<Metadata> {
  const detail = await packDetailFor(props);
  return detail ? { title: `${packTitle(detail.pack)}: every like-for-like group` } : {};
}

export default async function PackGroupsPage(props: PackPageProps) {
  const detail = await packDetailFor(props);
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
