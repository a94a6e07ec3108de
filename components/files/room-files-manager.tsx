"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { toast } from "sonner";
import type { RoomFileKind, StoredContentType } from "@/db/schema";
import { Button } from "@/components/ui/button";
import { EmptyState, Notice } from "@/components/ui/card";
import { Select } from "@/components/ui/field";
import { ACCEPTED_TYPES, formatBytes, KIND_LABEL, TYPE_LABEL } from "@/lib/storage/limits";
import { type Refusal, UploadZone } from "./upload-zone";
import { uploadFile } from "./upload-request";

export interface RoomFileView {
  id: string;
  kind: RoomFileKind;
  name: string;
  contentType: StoredContentType;
  sizeBytes: number;
  hasThumbnail: boolean;
  includeInReport: boolean;
  caption: string;
  uploaderName: string;
  createdAt: string;
  canDelete: boolean;
}

interface Progress {
  key: string;
  name: string;
  fraction: number;
  error?: string;
}

export function RoomFilesManager({ roomId, files, uploadKinds, canCurate, isClient }: { roomId: string; files: RoomFileView[]; uploadKinds: RoomFileKind[]; canCurate: boolean; isClient: boolean }) {
  const router = useRouter();
  const [kind, setKind] = useState<RoomFileKind | undefined>(uploadKinds[0]);
  const [progress, setProgress] = useState<Progress[]>([]);
  const [pending, start] = useTransition();
  const kindLabel = (k: RoomFileKind) => (isClient && k === "client-file" ? "Your file" : KIND_LABEL[k]);
  const base = `/api/v1/rooms/${roomId}/files`;

  // One choice of files: those the drop zone turned away (too large, plainly another type) are shown
  // like a server refusal; the others are sent one after the other, each with its progress.
  const upload = async (chosen: File[], refused: Refusal[]) => {
    if (!kind) return;
    const at = Date.now();
    const batch = chosen.map((f, i) => ({ file: f, key: `${at}-${i}-${f.name}` }));
    setProgress((p) => [
      ...p.filter((x) => !x.error && x.fraction < 1),
      ...refused.map((r, i) => ({ key: `${at}-refused-${i}-${r.name}`, name: r.name, fraction: 0, error: r.message })),
      ...batch.map(({ file, key }) => ({ key, name: file.name, fraction: 0 })),
    ]);
    let stored = 0;
    for (const { file, key } of batch) {
      const set = (patch: Partial<Progress>) => setProgress((p) => p.map((x) => (x.key === key ? { ...x, ...patch } : x)));
      const r = await uploadFile(roomId, file, kind, (fraction) => set({ fraction }));
      if (r.ok) {
        set({ fraction: 1 });
        stored += 1;
      } else set({ error: r.message });
    }
    if (stored > 0) {
      toast.success(stored === 1 ? "File added" : `${stored} files added`);
      router.refresh();
    }
    setProgress((p) => p.filter((x) => x.error || x.fraction < 1));
  };

  const patch = (id: string, body: { includeInReport?: boolean; caption?: string }) =>
    start(async () => {
      const res = await fetch(`${base}/${id}`, { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
      if (res.ok) router.refresh();
      else toast.error(((await res.json().catch(() => null)) as { error?: { message?: string } } | null)?.error?.message ?? "The change was not saved.");
    });
  const remove = (f: RoomFileView) =>
    start(async () => {
      if (!window.confirm(`Delete “${f.name}”? This cannot be undone.`)) return;
      const res = await fetch(`${base}/${f.id}`, { method: "DELETE" });
      if (res.ok) {
        toast.success(`“${f.name}” deleted`);
        router.refresh();
      } else toast.error(((await res.json().catch(() => null)) as { error?: { message?: string } } | null)?.error?.message ?? "The file was not deleted.");
    });

  const accepted = kind ? ACCEPTED_TYPES[kind] : [];
  return (
    <div className="space-y-4">
      {kind && (
        <div className="space-y-3">
          {uploadKinds.length > 1 && (
            <div className="flex items-center gap-2 text-sm">
              <label htmlFor="upload-kind" className="font-medium">
                Add as
              </label>
              <Select id="upload-kind" value={kind} onChange={(e) => setKind(e.target.value as RoomFileKind)} className="w-auto">
                {uploadKinds.map((k) => (
                  <option key={k} value={k}>
                    {kindLabel(k)}
                  </option>
                ))}
              </Select>
            </div>
          )}
          <UploadZone kind={kind} onChoose={(files, refused) => void upload(files, refused)} hint={accepted.map((t) => TYPE_LABEL[t].replace(/ (image|document)$/, "")).join(", ")} />
          {progress.length > 0 && (
            <ul className="space-y-2" aria-live="polite">
              {progress.map((p) => (
                <li key={p.key}>
                  {p.error ? (
                    <Notice tone="error">{p.error}</Notice>
                  ) : (
                    <div className="text-sm">
                      <div className="flex justify-between text-ink-soft">
                        <span className="truncate">{p.name}</span>
                        <span className="tabular-nums">{Math.round(p.fraction * 100)} %</span>
                      </div>
                      <div className="mt-1 h-1.5 overflow-hidden rounded-full bg-paper-sunk" role="progressbar" aria-label={`Uploading ${p.name}`} aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(p.fraction * 100)}>
                        <div className="h-full bg-kiln-500 transition-[width]" style={{ width: `${p.fraction * 100}%` }} />
                      </div>
                    </div>
                  )}
                </li>
              ))}
            </ul>
          )}
        </div>
      )}
      {files.length === 0 ? (
        <EmptyState title="No files yet">{kind ? "Photos of the room, drawings and plans go here." : "The firm has not added photos or drawings to this room yet."}</EmptyState>
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          {files.map((f) => (
            <li key={f.id} className="overflow-hidden rounded-[10px] border border-paper-line bg-paper-raised" data-file={f.name}>
              <a href={`${base}/${f.id}/content`} target="_blank" rel="noreferrer" className="block aspect-[4/3] bg-paper-sunk">
                {f.hasThumbnail ? (
                  // eslint-disable-next-line @next/next/no-img-element -- our own authorised thumbnail route, not a static asset
                  <img src={`${base}/${f.id}/content?variant=thumbnail`} alt={f.caption || f.name} className="h-full w-full object-cover" loading="lazy" />
                ) : (
                  <span className="flex h-full items-center justify-center text-sm font-medium text-ink-soft">{TYPE_LABEL[f.contentType]}</span>
                )}
              </a>
              <div className="space-y-1.5 p-3 text-sm">
                <div className="flex items-start justify-between gap-2">
                  <span className="min-w-0 break-words font-medium">{f.name}</span>
                  <span className="shrink-0 rounded-full border border-paper-line px-2 py-0.5 text-xs text-ink-soft">{kindLabel(f.kind)}</span>
                </div>
                <div className="text-xs text-ink-faint">
                  {formatBytes(f.sizeBytes)} · {f.uploaderName} · {new Date(f.createdAt).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" })}
                </div>
                {f.caption && <p className="text-ink-soft">{f.caption}</p>}
                <div className="flex flex-wrap items-center gap-2 pt-1">
                  {canCurate && f.kind === "photo" && (
                    <label className="flex items-center gap-1.5 text-xs">
                      <input type="checkbox" checked={f.includeInReport} disabled={pending} onChange={(e) => patch(f.id, { includeInReport: e.target.checked })} />
                      In the report
                    </label>
                  )}
                  {!canCurate && f.includeInReport && <span className="text-xs text-within">In the report</span>}
                  <a href={`${base}/${f.id}/content?download=1`} className="text-xs font-medium text-kiln-600 hover:underline">
                    Download
                  </a>
                  {f.canDelete && (
                    <Button variant="ghost" className="ml-auto px-2 py-1 text-xs" disabled={pending} onClick={() => remove(f)}>
                      Delete
                    </Button>
                  )}
                </div>
              </div>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
