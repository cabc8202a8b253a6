// The account profile: the name shown on published results, or anonymous.
import { z } from "zod";
import { checkbox } from "./form-fields";

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
    anonymous: checkbox,
  })
  .superRefine((v, ctx) => {
    if (!v.anonymous && v.displayName === null) {
      ctx.addIssue({
        code: "custom",
        path: ["displayName"],
        message: "Enter a display name, or choose to stay anonymous.",
      });
    }
  });
export type ProfileInput = z.output<typeof profileSchema>;
