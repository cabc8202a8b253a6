// The account profile: how the contributor's published results name them. An explicit choice — a display
// name, or "anonymous" — never inferred from an empty field.
import { z } from "zod";

const publicNameChoices = ["name", "anonymous"] as const;

export const profileSchema = z
  .object({
    displayName: z
      .string()
      .trim()
      .max(60, "A display name can be at most 60 characters.")
      .refine((v) => v === "" || v.length >= 2, "A display name needs at least 2 characters.")
      .refine((v) => !v.includes("@"), "Please don't use an e-mail address as your display name.")
      .refine((v) => !/[\u0000-\u001f<>]/.test(v), "Letters, digits, spaces and ordinary punctuation only.")
      .transform((v) => (v === "" ? null : v)),
    publicName: z.enum(publicNameChoices, { error: "Choose how your published results name you." }),
  })
  .superRefine((v, ctx) => {
    if (v.publicName === "name" && v.displayName === null) {
      ctx.addIssue({
        code: "custom",
        path: ["displayName"],
        message: "Enter the name to show, or choose to stay anonymous.",
      });
    }
  })
  .transform((v) => ({ displayName: v.displayName, anonymous: v.publicName === "anonymous" }));
export type ProfileInput = z.output<typeof profileSchema>;
