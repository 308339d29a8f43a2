import { useId, useRef, useState, type DragEvent } from "react";
import { buttonClasses } from "#shared/ui/index";

export interface FileDropProps {
  onFile: (file: File) => void;
  disabled?: boolean;
  error?: string | null;
}

/**
 * Drop a CSV here, or choose it: the label is the real file input's, so keyboard and
 * screen-reader users get the browser's own file picker.
 */
export function FileDrop({ onFile, disabled, error }: FileDropProps) {
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const [dragging, setDragging] = useState(false);

  const onDrop = (event: DragEvent) => {
    event.preventDefault();
    setDragging(false);
    const file = event.dataTransfer.files[0];
    if (file && !disabled) onFile(file);
  };

  return (
    <div
      onDragOver={(e) => {
        e.preventDefault();
        setDragging(true);
      }}
      onDragLeave={() => setDragging(false)}
      onDrop={onDrop}
      className={`flex flex-col items-center gap-3 rounded-xl border-2 border-dashed p-6 text-center ${dragging ? "border-pine-700 bg-pine-50" : error ? "border-rust-700 bg-surface" : "border-line-strong bg-surface"}`}
    >
      <p className="font-semibold">Drop the CSV file here</p>
      <p className="text-ink-soft">or</p>
      <label htmlFor={inputId} className={buttonClasses("primary", disabled ? "pointer-events-none opacity-60" : "cursor-pointer")}>
        Choose a file
      </label>
      <input
        ref={input}
        id={inputId}
        type="file"
        accept=".csv,text/csv"
        disabled={disabled}
        aria-describedby={error ? `${inputId}-error` : undefined}
        className="sr-only"
        onChange={(e) => {
          const file = e.target.files?.[0];
          if (file) onFile(file);
          // Choosing the same file again (after fixing it) must fire again.
          e.target.value = "";
        }}
      />
      {error && (
        <p id={`${inputId}-error`} role="alert" className="max-w-full font-semibold text-rust-700 [overflow-wrap:anywhere]">
          <span aria-hidden="true">⚠ </span>
          {error}
        </p>
      )}
    </div>
  );
}
