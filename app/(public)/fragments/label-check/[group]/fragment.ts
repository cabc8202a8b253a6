// The label check fragment of one group and rating (the routes beside this file): params checked with zod,
// an unknown group or rating is a 404.
import { z } from "zod";
import { AppError } from "@/lib/errors";
import { CHART_RATINGS } from "@/lib/open-data/chart-state";
import { cachedGroups } from "@/server/public-data";
import { homeLabelCheckMarkup } from "../../../_components/home-label-check";

const params = z.object({ group: z.string().regex(/^[a-z0-9._-]{1,160}$/), rating: z.enum(CHART_RATINGS) });

export async function labelCheckFragment(raw: { group: string; rating: string }): Promise<Response> {
  const p = params.safeParse(raw);
  const group = p.success ? (await cachedGroups()).find((g) => g.key === p.data.group) : undefined;
  if (!p.success || !group) throw new AppError("not_found", "No such like-for-like group or rating.");
  return new Response(await homeLabelCheckMarkup(group, p.data.rating), {
    headers: {
      "Content-Type": "text/html; charset=utf-8",
      "Cache-Control": "public, max-age=300, s-maxage=3600, stale-while-revalidate=86400",
    },
  });
}
