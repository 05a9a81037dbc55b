/**
 * Uploading the site photo: the size checked here first (to spare a long upload), then
 * POST /layouts/:id/photo; once the stored photo has loaded in the browser its pixel size is known.
 */
import { useState } from "react";

/** Same limit as the server's (app/storage/uploads.server.ts), checked here to spare a long upload. */
const PHOTO_MAX_BYTES = 10 * 1024 * 1024;

type UploadAnswer = { fileId?: string; url?: string; error?: string } | null;

/** Waits until the photo at `url` has loaded; resolves with its size in pixels. */
async function photoSize(url: string): Promise<{ width: number; height: number }> {
  const img = new window.Image();
  await new Promise<void>((resolve, reject) => {
    img.onload = () => resolve();
    img.onerror = () => reject(new Error("The photo was stored but could not be shown."));
    img.src = url;
  });
  return { width: img.naturalWidth, height: img.naturalHeight };
}

export function usePhotoUpload(layoutId: string, onUploaded: (fileId: string, w: number, h: number) => void) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function upload(file: File) {
    setError(null);
    if (file.size > PHOTO_MAX_BYTES) {
      setError("The file is too large: at most 10 MB.");
      return;
    }
    setBusy(true);
    try {
      const form = new FormData();
      form.append("photo", file);
      const response = await fetch(`/layouts/${layoutId}/photo`, {
        method: "POST",
        body: form,
        credentials: "same-origin",
      });
      const body = (await response.json().catch(() => null)) as UploadAnswer;
      if (!response.ok || !body?.fileId || !body.url) {
        setError(body?.error ?? `The upload failed (error ${response.status}).`);
        return;
      }
      const size = await photoSize(body.url);
      onUploaded(body.fileId, size.width, size.height);
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  }

  return { busy, error, upload };
}
