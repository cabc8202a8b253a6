"use server";
// "E-mail me new results for this pack" — shared by the pack page's toggle.
import { revalidatePath } from "next/cache";
import { startPackEmails as startPackEmailsRow } from "@/db/mutations/pack-emails";
import { authedAction } from "@/server/authed-action";
import { packEmailsSchema } from "@/lib/validations/pack-emails";

export const startPackEmails = authedAction("pack-emails.manage", packEmailsSchema, async ({ packId }, user) => {
  await startPackEmailsRow(user.id, packId);
  revalidatePath("/account");
  return { packId, emails: true };
});
