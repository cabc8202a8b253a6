// GET /results/<id>/photos/<n> — a result's label photo n (1-based): public once the result is published;
// before that only its contributor and moderators see it (everyone else gets 404).
import { z } from "zod";
import { AppError } from "@/lib/errors";
import { photoResponse } from "@/server/evidence";
import { withPermission } from "@/server/route";

export const dynamic = "force-dynamic";
export const runtime = "nodejs";

const params = z.object({
  id: z.coerce.number().int().positive().max(2_147_483_647),
  n: z.coerce.number().int().min(1).max(20),
});

export const GET = withPermission("public", async (_req, ctx: { params: Promise<{ id: string; n: string }> }, user) => {
  const p = params.safeParse(await ctx.params);
  if (!p.success) throw new AppError("not_found", "There is no such photo.");
  return photoResponse(p.data.id, p.data.n - 1, user);
});
