// Watching a pack (an e-mail when a new result on it is published).
import { z } from "zod";

export const watchPackSchema = z.object({
  packId: z.coerce.number({ error: "Not a pack id." }).int().positive().max(2_147_483_647),
});
