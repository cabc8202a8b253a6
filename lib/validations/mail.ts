// An admin's retry of a message in the mail outbox.
import { z } from "zod";

export const retryMailSchema = z.object({
  mailId: z.coerce.number({ error: "Not a message id." }).int().positive().max(2_147_483_647),
});
