"use client";
// The bench profile's column mapping: what it is in words, picked from the first rows of one of the
// tester's own logs (read in the browser, nothing is uploaded), removable, and editable as JSON for
// anyone who prefers. The JSON textarea is the form field the server action reads.
import { useState } from "react";
import type { UseFormRegisterReturn } from "react-hook-form";
import { ColumnMappingPicker } from "@/components/analysis/column-mapping-client";
import { previewFile } from "@/components/analysis/preview-file";
import { buttonClass, describedBy, Field, inputClass } from "@/components/ui/form";
import type { LogTablePreview } from "@/lib/analysis";
import { describeMapping, mappingFromJson, mappingJson } from "@/lib/column-mapping-form";

export function MappingField({
  value,
  onChange,
  error,
  registration,
}: {
  value: string;
  onChange: (json: string) => void;
  error?: string;
  registration: UseFormRegisterReturn<"logMapping">;
}) {
  const [table, setTable] = useState<LogTablePreview | null>(null);
  const mapping = mappingFromJson(value);
  return (
    <div className="space-y-3 md:col-span-2" data-testid="profile-mapping">
      <p className="text-sm" data-testid="profile-mapping-words">
        {mapping
          ? `Logs from this bench are read with: ${describeMapping(mapping)}.`
          : value.trim()
            ? "The mapping below cannot be used yet; see the message."
            : "No column mapping: Sagline names the columns from each log's header row."}
      </p>
      <div className="flex flex-wrap items-center gap-3">
        <label className="text-sm">
          <span className="mr-2">Pick the columns from one of your logs</span>
          <input
            type="file"
            accept=".csv,.txt,.tsv,.log,.dat,text/csv,text/plain"
            className="text-sm"
            onChange={async (e) => {
              const f = e.target.files?.[0];
              if (f) setTable(await previewFile(f));
            }}
          />
        </label>
        {value.trim() ? (
          <button type="button" className={buttonClass("secondary")} onClick={() => onChange("")}>
            Remove the mapping
          </button>
        ) : null}
      </div>
      {table ? (
        <ColumnMappingPicker
          preview={table}
          initial={mapping}
          applyLabel="Use these columns for this bench"
          onApply={(m) => {
            onChange(mappingJson(m));
            setTable(null);
          }}
        />
      ) : null}
      <details open={!!error}>
        <summary className="cursor-pointer text-sm">Edit the mapping as JSON</summary>
        <Field
          id="logMapping"
          label="Column mapping (JSON)"
          error={error}
          hint='Columns by number from 0 or by header name, e.g. {"time":0,"voltage":1,"current":2,"hasHeader":false}. Empty: detect the columns.'
        >
          <textarea
            id="logMapping"
            rows={3}
            className={`${inputClass} font-mono text-xs`}
            {...describedBy("logMapping", error, true)}
            {...registration}
          />
        </Field>
      </details>
    </div>
  );
}
