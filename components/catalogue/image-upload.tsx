"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";

const MAX = 5 * 1024 * 1024;

/** Uploads a cutter picture; the server checks the bytes (PNG, JPEG or WebP, at most 5 MB). */
export function ImageUpload({ url }: { url: string }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  async function upload(file: File | undefined) {
    if (!file) return;
    if (file.size > MAX) return setMessage({ ok: false, text: "The image is larger than 5 MB." });
    setBusy(true);
    setMessage(null);
    try {
      const response = await fetch(url, { method: "POST", body: file, headers: { "content-type": "application/octet-stream" } });
      const body = (await response.json().catch(() => ({}))) as { message?: string };
      setMessage(response.ok ? { ok: true, text: "Image saved." } : { ok: false, text: body.message ?? "Upload failed." });
      if (response.ok) router.refresh();
    } finally {
      setBusy(false);
    }
  }
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor="cutter-image" className="text-sm font-medium">
        Cutter image (PNG, JPEG or WebP, up to 5 MB)
      </label>
      <input
        id="cutter-image"
        type="file"
        accept="image/png,image/jpeg,image/webp"
        disabled={busy}
        onChange={(e) => upload(e.target.files?.[0])}
        className="min-h-11 text-sm"
      />
      {busy ? (
        <p role="status" className="text-sm">
          Uploading…
        </p>
      ) : null}
      {message ? (
        <p role={message.ok ? "status" : "alert"} className={`text-sm ${message.ok ? "text-green-800" : "text-red-800"}`}>
          {message.ok ? "✓ " : "⚠ "}
          {message.text}
        </p>
      ) : null}
    </div>
  );
}
