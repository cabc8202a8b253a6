// POST /api/v1/results/[id]/flags — any reader flags a published result (reason + note); rate-limited per IP.
import { createHash } from "node:crypto";
import { z } from "zod";
import { fileReaderFlag } from "@/server/review";
import { AppError } from "@/lib/errors";
import { env } from "@/server/env";
import { clientIp, enforceRateLimit, limits } from "@/server/rate-limit";
import { withPermission } from "@/server/route";
import { readerFlagSchema } from "@/lib/validations/review";

export const dynamic = "force-dynamic";
const params = z.object({ id: z.coerce.number().int().positive() });

export const POST = withPermission<{ params: Promise<{ id: string }> }>("public", async (req, ctx, user) => {
  const p = params.safeParse(await ctx.params);
  if (!p.success) throw new AppError("not_found", "That result does not exist.");
  const ip = clientIp(req.headers);
  await enforceRateLimit(`flag:ip:${ip}`, limits.flagPerIp);
  const body: unknown = await req.json().catch(() => {
    throw new AppError("bad_request", "Send the flag as JSON.");
  });
  const input = readerFlagSchema.parse(body);
  // The reporter's address is kept only as a salted hash, enough to spot one person flagging repeatedly.
  const reporterHash = createHash("sha256")
    .update(`${env().AUTH_SECRET ?? "sagline"}:${ip}`)
    .digest("hex");
  const { flagId } = await fileReaderFlag(p.data.id, input, { userId: user?.id ?? null, reporterHash });
  return Response.json({ flag: { id: flagId, resultId: p.data.id, status: "open" } }, { status: 201 });
});
