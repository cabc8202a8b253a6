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
      group: first.key,
      title: "Labelled C against measured C",
      note: "Each dot is a pack: the median sag-limited C of its approved results against the C printed on its label. Dots under the dashed line measured below their label.",
    },
    {
      id: "demo-maker-ranking",
      kind: "maker-ranking" as const,
      group: first.key,
      title: "How close makers come to their labels",
      note: "Median label ratio of each maker's packs in one like-for-like group.",
    },
    {
      id: "demo-curves",
      kind: "curves" as const,
      group: (second ?? first).key,
      title: "Discharge curves in one like-for-like group",
      note: "Voltage per cell under load against capacity delivered.",
    },
    {
      id: "demo-saved-not-featured",
      kind: "label-check" as const,
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
          state: { v: 1, kind: c.kind, group: c.group, title: c.title, note: c.note },
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
