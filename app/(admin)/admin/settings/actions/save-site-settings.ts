"use server";
import { revalidatePath } from "next/cache";
import { saveSiteSettings as saveSiteSettingsRow } from "@/db/mutations/site-settings";
import { authedAction } from "@/server/authed-action";
import { cacheTags } from "@/server/cache-tags";
import { revalidateTags } from "@/server/revalidate";
import { siteSettingsSchema } from "@/lib/validations/site-settings";

/** Admins set the site notice and pause or reopen submissions; audited; every page shows the change at once. */
export const saveSiteSettings = authedAction("settings.edit", siteSettingsSchema, async (input, user) => {
  const saved = await saveSiteSettingsRow(user.id, input);
  revalidateTags([cacheTags.settings]);
  revalidatePath("/admin/settings");
  return saved;
});
