// Demo results: synthetic logs from the equivalent-circuit generator, analysed by lib/analysis.
// (Filled in once the measurement core lands.)
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import type * as schema from "@/db/schema";
import type { DemoPack } from "./scenario";

export async function seedResults(_db: NodePgDatabase<typeof schema>, _packs: DemoPack[], _log: (s: string) => void): Promise<number> {
  return 0;
}
