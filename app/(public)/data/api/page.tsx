import type { Metadata } from "next";
import { DEFAULT_PAGE_SIZE, MAX_PAGE_SIZE } from "@/lib/api-contract/params";
import { ROUTES } from "@/lib/api-contract/routes";
import { describeField, type Field } from "@/lib/open-data/field-kit";
import { makerFields, packFields } from "@/lib/open-data/fields";
import { ATTRIBUTION_TEXT, DATA_LICENCE_LABEL, DATA_LICENCE_SPDX, DATA_LICENCE_URL } from "@/lib/open-data/licence";
import { resultFields } from "@/lib/open-data/result-fields";
import { env } from "@/server/env";

// This guide reads nothing from the database (routes and fields come from lib/api-contract and lib/open-data, the
// same table the OpenAPI document is generated from), so no moderation decision can make it stale; the hour only
// picks up a changed APP_URL.
export const revalidate = 3600;
export const metadata: Metadata = {
  title: "API guide",
  description: "Sagline's public read API: endpoints, filters, paging, caching, rate limits and fields with units.",
};

function FieldTable<R>({ fields, label }: { fields: Field<R>[]; label: string }) {
  return (
    <div className="overflow-x-auto" tabIndex={0} role="region" aria-label={label}>
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
              <td>{describeField(f)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

export default function ApiGuidePage() {
  const base = env().APP_URL;
  return (
    <article className="prose-sagline max-w-4xl">
      <h1>API guide</h1>
      <p>
        JSON over HTTPS, no key needed. Every JSON answer carries <code>meta.licence</code>: the data is{" "}
        <a href={DATA_LICENCE_URL} rel="license">
          {DATA_LICENCE_LABEL}
        </a>{" "}
        (SPDX <code>{DATA_LICENCE_SPDX}</code>) — {ATTRIBUTION_TEXT} The machine-readable description is the{" "}
        <a href="/api/v1/openapi.json">OpenAPI document</a>, generated from the same schemas the server checks its
        answers against.
      </p>
      <p>
        The API is SI, always: temperatures in °C, weights in g, voltages and resistances as each field names them (per
        cell or per pack), whatever units a reader chose on the site. Only the CSV downloads take the reader&apos;s
        units, with <code>units=F,oz,pack</code> (any of them), and then name each converted column by its unit (
        <code>ambientTemperatureF</code>, <code>weightOz</code>, <code>holdVoltagePackV</code>).
      </p>
      <h2>Endpoints</h2>
      <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="API endpoints">
        <table className="w-full min-w-[32rem]" data-testid="api-endpoints">
          <thead>
            <tr>
              <th>Method and path</th>
              <th>What</th>
              <th>Query parameters</th>
            </tr>
          </thead>
          <tbody>
            {ROUTES.map((r) => (
              <tr key={`${r.method} ${r.path}`}>
                <td>
                  <code>
                    {r.method.toUpperCase()} {r.path}
                  </code>
                </td>
                <td>{r.summary}</td>
                <td>{Object.keys(r.query?.shape ?? {}).join(", ") || "—"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <h2>Lists, paging, caching and limits</h2>
      <ul>
        <li>
          Every list answers <code>{"{ data, meta, links }"}</code>: <code>meta</code> holds <code>page</code>,{" "}
          <code>size</code>, <code>total</code> and <code>pageCount</code> (and the licence); <code>links</code> holds{" "}
          <code>self</code>, <code>first</code>, <code>last</code>, <code>next</code> and <code>prev</code> (null past
          either end). One item answers <code>{"{ data, meta, links }"}</code> too.
        </li>
        <li>
          <code>page</code> (from 1) and <code>size</code> (1 to {MAX_PAGE_SIZE}, default {DEFAULT_PAGE_SIZE}) on every
          list; a page past the last answers <code>422</code>. The packs list adds <code>sort</code> and{" "}
          <code>dir</code>. The <code>X-Total-Count</code> header repeats <code>meta.total</code>.
        </li>
        <li>
          Filters are those of the packs table, with the same names and meanings everywhere: <code>maker</code>,{" "}
          <code>cells</code>, <code>connector</code>, <code>minMah</code>/<code>maxMah</code> (rated capacity),{" "}
          <code>minC</code>/<code>maxC</code> (labelled C), <code>minG</code>/<code>maxG</code> (weight) and{" "}
          <code>q</code>, a fuzzy search over maker and model (every word must match, a typo or two is forgiven).
          Results and downloads add <code>pack</code> and <code>group</code>. A bad value answers <code>422</code> with{" "}
          <code>error.fieldErrors</code>; a like-for-like group with no published results answers <code>404</code>, in a
          filter and in <code>/api/v1/groups/&#123;key&#125;</code> alike.
        </li>
        <li>
          Figures are rounded to the decimal places each field states below (the same the CSV files and the Data Package
          carry).
        </li>
        <li>
          Answers and downloads carry an <code>ETag</code>; send it back in <code>If-None-Match</code> and an unchanged
          answer is a bodiless <code>304</code>. They may be cached for a minute.
        </li>
        <li>
          A published result&apos;s raw log is at <code>/api/v1/results/&#123;id&#125;/log</code>, under the same
          licence; its ETag is the file&apos;s SHA-256.
        </li>
        <li>
          Chart images (<code>/charts/image/…/chart.svg</code> or <code>chart.png</code>) take <code>width</code>{" "}
          (320–1600 CSS pixels, default 800), <code>height</code> (default 5/8 of the width, at least 400) and, for PNG,{" "}
          <code>scale</code> (1, 2 or 3 device pixels per CSS pixel, default 2); a malformed or out-of-range value
          answers <code>400</code> saying what is allowed.
        </li>
        <li>CORS is open for GET, so a browser page on any site can read the API.</li>
        <li>
          600 requests a minute per client; beyond that, <code>429</code> with <code>Retry-After</code> in seconds.
        </li>
        <li>
          Only published results are served: approved by a moderator, with their pack and maker in the catalogue (a
          result with an open reader case still counts). Figures are medians only where the name says so; units are in
          the field names.
        </li>
      </ul>
      <h2 id="analyse">Checking a log: POST /api/v1/analyse</h2>
      <p>
        Send a log as the raw body (<code>text/csv</code>) or as a multipart field <code>file</code>, and get the
        figures Sagline computes from it — every discharge, both ratings with their assumptions, the warnings in words
        and as codes — as the command-line tool prints them. Nothing is stored. Query parameters, all optional:{" "}
        <code>cells</code>, <code>ratedMah</code>, <code>labelledC</code>, <code>weightG</code> (the pack&apos;s label
        figures that some figures need), <code>include=curve</code> (add the chart curve), and <code>mapping</code>: the
        column mapping as JSON for a log whose columns cannot be named from its header — columns by number from 0 (or by
        header name), <code>timeUnit</code>, <code>voltageUnit</code>, <code>currentUnit</code>,{" "}
        <code>temperatureUnit</code>, <code>cellVoltages</code>, <code>hasHeader</code> and <code>dischargeSign</code>.
        Bad JSON, an unusable mapping or columns the log does not have answer <code>422</code> with the reason in{" "}
        <code>error.fieldErrors.mapping</code>. 30 logs a minute per IP address.
      </p>
      <pre tabIndex={0} className="overflow-x-auto rounded bg-paper-sunk p-3 text-sm dark:bg-night-sunk">
        <code>{`curl -s -X POST -H 'Content-Type: text/csv' --data-binary @log.csv \\
  '${base}/api/v1/analyse?cells=4&ratedMah=1300' \\
  --url-query 'mapping={"time":1,"voltage":9,"current":8,"hasHeader":false}'`}</code>
      </pre>
      <h2>Example</h2>
      <pre tabIndex={0} className="overflow-x-auto rounded bg-paper-sunk p-3 text-sm dark:bg-night-sunk">
        <code>{`curl -s '${base}/api/v1/packs?cells=4&size=10'\ncurl -s '${base}/api/v1/results?pack=SLUG'\ncurl -sO '${base}/data/download/results.csv'`}</code>
      </pre>
      <h2>Fields</h2>
      <h3>Maker</h3>
      <FieldTable fields={makerFields} label="Maker fields" />
      <h3>Pack</h3>
      <FieldTable fields={packFields} label="Pack fields" />
      <h3>Result (method card and figures)</h3>
      <FieldTable fields={resultFields} label="Result fields" />
    </article>
  );
}
