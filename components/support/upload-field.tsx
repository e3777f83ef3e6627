"use client";

import { useRef, useState } from "react";

type Item = { key: string; name: string; progress: number; id?: string; error?: string };

function uploadWithProgress(vendor: string, file: File, onProgress: (share: number) => void): Promise<{ id: string }> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api/v1/vendors/${vendor}/attachments`);
    xhr.setRequestHeader("X-File-Name", encodeURIComponent(file.name));
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    xhr.onload = () => {
      let body: { attachment?: { id: string }; message?: string } = {};
      try {
        body = JSON.parse(xhr.responseText);
      } catch {}
      if (xhr.status === 201 && body.attachment) resolve(body.attachment);
      else reject(new Error(xhr.status === 413 ? "Too large: at most 10 MB." : (body.message ?? `Upload failed (${xhr.status}).`)));
    };
    xhr.onerror = () => reject(new Error("Upload failed: network error."));
    xhr.send(file);
  });
}

/** Files for a ticket or reply, uploaded at once with a progress bar; the form sends their ids. */
export function UploadField({ vendor, label = "Attachments" }: { vendor: string; label?: string }) {
  const [items, setItems] = useState<Item[]>([]);
  const input = useRef<HTMLInputElement>(null);
  const patch = (key: string, change: Partial<Item>) => setItems((all) => all.map((i) => (i.key === key ? { ...i, ...change } : i)));

  function onFiles(files: FileList | null) {
    for (const file of Array.from(files ?? [])) {
      const key = `${file.name}-${Math.random()}`;
      setItems((all) => [...all, { key, name: file.name, progress: 0 }]);
      if (file.size > 10 * 1024 * 1024) {
        patch(key, { error: "Too large: at most 10 MB." });
        continue;
      }
      uploadWithProgress(vendor, file, (p) => patch(key, { progress: p }))
        .then((a) => patch(key, { id: a.id, progress: 1 }))
        .catch((e: Error) => patch(key, { error: e.message }));
    }
    if (input.current) input.current.value = "";
  }

  return (
    <div className="flex flex-col gap-1">
      <label htmlFor="f-upload" className="text-sm font-medium">
        {label}
      </label>
      <input
        id="f-upload"
        ref={input}
        type="file"
        multiple
        accept="image/png,image/jpeg,image/webp,application/pdf,.nc,.gcode,.ngc,.tap,.txt"
        onChange={(e) => onFiles(e.target.files)}
        className="min-h-11 text-sm"
      />
      <p className="text-xs text-stone-600">Photos (PNG, JPEG, WebP), PDFs or G-code text files, up to 10 MB each.</p>
      <ul className="space-y-1" aria-live="polite">
        {items.map((i) => (
          <li key={i.key} className="text-sm" data-upload-state={i.error ? "error" : i.id ? "done" : "uploading"}>
            <span className="mr-2">{i.name}</span>
            {i.error ? (
              <span className="text-red-800">
                <span aria-hidden>⚠ </span>
                {i.error}
              </span>
            ) : (
              <>
                <progress max={1} value={i.progress} aria-label={`Upload of ${i.name}`} className="h-2 w-40 align-middle" />
                <span className="num ml-2">{Math.round(i.progress * 100)}&nbsp;%</span>
                {i.id ? <span className="ml-2 text-green-800">✓ uploaded</span> : null}
              </>
            )}
            {i.id ? <input type="hidden" name="attachmentIds" value={i.id} /> : null}
            {i.id || i.error ? (
              <button
                type="button"
                className="ml-2 text-xs underline"
                onClick={() => setItems((all) => all.filter((x) => x.key !== i.key))}
              >
                Remove
              </button>
            ) : null}
          </li>
        ))}
      </ul>
    </div>
  );
}
