// A few saved charts for the demo scenario, on the groups with the most approved results: three featured by a
// moderator (listed on /charts) and one a contributor saved that nobody has featured yet (/review/charts).
// Idempotent: charts are keyed by a fixed id.
import { desc, eq, sql } from "drizzle-orm";
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import * as schema from "@/db/schema";

export async function seedCharts(db: NodePgDatabase<typeof schema>): Promise<number> {
  const groups = await db
    .select({ key: schema.results.groupKey, n: sql<number>`count(*)::int` })
    .from(schema.results)
    .where(eq(schema.results.status, "approved"))
    .groupBy(schema.results.groupKey)
    .orderBy(desc(sql`count(*)`), schema.results.groupKey)
    .limit(2);
  const [first, second] = groups;
  if (!first) return 0;
  const charts = [
    {
      id: "demo-label-check",
      kind: "label-check" as const,
      rating: "estimate" as const,
      group: first.key,
      title: "Labelled C against sag-limited C (an estimate)",
      note: "Each dot is a pack: the median sag-limited C estimate of its approved results (from resistance, 3.7 V nominal to a 3.3 V floor per cell) against the C printed on its label.",
    },
    {
      id: "demo-maker-ranking",
      kind: "maker-ranking" as const,
      rating: "estimate" as const,
      group: first.key,
      title: "How close makers come to their labels",
      note: "Median label ratio (sag-limited C estimate ÷ labelled C) of each maker's packs in one like-for-like group.",
    },
    {
      id: "demo-curves",
      kind: "curves" as const,
      rating: undefined,
      group: (second ?? first).key,
      title: "Discharge curves in one like-for-like group",
      note: "Voltage per cell under load against capacity delivered.",
    },
    {
      id: "demo-saved-not-featured",
      kind: "label-check" as const,
      rating: "measured" as const,
      group: (second ?? first).key,
      title: "My packs against their labels",
      note: "Saved by a contributor; a moderator has not featured it.",
    },
  ];
  const [moderator] = await db
    .select({ id: schema.users.id })
    .from(schema.users)
    .where(eq(schema.users.role, "moderator"))
    .orderBy(schema.users.email)
    .limit(1);
  const [contributor] = await db
    .select({ id: schema.users.id })
    .from(schema.users)
    .where(eq(schema.users.role, "contributor"))
    .orderBy(schema.users.email)
    .limit(1);
  await db
    .insert(schema.savedCharts)
    .values(
      charts.map((c, i) => {
        const createdAt = new Date(Date.UTC(2026, 10, 20 + i));
        const featured = c.id !== "demo-saved-not-featured";
        return {
          id: c.id,
          kind: c.kind,
          title: c.title,
          note: c.note,
          state: { v: 1, kind: c.kind, group: c.group, rating: c.rating, title: c.title, note: c.note },
          createdAt,
          createdById: featured ? (moderator?.id ?? null) : (contributor?.id ?? null),
          featuredAt: featured ? createdAt : null,
          featuredById: featured ? (moderator?.id ?? null) : null,
        };
      }),
    )
    .onConflictDoNothing();
  return charts.length;
}
