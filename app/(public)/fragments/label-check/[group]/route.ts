// GET /fragments/label-check/{group} — the home page's label check and maker ranking for one like-for-like
// group, as an HTML fragment the group switcher swaps in. Static per group (tagged cached reads underneath).
import { z } from "zod";
import { AppError } from "@/lib/errors";
import { withPermission } from "@/server/route";
import { cachedGroups } from "@/server/public-data";
import { homeLabelCheckMarkup } from "../../../_components/home-label-check";

export const revalidate = 3600;
export const dynamic = "force-static";
export async function generateStaticParams(): Promise<{ group: string }[]> {
  return [];
}

const params = z.object({ group: z.string().regex(/^[a-z0-9._-]{1,160}$/) });

export const GET = withPermission<{ params: Promise<{ group: string }> }>("public", async (_req, ctx) => {
  const p = params.safeParse(await ctx.params);
  const group = p.success ? (await cachedGroups()).find((g) => g.key === p.data.group) : undefined;
  if (!group) throw new AppError("not_found", "No such like-for-like group.");
  return new Response(await homeLabelCheckMarkup(group), {
    headers: {
      "Content-Type": "text/html; charset=utf-8",
      "Cache-Control": "public, max-age=300, s-maxage=3600, stale-while-revalidate=86400",
    },
  });
});
