// GET /review/<id>/log — the result's raw log as uploaded, for moderators (streamed from storage).
import { z } from "zod";
import { AppError } from "@/lib/errors";
import { logResponse } from "@/server/evidence";
import { withPermission } from "@/server/route";

export const dynamic = "force-dynamic";
export const runtime = "nodejs";

const params = z.object({ id: z.coerce.number().int().positive().max(2_147_483_647) });

export const GET = withPermission("result.evidence", async (_req, ctx: { params: Promise<{ id: string }> }) => {
  const p = params.safeParse(await ctx.params);
  if (!p.success) throw new AppError("not_found", "There is no such result.");
  return logResponse(p.data.id);
});
