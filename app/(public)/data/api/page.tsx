import type { Metadata } from "next";
import { env } from "@/server/env";
import { makerFields, packFields, resultFields, type Field } from "@/lib/open-data/fields";
import { ATTRIBUTION_TEXT, DATA_LICENCE_SHORT, DATA_LICENCE_URL } from "@/lib/open-data/licence";
import { openApiDocument } from "@/lib/open-data/openapi";

// This guide reads nothing from the database (endpoints and fields come from lib/open-data in code), so no
// moderation decision can make it stale and no tag is needed; the hour only picks up a changed APP_URL.
export const revalidate = 3600;
export const metadata: Metadata = {
  title: "API guide",
  description: "Sagline's public read API: endpoints, filters, paging, caching, rate limits and fields with units.",
};

function FieldTable<R>({ fields }: { fields: Field<R>[] }) {
  return (
    <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="API endpoints">
      <table className="w-full min-w-[32rem]">
        <thead>
          <tr>
            <th>Field</th>
            <th>Type</th>
            <th>Meaning and unit</th>
          </tr>
        </thead>
        <tbody>
          {fields.map((f) => (
            <tr key={f.name}>
              <td>
                <code>{f.name}</code>
              </td>
              <td>{f.type}</td>
              <td>{f.description}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

export default function ApiGuidePage() {
  const base = env().APP_URL;
  const doc = openApiDocument(base);
  return (
    <article className="prose-sagline max-w-4xl">
      <h1>API guide</h1>
      <p>
        Read-only JSON over HTTPS, no key needed. Every response carries <code>meta.licence</code>: the data is{" "}
        <a href={DATA_LICENCE_URL} rel="license">
          {DATA_LICENCE_SHORT}
        </a>{" "}
        — {ATTRIBUTION_TEXT} The machine-readable description is the <a href="/api/v1/openapi.json">OpenAPI document</a>
        .
      </p>
      <p>
        The API is SI, always: temperatures in °C, weights in g, voltages and resistances as each field names them (per
        cell or per pack), whatever units a reader chose on the site. Only the CSV downloads take the reader&apos;s
        units, with <code>units=F,oz,pack</code> (any of them), and then name each converted column by its unit (
        <code>ambientTemperatureF</code>, <code>weightOz</code>, <code>holdVoltagePackV</code>).
      </p>
      <h2>Endpoints</h2>
      <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="API endpoints">
        <table className="w-full min-w-[32rem]">
          <thead>
            <tr>
              <th>GET</th>
              <th>What</th>
              <th>Parameters</th>
            </tr>
          </thead>
          <tbody>
            {Object.entries(doc.paths).map(([path, op]) => (
              <tr key={path}>
                <td>
                  <code>{path}</code>
                </td>
                <td>{op.get.summary}</td>
                <td>
                  {op.get.parameters
                    .filter((p) => p.in === "query")
                    .map((p) => p.name)
                    .join(", ") || "—"}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <h2>Paging, caching and limits</h2>
      <ul>
        <li>
          <code>page</code> (from 1) and <code>size</code> (up to 200, default 50; the packs list takes 10, 25, 50 or
          100 and adds <code>sort</code> and <code>dir</code>); <code>total</code>, <code>links.next</code> and the{" "}
          <code>X-Total-Count</code> header tell you how far to go.
        </li>
        <li>
          Filters are those of the packs table: <code>maker</code>, <code>cells</code>, <code>connector</code>,{" "}
          <code>minMah</code>/<code>maxMah</code> (rated capacity), <code>minC</code>/<code>maxC</code> (labelled C),{" "}
          <code>minG</code>/<code>maxG</code> (weight), <code>q</code>; results add <code>pack</code> and{" "}
          <code>group</code>. A bad value answers <code>422</code> with <code>error.fieldErrors</code>.
        </li>
        <li>
          Responses carry an <code>ETag</code>; send it back in <code>If-None-Match</code> and an unchanged answer is a
          bodiless <code>304</code>. They may be cached for a minute.
        </li>
        <li>
          Chart images (<code>/charts/image/…/chart.svg</code> or <code>chart.png</code>) take <code>width</code>{" "}
          (320–1600 CSS pixels, default 800), <code>height</code> (default 5/8 of the width, at least 400) and, for PNG,{" "}
          <code>scale</code> (1, 2 or 3 device pixels per CSS pixel, default 2); a malformed or out-of-range value
          answers <code>400</code> saying what is allowed.
        </li>
        <li>CORS is open for GET, so a browser page on any site can read the API.</li>
        <li>
          600 requests a minute per IP address; beyond that, <code>429</code> with <code>Retry-After</code> in seconds.
        </li>
        <li>
          Only approved results are served. Figures are medians only where the name says so; units are in the field
          names.
        </li>
      </ul>
      <h2>Example</h2>
      <pre tabIndex={0} className="overflow-x-auto rounded bg-paper-sunk p-3 text-sm dark:bg-night-sunk">
        <code>{`curl -s '${base}/api/v1/packs?cells=4&size=10'\ncurl -s '${base}/api/v1/results?pack=SLUG'`}</code>
      </pre>
      <h2>Fields</h2>
      <h3>Maker</h3>
      <FieldTable fields={makerFields} />
      <h3>Pack</h3>
      <FieldTable fields={packFields} />
      <h3>Result (method card and figures)</h3>
      <FieldTable fields={resultFields} />
    </article>
  );
}
