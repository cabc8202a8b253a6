// /packs with table parameters in its URL (filters, search, sort, page), rewritten here by next.config.mjs: the
// first HTML is already the page those parameters ask for. Readers never see this path.
import type { Metadata } from "next";
import { PacksView, urlParams, type SearchParams } from "../packs/_components/packs-view";

export const metadata: Metadata = {
  title: "Packs",
  description:
    "Every pack in the catalogue: filter by cells, capacity, labelled C, weight, connector, maker and like-for-like group.",
  alternates: { canonical: "/packs" },
  robots: { index: false },
};

export default async function PacksQueryPage({ searchParams }: { searchParams: Promise<SearchParams> }) {
  return <PacksView sp={urlParams(await searchParams)} />;
}
