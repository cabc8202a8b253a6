"use client";
// Sends a file with XMLHttpRequest so the page can show real upload progress (fetch cannot report
// upload progress), and reads the JSON answer or the app's error body.
import { useCallback, useRef, useState } from "react";

export type UploadError = { status: number; message: string; fieldErrors?: Record<string, string[]> };
export type UploadState<T> =
  | { phase: "idle" }
  | { phase: "uploading"; sentBytes: number; totalBytes: number }
  | { phase: "processing" }
  | { phase: "done"; data: T }
  | { phase: "error"; error: UploadError };

type ErrorBody = { error?: { message?: string; fieldErrors?: Record<string, string[]> } };

function parseError(status: number, text: string): UploadError {
  try {
    const body = JSON.parse(text) as ErrorBody;
    if (body.error?.message)
      return {
        status,
        message: body.error.message,
        ...(body.error.fieldErrors ? { fieldErrors: body.error.fieldErrors } : {}),
      };
  } catch {
    // not our JSON: a proxy or the platform answered
  }
  if (status === 413) return { status, message: "The file is larger than the upload limit." };
  if (status === 401) return { status, message: "Your session has ended. Sign in again; your draft is kept." };
  return {
    status,
    message:
      status === 0
        ? "The connection was lost. Check your network and try again."
        : `The upload failed (HTTP ${status}). Please try again.`,
  };
}

export function useXhrUpload<T>() {
  const [state, setState] = useState<UploadState<T>>({ phase: "idle" });
  const xhrRef = useRef<XMLHttpRequest | null>(null);

  const send = useCallback((url: string, body: Blob | FormData, contentType?: string): Promise<T | null> => {
    xhrRef.current?.abort();
    const xhr = new XMLHttpRequest();
    xhrRef.current = xhr;
    const total = body instanceof Blob ? body.size : 0;
    setState({ phase: "uploading", sentBytes: 0, totalBytes: total });
    return new Promise((resolve) => {
      xhr.upload.onprogress = (e) => {
        if (e.loaded >= (e.lengthComputable ? e.total : total)) setState({ phase: "processing" });
        else setState({ phase: "uploading", sentBytes: e.loaded, totalBytes: e.lengthComputable ? e.total : total });
      };
      xhr.upload.onload = () => setState({ phase: "processing" });
      xhr.onload = () => {
        if (xhr.status >= 200 && xhr.status < 300) {
          try {
            const data = JSON.parse(xhr.responseText) as T;
            setState({ phase: "done", data });
            resolve(data);
          } catch {
            setState({
              phase: "error",
              error: { status: xhr.status, message: "The server's answer could not be read. Please try again." },
            });
            resolve(null);
          }
        } else {
          setState({ phase: "error", error: parseError(xhr.status, xhr.responseText) });
          resolve(null);
        }
      };
      xhr.onerror = () => {
        setState({ phase: "error", error: parseError(0, "") });
        resolve(null);
      };
      xhr.onabort = () => {
        setState({ phase: "idle" });
        resolve(null);
      };
      xhr.open("POST", url);
      if (contentType) xhr.setRequestHeader("Content-Type", contentType);
      xhr.send(body);
    });
  }, []);

  const abort = useCallback(() => xhrRef.current?.abort(), []);
  const reset = useCallback(() => setState({ phase: "idle" }), []);
  return { state, send, abort, reset };
}
