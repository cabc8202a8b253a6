// Seeded randomness (the generator's mulberry32) so the demo scenario is the same on every machine.
import { seededRandom } from "@/lib/synthetic/equivalent-circuit";

export function createRandom(seed: number) {
  const next = seededRandom(seed);
  return {
    next,
    between: (lo: number, hi: number) => lo + (hi - lo) * next(),
    int: (lo: number, hi: number) => Math.floor(lo + (hi - lo + 1) * next()),
    pick: <T>(items: readonly T[]): T => {
      const item = items[Math.floor(next() * items.length)];
      if (item === undefined) throw new Error("pick from an empty list");
      return item;
    },
    normal: (mean: number, sd: number) => {
      const u = Math.max(next(), 1e-12);
      const v = next();
      return mean + sd * Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
    },
  };
}
export type Random = ReturnType<typeof createRandom>;
