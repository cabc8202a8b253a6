"use server";
import { revalidatePath } from "next/cache";
import { retryMail as retryMailRow } from "@/db/mutations/mail-outbox";
import { authedAction } from "@/server/authed-action";
import { retryMailSchema } from "@/lib/validations/mail";

/** Admins send an unsent message again: attempts start over, the worker is woken; audited. */
export const retryMail = authedAction("mail.retry", retryMailSchema, async ({ mailId }, user) => {
  const out = await retryMailRow(user.id, mailId);
  revalidatePath("/admin/mail");
  return out;
});
