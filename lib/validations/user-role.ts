// An admin changes someone's role.
import { z } from "zod";
import { userRoles } from "@/lib/enums";

export const setUserRoleSchema = z.object({
  userId: z.string().trim().min(1, "No user given.").max(100),
  role: z.enum(userRoles, { error: "Choose contributor, moderator or admin." }),
});

export const userListParams = z.object({
  page: z.coerce.number().int().min(1).max(10_000).catch(1),
});
