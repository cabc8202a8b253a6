// New-result e-mails about a pack: which pack.
import { z } from "zod";

export const packEmailsSchema = z.object({
  packId: z.coerce.number({ error: "Not a pack id." }).int().positive().max(2_147_483_647),
});
