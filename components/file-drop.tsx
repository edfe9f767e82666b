"use client";
import { useEffect, useId, useRef, useState } from "react";

/**
 * A file picker that also takes a dropped file. The input stays a real, labelled file input,
 * so keyboards, screen readers and tests use it directly.
 */
export function FileDrop({ label, hint, accept, onFile, disabled, testId }: {
  label: string;
  hint: string;
  accept: string;
  onFile: (file: File) => void;
  disabled?: boolean;
  testId?: string;
}) {
  const id = useId();
  const [over, setOver] = useState(false);
  const input = useRef<HTMLInputElement>(null);
  // A file chosen before the page finished loading fired its change event before React listened
  // (seen on a slow phone): take it up once we are ready instead of ignoring it.
  useEffect(() => {
    const early = input.current?.files?.[0];
    if (early && !disabled) {
      onFile(early);
      input.current!.value = "";
    }
    // Only on mount: later choices arrive through onChange.
  }, []);
  return (
    <div
      onDragOver={(e) => {
        e.preventDefault();
        setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={(e) => {
        e.preventDefault();
        setOver(false);
        const file = e.dataTransfer.files?.[0];
        if (file && !disabled) onFile(file);
      }}
      className={`rounded-xl border-2 border-dashed p-4 text-center ${over ? "border-moss-600 bg-moss-100" : "border-loam-300 bg-white"}`}
    >
      <label htmlFor={id} className="block cursor-pointer font-semibold">{label}</label>
      <p id={`${id}-hint`} className="mt-1 text-sm text-loam-600">{hint}</p>
      <input
        ref={input}
        id={id}
        type="file"
        accept={accept}
        disabled={disabled}
        data-testid={testId}
        aria-describedby={`${id}-hint`}
        onChange={(e) => {
          const file = e.target.files?.[0];
          if (file) onFile(file);
          e.target.value = "";
        }}
        className="mx-auto mt-2 block w-full max-w-xs text-sm file:mr-3 file:min-h-tap file:rounded-lg file:border-0 file:bg-moss-600 file:px-4 file:font-semibold file:text-white"
      />
    </div>
  );
}

/** Upload progress: the bar while bytes go out, then a line while the server measures. */
export function UploadProgress({ share, phase }: { share: number; phase: "sending" | "processing" }) {
  return (
    <div role="status" className="space-y-1">
      <progress value={share} max={1} className="h-2 w-full accent-moss-600" aria-label="Upload progress" />
      <p className="text-sm text-loam-700">{phase === "sending" ? `Sending… ${Math.round(share * 100)} %` : "Measuring the line…"}</p>
    </div>
  );
}
