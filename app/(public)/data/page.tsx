import type { Metadata } from "next";
import Link from "next/link";
import { env } from "@/server/env";
import { DATASETS, dataPackageDescriptor, README_FILE } from "@/lib/open-data/datapackage";
import {
  ATTRIBUTION,
  ATTRIBUTION_TEXT,
  DATA_LICENCE_LABEL,
  DATA_LICENCE_TITLE,
  DATA_LICENCE_URL,
  DATA_SCHEMA_VERSION,
  PUBLISHED_RULE,
} from "@/lib/open-data/licence";
import { makerRows } from "@/server/open-data/catalogue";
import { cachedGroups } from "@/server/public-data";
import { DownloadForm } from "./_components/download-form";

// Refreshed by tag (server/public-data.ts: `results`, `packs`) the moment a decision or a catalogue change lands;
// the hour is only a safety net, the same as PUBLIC_REVALIDATE_S (a segment option must be a literal).
export const revalidate = 3600;
export const metadata: Metadata = {
  title: "Open data and API",
  description: `Download every published Sagline result as CSV or JSON, with a Data Package descriptor and the raw logs, or read it through the API. ${DATA_LICENCE_LABEL}.`,
};

const descriptions = {
  makers: "Makers (brands on labels)",
  packs: "Packs as labelled",
  results: "Published results: method card and figures",
} as const;

export default async function DataPage() {
  const [makers, groups] = await Promise.all([makerRows(), cachedGroups()]);
  const base = env().APP_URL;
  const desc = dataPackageDescriptor(base, new Date());
  const jsonLd = {
    "@context": "https://schema.org",
    "@type": "Dataset",
    name: desc.title,
    description: desc.description,
    url: `${base}/data`,
    version: DATA_SCHEMA_VERSION,
    license: DATA_LICENCE_URL,
    isAccessibleForFree: true,
    creator: { "@type": "Organization", name: ATTRIBUTION, url: base },
    keywords: desc.keywords,
    creditText: ATTRIBUTION_TEXT,
    distribution: DATASETS.flatMap((d) => [
      {
        "@type": "DataDownload",
        encodingFormat: "text/csv",
        contentUrl: `${base}/data/download/${d}.csv`,
        name: `${d}.csv`,
      },
      {
        "@type": "DataDownload",
        encodingFormat: "application/json",
        contentUrl: `${base}/data/download/${d}.json`,
        name: `${d}.json`,
      },
    ]),
  };
  return (
    <div className="space-y-10">
      <script
        type="application/ld+json"
        dangerouslySetInnerHTML={{ __html: JSON.stringify(jsonLd).replace(/</g, "\\u003c") }}
      />
      <section className="space-y-3">
        <h1>Open data</h1>
        <p className="max-w-3xl">
          Every published result on Sagline — its method card, the figures computed from its log, and the log itself —
          is yours to download, reuse and republish.
        </p>
      </section>

      <section aria-labelledby="counting-heading" className="space-y-2">
        <h2 id="counting-heading">Which results count</h2>
        <p className="max-w-3xl" data-testid="counting-rule">
          {PUBLISHED_RULE}
        </p>
      </section>

      <section aria-labelledby="licence-heading" className="card space-y-2 border-charge-400">
        <h2 id="licence-heading">Licence and how to credit us</h2>
        <p>
          The data is published under{" "}
          <a href={DATA_LICENCE_URL} rel="license">
            {DATA_LICENCE_TITLE} ({DATA_LICENCE_LABEL})
          </a>
          . You may copy, adapt and publish it, commercially too, if you credit <strong>{ATTRIBUTION}</strong> and link
          the licence.
        </p>
        <p className="muted break-words text-sm">
          Suggested credit: <q>{ATTRIBUTION_TEXT}</q>
        </p>
      </section>

      <section aria-labelledby="downloads-heading" className="space-y-4">
        <h2 id="downloads-heading">Downloads</h2>
        <p className="muted">
          Schema version <span className="num">{DATA_SCHEMA_VERSION}</span> (semantic versioning: a new major version
          means a breaking change). Files are strict RFC 4180 CSV in UTF-8: a header row, then one record per line,
          nothing else, so any CSV reader (Python&apos;s <code>csv</code> module, spreadsheets, R) takes them as they
          are. Numbers are rounded to the decimal places each field states; free-text cells that could start a
          spreadsheet formula begin with a <code>&apos;</code>. File names carry the date of export and the schema
          version; every file has an ETag, so an unchanged file downloads as a bodiless 304. The licence, the credit and
          the counting rule are in the <a href={`/data/download/${README_FILE}`}>README ({README_FILE})</a> beside the
          files and in the Data Package descriptor.
        </p>
        <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Downloads">
          <table className="w-full min-w-[28rem] text-sm">
            <thead>
              <tr className="border-b border-ink/10 text-left">
                <th className="py-1 pr-3">Table</th>
                <th className="py-1 pr-3">CSV</th>
                <th className="py-1 pr-3">JSON</th>
                <th className="py-1">Fields</th>
              </tr>
            </thead>
            <tbody>
              {desc.resources.map((r) => (
                <tr key={r.name} className="border-b border-ink/10">
                  <td className="py-1 pr-3">{descriptions[r.name as keyof typeof descriptions]}</td>
                  <td className="py-1 pr-3">
                    <a href={`/data/download/${r.name}.csv`} download>
                      {r.name}.csv
                    </a>
                  </td>
                  <td className="py-1 pr-3">
                    <a href={`/data/download/${r.name}.json`} download>
                      {r.name}.json
                    </a>
                  </td>
                  <td className="num py-1">{r.schema.fields.length}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <p>
          The <a href="/data/datapackage.json">Data Package descriptor (datapackage.json)</a> describes the complete
          dump: a Table Schema for each file with types, units, constraints, primary and foreign keys.
        </p>
        <DownloadForm makers={makers} groups={groups} />
      </section>

      <section aria-labelledby="logs-heading" className="space-y-2">
        <h2 id="logs-heading">Raw logs</h2>
        <p className="max-w-3xl">
          The log behind every published result is downloadable as it was uploaded, under the same licence, at{" "}
          <code className="num">/api/v1/results/&#123;id&#125;/log</code> (its ETag is the file&apos;s SHA-256). Each
          result&apos;s page links its log and shows the command that recomputes its figures with Sagline&apos;s open
          command-line tool (<code>npm run analyse</code>), so anyone can check a figure from the raw data.
        </p>
      </section>

      <section aria-labelledby="api-heading" className="space-y-2">
        <h2 id="api-heading">API</h2>
        <p>
          The same data is served as JSON under <code className="num">/api/v1/</code>, with paging, the packs-table
          filters, ETags and open CORS for GET. Read the <Link href="/data/api">API guide</Link> or the{" "}
          <a href="/api/v1/openapi.json">OpenAPI document</a>.
        </p>
      </section>

      <section aria-labelledby="charts-heading" className="space-y-2">
        <h2 id="charts-heading">Charts</h2>
        <p>
          Journalists can <Link href="/charts/new">build a chart</Link> from one like-for-like group and embed it, or
          download it as PNG or SVG. See <Link href="/charts">published charts</Link>.
        </p>
      </section>
    </div>
  );
}
