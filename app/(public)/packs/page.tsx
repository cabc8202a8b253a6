import type { Metadata } from "next";
import { PacksView } from "./_components/packs-view";

export const metadata: Metadata = {
  title: "Packs",
  description:
    "Every pack in the catalogue: filter by cells, capacity, labelled C, weight, connector, maker and like-for-like group.",
};
// Static: /packs with no table parameter. With one (filters, search, sort, page), next.config.mjs rewrites the
// request to /packs-query, which renders that page per request — the URL stays /packs?….
export const revalidate = 3600;

export default function PacksPage() {
  return <PacksView sp={new URLSearchParams()} />;
}
