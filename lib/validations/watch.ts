// Watching a pack (an e-mail when a new result on it is published).
import { z } from "zod";
import { recordIdSchema } from "./ids";

export const watchPackSchema = z.object({
  packId: recordIdSchema("Not a pack id."),
});
