// Browser side: sends one file with progress (fetch has no upload progress; XMLHttpRequest does).

export type UploadOutcome = { ok: true } | { ok: false; message: string };

export function uploadFile(roomId: string, file: File, kind: string, onProgress: (fraction: number) => void): Promise<UploadOutcome> {
  return new Promise((resolve) => {
    const form = new FormData();
    form.set("kind", kind);
    form.set("file", file, file.name);
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api/v1/rooms/${roomId}/files`);
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress(e.loaded / e.total);
    };
    xhr.onload = () => {
      if (xhr.status === 201) return resolve({ ok: true });
      let message = `The upload failed (${xhr.status}).`;
      try {
        message = (JSON.parse(xhr.responseText) as { error?: { message?: string } }).error?.message ?? message;
      } catch {
        // keep the status message
      }
      resolve({ ok: false, message });
    };
    xhr.onerror = () => resolve({ ok: false, message: "The connection dropped during the upload. Try again." });
    xhr.send(form);
  });
}
