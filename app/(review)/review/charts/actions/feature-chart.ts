"use server";
// Feature a saved chart on /charts, or take it off (moderators; audited).
import { authedAction } from "@/server/authed-action";
import { setChartFeatured } from "@/server/charts";
import { featureChartSchema } from "@/lib/validations/charts";

export const featureChart = authedAction("chart.feature", featureChartSchema, (input, user) =>
  setChartFeatured(user.id, input.chartId, input.featured),
);
