// GET /api/v1/me — who is signed in (for the header's account menu); null when nobody is.
// `?watching=<packId>` also says whether the signed-in person watches that pack (the pack page's Watch
// button: pack pages are static and never read cookies, so they ask here).
import { isWatching } from "@/db/queries/watches";
import { AppError } from "@/lib/errors";
import { withPermission } from "@/server/route";
import { publicName } from "@/lib/user-name";
import { watchPackSchema } from "@/lib/validations/watch";

export const dynamic = "force-dynamic";

export const GET = withPermission("public", async (req, _ctx, user) => {
  const raw = new URL(req.url).searchParams.get("watching");
  let watching: boolean | undefined;
  if (raw !== null) {
    const parsed = watchPackSchema.safeParse({ packId: raw });
    if (!parsed.success)
      throw new AppError("validation", "watching must be a pack id (a positive whole number).", {
        watching: ["Not a pack id."],
      });
    if (user) watching = await isWatching(user.id, parsed.data.packId);
  }
  return Response.json(
    {
      user: user ? { name: publicName(user), role: user.role } : null,
      ...(watching === undefined ? {} : { watching }),
    },
    { headers: { "Cache-Control": "private, no-store" } },
  );
});
