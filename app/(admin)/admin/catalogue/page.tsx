import type { Metadata } from "next";
import { listCatalogueMakers, listCataloguePacks } from "@/db/queries/catalogue-admin";
import { fmt, labelSpec } from "@/lib/format";
import { requirePageUser } from "@/server/page-auth";
import { MergeForm } from "./_components/merge-form-client";
import { PackLabelForm } from "./_components/pack-label-form-client";

export const metadata: Metadata = { title: "Catalogue" };
export const dynamic = "force-dynamic";

export default async function AdminCataloguePage() {
  await requirePageUser("catalogue.edit", "/admin/catalogue");
  const [makers, packs] = await Promise.all([listCatalogueMakers(), listCataloguePacks()]);
  return (
    <div className="space-y-8">
      <div className="space-y-1">
        <h1>Catalogue</h1>
        <p className="muted max-w-3xl">
          Correct a pack’s label figures, or merge duplicate makers and packs. A merge moves every result with it and
          keeps the duplicate as a pointer, so old links still work; each change is recorded in the audit log.
        </p>
      </div>
      <section className="card space-y-3" aria-labelledby="merge-makers-h">
        <h2 id="merge-makers-h">Merge makers</h2>
        <MergeForm
          kind="makers"
          options={makers.map((m) => ({
            id: m.id,
            label: `${m.name}${m.status === "proposed" ? " (proposed)" : ""} · ${m.packs} packs`,
          }))}
        />
      </section>
      <section className="card space-y-3" aria-labelledby="merge-packs-h">
        <h2 id="merge-packs-h">Merge packs</h2>
        <MergeForm
          kind="packs"
          options={packs.map((p) => ({
            id: p.id,
            label: `${p.makerName} ${p.model}${p.status === "proposed" ? " (proposed)" : ""} · ${p.results} results`,
          }))}
        />
      </section>
      <section className="space-y-3" aria-labelledby="labels-h">
        <h2 id="labels-h">Pack labels</h2>
        <ul className="divide-y divide-ink/10 rounded-lg border border-ink/10 bg-paper-raised dark:divide-night-line dark:border-night-line dark:bg-night-raised">
          {packs.map((p) => (
            <li key={p.id}>
              <details className="group px-4 py-3">
                <summary className="flex cursor-pointer flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
                  <span className="font-medium">
                    {p.makerName} {p.model}
                    {p.status === "proposed" ? <span className="muted text-sm font-normal"> · proposed</span> : null}
                  </span>
                  <span className="num muted text-sm">
                    {labelSpec(p)} · {fmt(p.weightG, 0, "g")} · {p.connector} · {p.results} results ·{" "}
                    <span className="font-sans text-cell-600 dark:text-cell-400">Edit</span>
                  </span>
                </summary>
                <div className="pt-3">
                  <PackLabelForm pack={p} />
                </div>
              </details>
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}
