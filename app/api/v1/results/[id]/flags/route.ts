// POST /api/v1/results/[id]/flags — a signed-in reader asks moderators to check a published result (reason +
// note). It opens a case and changes nothing else. Limited per account and per client address.
import { createHash } from "node:crypto";
import { z } from "zod";
import { fileReaderFlag } from "@/server/review";
import { AppError } from "@/lib/errors";
import { env } from "@/server/env";
import { clientAddress } from "@/server/client-address";
import { enforceRateLimit, limits } from "@/server/rate-limit";
import { withPermission } from "@/server/route";
import { recordId } from "@/lib/validations/ids";
import { readerFlagSchema } from "@/lib/validations/review";

export const dynamic = "force-dynamic";
const params = z.object({ id: recordId });

export const POST = withPermission<{ params: Promise<{ id: string }> }>("result.flag", async (req, ctx, user) => {
  if (!user) throw new AppError("unauthenticated", "Please sign in first.");
  const p = params.safeParse(await ctx.params);
  if (!p.success) throw new AppError("not_found", "That result does not exist.");
  const address = clientAddress(req.headers);
  await enforceRateLimit(`flag:user:${user.id}`, limits.flagPerUser);
  await enforceRateLimit(`flag:ip:${address}`, limits.flagPerIp);
  const body: unknown = await req.json().catch(() => {
    throw new AppError("bad_request", "Send the flag as JSON.");
  });
  const input = readerFlagSchema.parse(body);
  // The address is kept only as a salted hash, enough to spot one person flagging from many accounts.
  const reporterHash = createHash("sha256")
    .update(`${env().AUTH_SECRET ?? "sagline"}:${address}`)
    .digest("hex");
  const { flagId } = await fileReaderFlag(p.data.id, input, { userId: user.id, reporterHash });
  return Response.json({ flag: { id: flagId, resultId: p.data.id, status: "open" } }, { status: 201 });
});
