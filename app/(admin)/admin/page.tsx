import { redirect } from "next/navigation";
import { requirePageUser } from "@/server/page-auth";

export const dynamic = "force-dynamic";

// The admin area starts with users; catalogue and site settings sit beside it in the admin navigation.
export default async function AdminHome() {
  await requirePageUser("user.set-role", "/admin");
  redirect("/admin/users");
}
