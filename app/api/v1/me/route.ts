// GET /api/v1/me — who is signed in (for the header's account menu); null when nobody is.
// `?packEmails=<packId>` also says whether the signed-in person is e-mailed new results of that pack (the
// pack page's toggle: pack pages are static and never read cookies, so they ask here).
import { getsPackEmails } from "@/db/queries/pack-emails";
import { AppError } from "@/lib/errors";
import { withPermission } from "@/server/route";
import { publicName } from "@/lib/user-name";
import { packEmailsSchema } from "@/lib/validations/pack-emails";

export const dynamic = "force-dynamic";

export const GET = withPermission("public", async (req, _ctx, user) => {
  const raw = new URL(req.url).searchParams.get("packEmails");
  let packEmails: boolean | undefined;
  if (raw !== null) {
    const parsed = packEmailsSchema.safeParse({ packId: raw });
    if (!parsed.success)
      throw new AppError("validation", "packEmails must be a pack id (a positive whole number).", {
        packEmails: ["Not a pack id."],
      });
    if (user) packEmails = await getsPackEmails(user.id, parsed.data.packId);
  }
  return Response.json(
    {
      user: user ? { name: publicName(user), role: user.role } : null,
      ...(packEmails === undefined ? {} : { packEmails }),
    },
    { headers: { "Cache-Control": "private, no-store" } },
  );
});
