"use client";

import { ErrorCode, type FileRejection, useDropzone } from "react-dropzone";
import type { RoomFileKind } from "@/db/schema";
import { cn } from "@/components/ui/cn";
import { ACCEPTED_TYPES, formatBytes, MAX_UPLOAD_BYTES, notAcceptedMessage, PICKER_ACCEPT, tooLargeMessage } from "@/lib/storage/limits";

export interface Refusal {
  name: string;
  message: string;
}

/** The refusal of one file the drop zone turned away, in the server's own words (lib/storage/limits.ts). */
function refusalOf({ file, errors }: FileRejection, kind: RoomFileKind): Refusal {
  const codes = errors.map((e) => e.code);
  if (codes.includes(ErrorCode.FileTooLarge)) return { name: file.name, message: tooLargeMessage(file.name, file.size) };
  if (codes.includes(ErrorCode.FileInvalidType)) return { name: file.name, message: notAcceptedMessage(file.name, kind) };
  return { name: file.name, message: `“${file.name}” was not added: ${errors.map((e) => e.message).join("; ")}` };
}

/**
 * The drop zone of the files panel (react-dropzone): drop files on it, or focus it (Tab) and press
 * Enter or Space — or click — to choose them. Files over the size limit or plainly of another type
 * are refused here already, so nobody waits for them to travel; the server checks the bytes anyway.
 */
export function UploadZone({ kind, onChoose, disabled, hint }: { kind: RoomFileKind; onChoose: (files: File[], refused: Refusal[]) => void; disabled?: boolean; hint: string }) {
  const accept = Object.fromEntries(ACCEPTED_TYPES[kind].map((t) => [t, PICKER_ACCEPT[t]]));
  const { getRootProps, getInputProps, isDragActive, isDragReject, isFocused } = useDropzone({
    accept,
    maxSize: MAX_UPLOAD_BYTES,
    multiple: true,
    disabled,
    useFsAccessApi: false,
    onDrop: (accepted, rejected) => onChoose(accepted, rejected.map((r) => refusalOf(r, kind))),
  });
  return (
    <div
      {...getRootProps({
        role: "button",
        "aria-label": `Add files: drop them here, or press Enter to choose. ${hint}, up to ${formatBytes(MAX_UPLOAD_BYTES)} each.`,
        "aria-disabled": disabled || undefined,
        className: cn(
          "cursor-pointer rounded-[10px] border-2 border-dashed px-6 py-7 text-center transition-colors outline-none",
          isDragReject ? "border-outside bg-outside-soft" : isDragActive ? "border-kiln-500 bg-kiln-50" : "border-paper-line bg-paper-raised/60",
          isFocused && "ring-2 ring-kiln-500 ring-offset-2",
          disabled && "cursor-not-allowed opacity-60",
        ),
      })}
    >
      <input {...getInputProps()} />
      <svg viewBox="0 0 24 24" className="mx-auto mb-2 h-7 w-7 text-kiln-500" aria-hidden="true">
        <path d="M12 16V4m0 0 4.5 4.5M12 4 7.5 8.5M4 15v3.5A1.5 1.5 0 0 0 5.5 20h13a1.5 1.5 0 0 0 1.5-1.5V15" fill="none" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" strokeLinejoin="round" />
      </svg>
      <p className="text-sm text-ink" aria-hidden="true">
        {isDragActive ? "Drop to add them" : <>Drop files here, or <span className="font-medium text-kiln-600 underline underline-offset-2">choose files</span></>}
      </p>
      <p className="mt-1 text-xs text-ink-faint" aria-hidden="true">
        {hint} · up to {formatBytes(MAX_UPLOAD_BYTES)} each
      </p>
    </div>
  );
}
