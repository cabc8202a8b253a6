"use server";
// Stop new-result e-mails about a pack — shared by the pack page's toggle and the account page's list.
import { revalidatePath } from "next/cache";
import { stopPackEmails as stopPackEmailsRow } from "@/db/mutations/pack-emails";
import { authedAction } from "@/server/authed-action";
import { packEmailsSchema } from "@/lib/validations/pack-emails";

export const stopPackEmails = authedAction("pack-emails.manage", packEmailsSchema, async ({ packId }, user) => {
  await stopPackEmailsRow(user.id, packId);
  revalidatePath("/account");
  return { packId, emails: false };
});
