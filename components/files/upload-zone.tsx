"use client";

import { useId, useRef, useState, type DragEvent } from "react";
import { cn } from "@/components/ui/cn";
import { formatBytes, MAX_UPLOAD_BYTES } from "@/lib/storage/limits";

/** A drop zone that is also a keyboard-reachable file picker. */
export function UploadZone({ onFiles, disabled, accept, hint }: { onFiles: (files: File[]) => void; disabled?: boolean; accept: string; hint: string }) {
  const input = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  const id = useId();
  const drop = (e: DragEvent) => {
    e.preventDefault();
    setOver(false);
    if (!disabled) onFiles([...e.dataTransfer.files]);
  };
  return (
    <div
      onDragOver={(e) => {
        e.preventDefault();
        if (!disabled) setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={drop}
      className={cn("rounded-[10px] border-2 border-dashed px-6 py-7 text-center transition-colors", over ? "border-kiln-500 bg-kiln-50" : "border-paper-line bg-paper-raised/60", disabled && "opacity-60")}
    >
      <svg viewBox="0 0 24 24" className="mx-auto mb-2 h-7 w-7 text-kiln-500" aria-hidden="true">
        <path d="M12 16V4m0 0 4.5 4.5M12 4 7.5 8.5M4 15v3.5A1.5 1.5 0 0 0 5.5 20h13a1.5 1.5 0 0 0 1.5-1.5V15" fill="none" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" strokeLinejoin="round" />
      </svg>
      <p className="text-sm text-ink">
        Drop files here, or{" "}
        <label htmlFor={id} className="cursor-pointer font-medium text-kiln-600 underline underline-offset-2">
          choose files
        </label>
      </p>
      <p className="mt-1 text-xs text-ink-faint">
        {hint} · up to {formatBytes(MAX_UPLOAD_BYTES)} each
      </p>
      <input
        ref={input}
        id={id}
        type="file"
        multiple
        accept={accept}
        disabled={disabled}
        className="sr-only"
        onChange={(e) => {
          onFiles([...(e.target.files ?? [])]);
          if (input.current) input.current.value = "";
        }}
      />
    </div>
  );
}
