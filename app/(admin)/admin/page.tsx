import { redirect } from "next/navigation";
import { requirePageUser } from "@/lib/page-auth";

export const dynamic = "force-dynamic";

// The admin area starts with users (catalogue and settings pages join it later).
export default async function AdminHome() {
  await requirePageUser("user.set-role", "/admin");
  redirect("/admin/users");
}
