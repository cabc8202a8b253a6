"use server";
// Shared by every page that shows a WatchButton (app/(public)/packs/[slug]/_components/watch-button-client.tsx).
import { revalidatePath } from "next/cache";
import { watchPack as watchPackRow } from "@/db/mutations/watches";
import { authedAction } from "@/server/authed-action";
import { watchPackSchema } from "@/lib/validations/watch";

export const watchPack = authedAction("watch.manage", watchPackSchema, async ({ packId }, user) => {
  await watchPackRow(user.id, packId);
  revalidatePath("/account");
  return { packId, watching: true };
});
