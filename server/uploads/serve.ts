/**
 * Sending a stored file back (ASVS 3.2.1, 5.3.1, 5.4.x): the Content-Type the server recorded,
 * `nosniff`, a CSP that sandboxes the response and allows nothing (so even a file a browser
 * would render can run no script and load nothing), same-origin resource policy, and a
 * Content-Disposition that shows photos inline and downloads PDFs, with a sanitised name.
 */
import type { Response } from "express";
import { notFound } from "../errors";
import { contentDisposition } from "./names";
import type { UploadStore } from "./store";

export const UPLOAD_RESPONSE_CSP = "sandbox; default-src 'none'";

export interface ServedFile {
  storedName: string;
  mimeType: string;
  downloadName: string;
  disposition: "inline" | "attachment";
}

export function sendStoredFile(res: Response, store: UploadStore, file: ServedFile): Promise<void> {
  res.set({
    "Content-Type": file.mimeType,
    "X-Content-Type-Options": "nosniff",
    "Content-Security-Policy": UPLOAD_RESPONSE_CSP,
    "Cross-Origin-Resource-Policy": "same-origin",
    "Content-Disposition": contentDisposition(file.disposition, file.downloadName),
    // Personal data: private, never kept by shared caches.
    "Cache-Control": "private, no-store",
  });
  return new Promise<void>((resolve, reject) => {
    res.sendFile(store.pathOf(file.storedName), { dotfiles: "deny", lastModified: false, cacheControl: false }, (err) => {
      if (!err) return resolve();
      if (res.headersSent) return resolve();
      // The row exists but the bytes are gone (deleted by hand, disk restored from backup…).
      res.removeHeader("Content-Disposition");
      res.removeHeader("Content-Type");
      reject((err as NodeJS.ErrnoException).code === "ENOENT" || (err as { status?: number }).status === 404 ? notFound("That file") : err);
    });
  });
}
