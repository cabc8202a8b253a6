"use server";
// Edit a pack's label figures (cells, rated mAh, labelled C, weight, connector); recorded in the audit log.
import { updatePackLabel } from "@/server/catalogue-admin";
import { authedAction } from "@/server/authed-action";
import { packLabelSchema } from "@/lib/validations/catalogue-admin";

export const editPackLabel = authedAction("catalogue.edit", packLabelSchema, (input, user) =>
  updatePackLabel(user.id, input),
);
