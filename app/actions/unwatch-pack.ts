"use server";
// Shared by the WatchButton and the account page's watch list.
import { revalidatePath } from "next/cache";
import { unwatchPack as unwatchPackRow } from "@/db/mutations/watches";
import { authedAction } from "@/server/authed-action";
import { watchPackSchema } from "@/lib/validations/watch";

export const unwatchPack = authedAction("watch.manage", watchPackSchema, async ({ packId }, user) => {
  await unwatchPackRow(user.id, packId);
  revalidatePath("/account");
  return { packId, watching: false };
});
