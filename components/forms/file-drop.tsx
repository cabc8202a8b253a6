"use client";
// A drop zone that is also a plain file input (keyboard and screen-reader friendly).
import { useId, useState } from "react";

type Props = {
  accept: string;
  label: string;
  hint: string;
  onFile: (file: File) => void;
  disabled?: boolean;
  error?: string | undefined;
  name?: string;
  testId?: string;
};

export function FileDrop({ accept, label, hint, onFile, disabled, error, name, testId }: Props) {
  const id = useId();
  const [over, setOver] = useState(false);
  return (
    <div className="space-y-1">
      <label
        htmlFor={id}
        onDragOver={(e) => {
          e.preventDefault();
          if (!disabled) setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={(e) => {
          e.preventDefault();
          setOver(false);
          const file = e.dataTransfer.files[0];
          if (file && !disabled) onFile(file);
        }}
        className={`flex cursor-pointer flex-col items-center gap-1 rounded-lg border-2 border-dashed px-4 py-8 text-center transition-colors has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-charge-500 ${
          over
            ? "border-cell-500 bg-cell-50 dark:bg-cell-700/20"
            : "border-ink/20 hover:border-cell-500 dark:border-night-line"
        } ${error ? "border-warn" : ""} ${disabled ? "cursor-not-allowed opacity-60" : ""}`}
      >
        <span className="font-medium">{label}</span>
        <span className="muted text-sm">{hint}</span>
        <input
          id={id}
          name={name}
          type="file"
          accept={accept}
          disabled={disabled}
          className="sr-only"
          data-testid={testId}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          onChange={(e) => {
            const file = e.target.files?.[0];
            if (file) onFile(file);
            e.target.value = "";
          }}
        />
      </label>
      {error && (
        <p id={`${id}-error`} role="alert" className="text-sm text-warn dark:text-[#ffb4ab]">
          {error}
        </p>
      )}
    </div>
  );
}
