"use client";
// Step 3: the log upload, streamed to storage with a real progress bar, then the figures, curves,
// warnings and checks against the method card — all before confirming. The first rows are read in the
// browser first: a log whose columns cannot be named (no header row) waits for the tester's column mapping,
// or the chosen bench profile's; the mapping travels with the upload and the submission.
import Link from "next/link";
import { useState } from "react";
import { ColumnMappingPicker } from "@/components/analysis/column-mapping-client";
import { LogPreview } from "@/components/analysis/log-preview";
import { previewFile } from "@/components/analysis/preview-file";
import { FileDrop } from "@/components/forms/file-drop";
import { UploadProgress } from "@/components/forms/upload-progress";
import { useXhrUpload } from "@/components/forms/use-xhr-upload";
import { Alert, buttonClass } from "@/components/ui/form";
import type { ColumnMapping, LogPreview as LogPreviewData, LogTablePreview } from "@/lib/analysis";
import { mappingJson, waitsForMapping } from "@/lib/column-mapping-form";
import type { SubmitResultValues } from "@/lib/validations/result";
import type { BenchProfileOption, Limits, PackFactsClient, SubmitFormApi } from "./types";

type UploadAnswer = { log: { key: string; sha256: string; bytes: number; filename: string }; preview: LogPreviewData };
type Props = {
  form: SubmitFormApi;
  facts: PackFactsClient | null;
  limits: Limits;
  /** Bench profiles: the one chosen on the method card may remember the column mapping its logs need. */
  profiles: BenchProfileOption[];
  preview: LogPreviewData | null;
  previewState: "idle" | "loading" | "error";
  onPreview: (p: LogPreviewData | null) => void;
  onRecheck: () => void;
  optional?: boolean;
};

function uploadUrl(
  filename: string,
  facts: PackFactsClient | null,
  m: SubmitResultValues["method"],
  mapping: ColumnMapping | null,
): string {
  const q = new URLSearchParams({ filename });
  if (mapping) q.set("mapping", mappingJson(mapping));
  const put = (k: string, v: string | number | null | undefined) => {
    const s = v === null || v === undefined ? "" : String(v).trim().replace(",", ".");
    if (s !== "" && Number.isFinite(Number(s))) q.set(k, s);
  };
  if (facts) {
    put("cells", facts.cells);
    put("ratedMah", facts.ratedMah);
    put("labelledC", facts.labelledC);
    put("weightG", facts.weightG);
  }
  put("cutoffVPerCell", m.cutoffVPerCell);
  put("stopTemperatureC", m.stopTemperatureC);
  put("packStartTemperatureC", m.packStartTemperatureC);
  put("loadCurrentA", m.loadCurrentA);
  if (m.loadMode) q.set("loadMode", m.loadMode);
  return `/api/v1/uploads/log?${q}`;
}

export function LogStep({
  form,
  facts,
  limits,
  profiles,
  preview,
  previewState,
  onPreview,
  onRecheck,
  optional = false,
}: Props) {
  const {
    setValue,
    getValues,
    watch,
    clearErrors,
    formState: { errors },
  } = form;
  const upload = useXhrUpload<UploadAnswer>();
  const log = watch("log");
  const busy = upload.state.phase === "uploading" || upload.state.phase === "processing";
  const uploadError = upload.state.phase === "error" ? upload.state.error : null;
  const fieldError = errors.log?.message ?? errors.log?.key?.message ?? errors.log?.mapping?.message;
  const [file, setFile] = useState<File | null>(null);
  const [table, setTable] = useState<LogTablePreview | null>(null);
  const [mapping, setMapping] = useState<ColumnMapping | null>(null);
  const profile = profiles.find((p) => String(p.id) === watch("method.benchProfileId"));
  const profileMapping = profile?.logMapping ?? null;

  const send = async (f: File, m: ColumnMapping | null) => {
    clearErrors("log");
    setMapping(m);
    const answer = await upload.send(uploadUrl(f.name, facts, getValues("method"), m), f, f.type || "text/csv");
    if (!answer) return;
    setValue(
      "log",
      { key: answer.log.key, filename: answer.log.filename, mapping: mappingJson(m) },
      { shouldDirty: true, shouldValidate: true },
    );
    onPreview(answer.preview);
  };
  const choose = async (f: File) => {
    setFile(f);
    upload.reset();
    const t = await previewFile(f);
    setTable(t);
    // The bench profile's mapping when it has one; a log without a header row waits for the tester's mapping;
    // anything else goes as it is (the server says what is wrong with a file that is not a log).
    if (profileMapping) await send(f, profileMapping);
    else if (!waitsForMapping(t)) await send(f, null);
    else setMapping(null);
  };
  const errorText = uploadError ? (uploadError.fieldErrors?.log?.[0] ?? uploadError.message) : fieldError;
  const needsMapping = table !== null && waitsForMapping(table) && !log?.key;

  return (
    <div className="space-y-5">
      <FileDrop
        accept=".csv,.txt,.tsv,.log,.dat,text/csv,text/plain"
        label={log?.key ? "Replace the log" : "Drop the log here, or choose a file"}
        hint={`CSV from your logger (time, voltage, current, optionally temperature); up to ${limits.logMaxMb} MB. ${optional ? "Leave it to keep the stored log." : ""}`}
        onFile={(f) => void choose(f)}
        disabled={busy}
        error={errorText}
        testId="log-file"
      />
      <UploadProgress state={upload.state} label="Uploading the log" />
      {file && table ? (
        <details
          open={needsMapping || (uploadError !== null && !table.detected)}
          key={`${file.name}-${file.size}-${file.lastModified}`}
        >
          <summary className="cursor-pointer text-sm">
            {needsMapping
              ? "Columns: say what each column holds before the log is uploaded"
              : mapping
                ? `Columns as mapped${mapping === profileMapping && profile ? ` by your bench profile “${profile.name}”` : ""} — open to change`
                : "Columns (detected — open to change)"}
          </summary>
          <ColumnMappingPicker
            preview={table}
            initial={mapping ?? profileMapping}
            disabled={busy}
            applyLabel={log?.key ? "Upload again with these columns" : "Upload with these columns"}
            onApply={(m) => void send(file, m)}
          />
        </details>
      ) : null}
      {uploadError?.status === 401 && (
        <Alert tone="error">
          Your session has ended. <Link href="/sign-in?callbackUrl=/submit">Sign in again</Link> — this draft is kept in
          this browser.
        </Alert>
      )}
      {log?.key ? (
        <p className="text-sm" data-testid="stored-log">
          Stored log: <span className="num">{log.filename}</span>{" "}
          <button
            type="button"
            className={buttonClass("secondary", "ml-2")}
            onClick={onRecheck}
            disabled={previewState === "loading"}
          >
            Check again with the current method card
          </button>
        </p>
      ) : null}
      {previewState === "loading" && (
        <p className="muted text-sm" aria-live="polite">
          Reading the stored log…
        </p>
      )}
      {previewState === "error" && !preview && (
        <p className="text-sm text-warn dark:text-red-300">
          The stored log could not be checked just now; try again, or upload it again.
        </p>
      )}
      {preview && (
        <section aria-labelledby="preview-heading" className="space-y-3">
          <h3 id="preview-heading">What Sagline computes from this log</h3>
          <p className="muted text-sm">
            These figures are computed again on the server when you submit, from the stored log and the method card as
            you send them.
          </p>
          <LogPreview figures={preview.figures} curve={preview.curve} checks={preview.checks} />
        </section>
      )}
    </div>
  );
}
