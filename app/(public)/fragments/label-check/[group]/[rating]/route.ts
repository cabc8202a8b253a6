// GET /fragments/label-check/{group}/{rating} — as ../route.ts, for the rating the home page's switch chose
// ("estimate": the sag-limited C estimate; "measured": the sustained C measured).
import { withPermission } from "@/server/route";
import { labelCheckFragment } from "../fragment";

export const revalidate = 3600;
export const dynamic = "force-static";
export async function generateStaticParams(): Promise<{ group: string; rating: string }[]> {
  return [];
}

export const GET = withPermission<{ params: Promise<{ group: string; rating: string }> }>("public", async (_req, ctx) =>
  labelCheckFragment(await ctx.params),
);
