import type { Metadata } from "next";
import { emptyBenchProfile } from "@/lib/validations/bench-profile";
import { requirePageUser } from "@/server/page-auth";
import { BenchProfileForm } from "../_components/bench-profile-form-client";

export const metadata: Metadata = { title: "New bench profile" };
export const dynamic = "force-dynamic";

export default async function NewBenchProfilePage() {
  await requirePageUser("bench-profile.manage", "/account/bench-profiles/new");
  return (
    <div className="space-y-6">
      <h1>New bench profile</h1>
      <BenchProfileForm id={null} initial={emptyBenchProfile} />
    </div>
  );
}
