"use client";
// Step 4: optional photos of the label (pictures only, checked on the server by their first bytes),
// the honesty declaration, and the submit button.
import { useEffect, useRef, useState } from "react";
import { FileDrop } from "@/components/forms/file-drop";
import { UploadProgress } from "@/components/forms/upload-progress";
import { useXhrUpload } from "@/components/forms/use-xhr-upload";
import { buttonClass } from "@/components/ui/form";
import { MAX_PHOTOS } from "@/lib/validations/result";
import type { Limits, SubmitFormApi } from "./types";

type Props = { form: SubmitFormApi; limits: Limits; existingPhotos?: number; children?: React.ReactNode };

export function PhotosStep({ form, limits, existingPhotos = 0, children }: Props) {
  const {
    register,
    setValue,
    watch,
    formState: { errors },
  } = form;
  const upload = useXhrUpload<{ key: string }>();
  const keys = watch("photoKeys") ?? [];
  const [thumbs, setThumbs] = useState<Record<string, string>>({});
  const [localError, setLocalError] = useState<string | null>(null);
  const room = MAX_PHOTOS - existingPhotos - keys.length;
  const busy = upload.state.phase === "uploading" || upload.state.phase === "processing";

  const thumbsRef = useRef(thumbs);
  useEffect(() => {
    thumbsRef.current = thumbs;
  }, [thumbs]);
  useEffect(() => () => Object.values(thumbsRef.current).forEach((u) => URL.revokeObjectURL(u)), []);

  const add = async (file: File) => {
    setLocalError(null);
    if (file.size > limits.photoMaxMb * 1024 * 1024) {
      setLocalError(`That picture is larger than ${limits.photoMaxMb} MB; use a smaller one.`);
      return;
    }
    const answer = await upload.send("/api/v1/uploads/photo", file, file.type || "application/octet-stream");
    if (!answer) return;
    setThumbs((t) => ({ ...t, [answer.key]: URL.createObjectURL(file) }));
    setValue("photoKeys", [...keys, answer.key], { shouldDirty: true, shouldValidate: true });
  };
  const remove = (key: string) =>
    setValue(
      "photoKeys",
      keys.filter((k) => k !== key),
      { shouldDirty: true, shouldValidate: true },
    );
  const uploadError =
    upload.state.phase === "error" ? (upload.state.error.fieldErrors?.photos?.[0] ?? upload.state.error.message) : null;
  const photoError = localError ?? uploadError ?? errors.photoKeys?.message ?? errors.photoKeys?.[0]?.message;

  return (
    <div className="space-y-6">
      <section className="space-y-3" aria-labelledby="photos-heading">
        <h3 id="photos-heading">Photos of the label (optional)</h3>
        <p className="muted text-sm">
          Up to {MAX_PHOTOS} pictures (JPEG, PNG or WebP, {limits.photoMaxMb} MB each) showing the printed rating, so
          moderators can check the pack.
        </p>
        {room > 0 ? (
          <FileDrop
            accept="image/jpeg,image/png,image/webp"
            label="Add a photo"
            hint={`${room} more allowed`}
            onFile={add}
            disabled={busy}
            error={photoError ?? undefined}
            testId="photo-file"
          />
        ) : (
          <p className="text-sm">That is the most photos a result can have.</p>
        )}
        <UploadProgress state={upload.state} label="Uploading the photo" />
        {keys.length > 0 && (
          <ul className="flex flex-wrap gap-3" data-testid="photo-list">
            {keys.map((k, i) => (
              <li key={k} className="card flex w-36 flex-col items-center gap-2 p-2 text-xs">
                {thumbs[k] ? (
                  // A local preview of the file just chosen (an object URL; next/image does not apply).
                  // eslint-disable-next-line @next/next/no-img-element
                  <img src={thumbs[k]} alt={`Label photo ${i + 1}`} className="h-24 w-full rounded object-cover" />
                ) : (
                  <span className="muted flex h-24 w-full items-center justify-center rounded bg-paper-sunk dark:bg-night-sunk">
                    Photo {i + 1} (stored)
                  </span>
                )}
                <button type="button" onClick={() => remove(k)} className={buttonClass("secondary", "w-full")}>
                  Remove
                </button>
              </li>
            ))}
          </ul>
        )}
      </section>

      {children}

      <section className="space-y-2">
        <label className="flex items-start gap-3 text-sm">
          <input
            type="checkbox"
            className="mt-1 h-4 w-4 accent-cell-500"
            aria-invalid={errors.declaration ? true : undefined}
            aria-describedby={errors.declaration ? "declaration-error" : undefined}
            {...register("declaration")}
          />
          <span>
            I declare that these are honest measurements I took myself, with the method stated, and that the log is
            unedited. I agree that the figures are published under CC BY 4.0 once a moderator approves them.
          </span>
        </label>
        {errors.declaration?.message && (
          <p id="declaration-error" role="alert" className="text-sm text-warn dark:text-red-300">
            {errors.declaration.message}
          </p>
        )}
      </section>
    </div>
  );
}
