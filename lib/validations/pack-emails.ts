// New-result e-mails about a pack: which pack.
import { z } from "zod";
import { recordIdSchema } from "./ids";

export const packEmailsSchema = z.object({
  packId: recordIdSchema("Not a pack id."),
});
