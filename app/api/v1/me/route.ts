// GET /api/v1/me — who is signed in (for the header's account menu); null when nobody is.
import { withPermission } from "@/lib/route";
import { publicName } from "@/lib/user-name";

export const dynamic = "force-dynamic";

export const GET = withPermission("public", async (_req, _ctx, user) =>
  Response.json(
    { user: user ? { name: publicName(user), role: user.role } : null },
    { headers: { "Cache-Control": "private, no-store" } },
  ),
);
