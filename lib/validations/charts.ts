// A moderator's decision on a saved chart: feature it on /charts or take it off.
import { z } from "zod";

const savedChartId = z.string({ error: "No chart given." }).regex(/^[a-z0-9-]{1,64}$/, "Not a chart id.");

export const featureChartSchema = z.object({
  chartId: savedChartId,
  featured: z.enum(["1", "0"], { error: "Say whether to feature it." }).transform((v) => v === "1"),
});
