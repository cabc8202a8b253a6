"use client";
// Step 3: the log upload, streamed to storage with a real progress bar, then the figures, curves,
// warnings and checks against the method card — all before confirming.
import Link from "next/link";
import { LogPreview } from "@/components/analysis/log-preview";
import { FileDrop } from "@/components/forms/file-drop";
import { UploadProgress } from "@/components/forms/upload-progress";
import { useXhrUpload } from "@/components/forms/use-xhr-upload";
import { Alert, buttonClass } from "@/components/ui/form";
import type { LogPreview as LogPreviewData } from "@/lib/analysis";
import type { SubmitResultValues } from "@/lib/validations/result";
import type { Limits, PackFactsClient, SubmitFormApi } from "./types";

type UploadAnswer = { log: { key: string; sha256: string; bytes: number; filename: string }; preview: LogPreviewData };
type Props = {
  form: SubmitFormApi;
  facts: PackFactsClient | null;
  limits: Limits;
  preview: LogPreviewData | null;
  previewState: "idle" | "loading" | "error";
  onPreview: (p: LogPreviewData | null) => void;
  onRecheck: () => void;
  optional?: boolean;
};

function uploadUrl(filename: string, facts: PackFactsClient | null, m: SubmitResultValues["method"]): string {
  const q = new URLSearchParams({ filename });
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

export function LogStep({ form, facts, limits, preview, previewState, onPreview, onRecheck, optional = false }: Props) {
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
  const fieldError = errors.log?.message ?? errors.log?.key?.message;

  const send = async (file: File) => {
    clearErrors("log");
    const answer = await upload.send(uploadUrl(file.name, facts, getValues("method")), file, file.type || "text/csv");
    if (!answer) return;
    setValue(
      "log",
      { key: answer.log.key, filename: answer.log.filename },
      { shouldDirty: true, shouldValidate: true },
    );
    onPreview(answer.preview);
  };
  const errorText = uploadError ? (uploadError.fieldErrors?.log?.[0] ?? uploadError.message) : fieldError;

  return (
    <div className="space-y-5">
      <FileDrop
        accept=".csv,.txt,.tsv,.log,.dat,text/csv,text/plain"
        label={log?.key ? "Replace the log" : "Drop the log here, or choose a file"}
        hint={`CSV from your logger (time, voltage, current, optionally temperature); up to ${limits.logMaxMb} MB. ${optional ? "Leave it to keep the stored log." : ""}`}
        onFile={send}
        disabled={busy}
        error={errorText}
        testId="log-file"
      />
      <UploadProgress state={upload.state} label="Uploading the log" />
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
