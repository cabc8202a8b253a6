"use client";
// Drop a log, optionally give the pack's label figures, and see what the measurement core makes of it. The
// first rows are previewed in the browser: when the columns cannot be named (a log without a header row),
// the tester names them in the column picker and the mapping goes with the log as `mapping`.
import { useState } from "react";
import { ColumnMappingPicker } from "@/components/analysis/column-mapping-client";
import { LogPreview } from "@/components/analysis/log-preview";
import { previewFile } from "@/components/analysis/preview-file";
import { FileDrop } from "@/components/forms/file-drop";
import { UploadProgress } from "@/components/forms/upload-progress";
import { useXhrUpload } from "@/components/forms/use-xhr-upload";
import type { ColumnMapping, CurvePoint, LogTablePreview, PublicFigures } from "@/lib/analysis";
import { mappingJson, waitsForMapping } from "@/lib/column-mapping-form";

type Answer = PublicFigures & { curve: CurvePoint[] };
const FIELDS = [
  { name: "cells", label: "Cells in series (S)", step: "1", placeholder: "inferred" },
  { name: "ratedMah", label: "Rated capacity (mAh)", step: "1", placeholder: "e.g. 1300" },
  { name: "labelledC", label: "Labelled continuous C", step: "any", placeholder: "e.g. 75" },
  { name: "weightG", label: "Weight (g)", step: "any", placeholder: "e.g. 180" },
] as const;
type FieldName = (typeof FIELDS)[number]["name"];

export function AnalyseClient({ maxMb }: { maxMb: number }) {
  const upload = useXhrUpload<Answer>();
  const [values, setValues] = useState<Record<FieldName, string>>({
    cells: "",
    ratedMah: "",
    labelledC: "",
    weightG: "",
  });
  const [file, setFile] = useState<File | null>(null);
  const [table, setTable] = useState<LogTablePreview | null>(null);
  const [mapping, setMapping] = useState<ColumnMapping | null>(null);
  const busy = upload.state.phase === "uploading" || upload.state.phase === "processing";
  const error = upload.state.phase === "error" ? upload.state.error : null;

  const run = (f: File, m: ColumnMapping | null) => {
    const params = new URLSearchParams({ include: "curve" });
    for (const { name } of FIELDS) if (values[name].trim() !== "") params.set(name, values[name].trim());
    if (m) params.set("mapping", mappingJson(m));
    void upload.send(`/api/v1/analyse?${params}`, f, "text/csv");
  };
  const choose = async (f: File) => {
    setFile(f);
    setMapping(null);
    upload.reset();
    const t = await previewFile(f);
    setTable(t);
    // A log without a header row waits for the tester's mapping; anything else goes at once (the server says
    // what is wrong with a file that is not a log).
    if (!waitsForMapping(t)) run(f, null);
  };

  return (
    <div className="grid gap-6 lg:grid-cols-[20rem_1fr]">
      <div className="space-y-4">
        <FileDrop
          accept=".csv,.txt,.tsv,.log,text/csv,text/plain"
          label="Drop a log here, or choose a file"
          hint={`CSV from your logger, comma, semicolon or tab separated; up to ${maxMb} MB`}
          onFile={(f) => void choose(f)}
          disabled={busy}
          error={
            error?.fieldErrors?.file?.[0] ??
            error?.fieldErrors?.mapping?.[0] ??
            (error && !error.fieldErrors ? error.message : undefined)
          }
          testId="analyse-file"
        />
        <UploadProgress state={upload.state} label={`Sending ${file?.name ?? "the log"}`} />
        <fieldset className="card space-y-3">
          <legend className="px-1 text-sm font-medium">Pack label (optional)</legend>
          <p className="muted text-xs">
            Some figures need the label: capacity ratio needs the rating, label ratio the labelled C, specific energy
            the weight.
          </p>
          {FIELDS.map((f) => (
            <label key={f.name} className="flex items-center justify-between gap-3 text-sm">
              <span>{f.label}</span>
              <input
                type="number"
                inputMode="decimal"
                min="0"
                step={f.step}
                placeholder={f.placeholder}
                value={values[f.name]}
                onChange={(e) => setValues((v) => ({ ...v, [f.name]: e.target.value }))}
                aria-invalid={error?.fieldErrors?.[f.name] ? true : undefined}
                className="num w-28 rounded border border-ink/20 bg-paper-raised px-2 py-1 text-right dark:border-night-line dark:bg-night-sunk"
              />
            </label>
          ))}
          {error?.fieldErrors && FIELDS.some((f) => error.fieldErrors?.[f.name]) && (
            <ul role="alert" className="text-sm text-warn dark:text-[#ffb4ab]">
              {FIELDS.flatMap((f) => (error.fieldErrors?.[f.name] ?? []).map((m) => <li key={f.name + m}>{m}</li>))}
            </ul>
          )}
          <button
            type="button"
            disabled={!file || busy}
            onClick={() => file && run(file, mapping)}
            className="rounded-md border border-ink/20 px-3 py-1.5 text-sm hover:bg-paper-sunk disabled:opacity-50 dark:border-night-line dark:hover:bg-night-sunk"
          >
            Analyse again with these figures
          </button>
        </fieldset>
      </div>
      <section aria-labelledby="analysis-heading" className="min-w-0 space-y-3">
        {file && table ? (
          <details open={!table.detected} className="space-y-2" key={`${file.name}-${file.size}-${file.lastModified}`}>
            <summary className="cursor-pointer text-sm">
              {table.detected ? "Columns (detected — open to change)" : "Columns: say what each column holds"}
            </summary>
            <ColumnMappingPicker
              preview={table}
              initial={mapping}
              disabled={busy}
              applyLabel="Analyse with these columns"
              onApply={(m) => {
                setMapping(m);
                run(file, m);
              }}
            />
          </details>
        ) : null}
        <h2 id="analysis-heading">{upload.state.phase === "done" && file ? `Figures for ${file.name}` : "Figures"}</h2>
        {upload.state.phase === "done" ? (
          <LogPreview figures={upload.state.data} curve={upload.state.data.curve} />
        ) : (
          <p className="muted text-sm">
            {busy ? "Working on it…" : "No log yet. The figures, the curves and any warnings appear here."}
          </p>
        )}
      </section>
    </div>
  );
}
