// GET /fragments/label-check/{group} — the home page's label check (the sag-limited C estimate) and maker list
// for one like-for-like group, as an HTML fragment the group switcher swaps in; ./[rating] serves either
// rating. Static per group (tagged cached reads underneath).
import { withPermission } from "@/server/route";
import { labelCheckFragment } from "./fragment";

export const revalidate = 3600;
export const dynamic = "force-static";
export async function generateStaticParams(): Promise<{ group: string }[]> {
  return [];
}

export const GET = withPermission<{ params: Promise<{ group: string }> }>("public", async (_req, ctx) =>
  labelCheckFragment({ ...(await ctx.params), rating: "estimate" }),
);
