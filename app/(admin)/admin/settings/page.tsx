import type { Metadata } from "next";
import { getSiteSettings } from "@/db/queries/site-settings";
import { requirePageUser } from "@/server/page-auth";
import { SettingsForm } from "./_components/settings-form-client";

export const metadata: Metadata = { title: "Site settings" };
export const dynamic = "force-dynamic";

export default async function SiteSettingsPage() {
  await requirePageUser("settings.edit", "/admin/settings");
  const current = await getSiteSettings();
  return (
    <div className="space-y-4">
      <div className="space-y-1">
        <h1>Site settings</h1>
        <p className="muted max-w-3xl">
          A notice for everyone, and a pause on new submissions when review falls behind or something is being fixed.
          Every change is kept in the audit log.
          {current.updatedAt ? ` Last saved ${new Date(current.updatedAt).toUTCString().replace(" GMT", " UTC")}.` : ""}
        </p>
      </div>
      <SettingsForm current={current} />
    </div>
  );
}
