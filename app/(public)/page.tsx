import Link from "next/link";
import { listActivePacks } from "@/db/queries/packs";
import { labelSpec, packTitle } from "@/lib/format";

export const revalidate = 300;

export default async function HomePage() {
  const packs = await listActivePacks();
  return (
    <div className="space-y-8">
      <section className="space-y-3">
        <h1>What the label says, and what the bench measured</h1>
        <p className="muted max-w-3xl">
          Independent testers log discharges of lithium-polymer packs; Sagline computes the figures from their raw
          logs by published methods, moderators vet every result, and packs are compared only with results taken
          the same way.
        </p>
      </section>
      <section aria-labelledby="packs-heading" className="space-y-3">
        <h2 id="packs-heading">Packs in the catalogue</h2>
        <ul className="grid gap-2 sm:grid-cols-2 lg:grid-cols-3" data-testid="pack-list">
          {packs.map((p) => (
            <li key={p.id} className="card">
              <Link href={`/packs/${p.slug}`} className="font-medium">{packTitle(p)}</Link>
              <p className="muted num text-sm">{labelSpec(p)}</p>
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}
