/**
 * Upload settings (ASVS 5.1.1: the accepted types and sizes, written down):
 *   types      JPEG, PNG and WebP photos (re-encoded), PDF reports (stored as sent); decided by content
 *   size       UPLOAD_MAX_FILE_BYTES per file, default 8 MiB (413 above)
 *   pixels     UPLOAD_MAX_PIXELS, default 40 megapixels, checked from the header before decoding
 *   quota      UPLOAD_QUOTA_BYTES per user (stored bytes, thumbnails included), default 50 MiB
 *   directory  UPLOADS_DIR, default "uploads" next to the database (data/uploads), never inside
 *              the built client (the web root)
 * Read from the environment like server/mail/settings.ts, once per app.
 */
import path from "node:path";
import { z } from "zod";
import { PROJECT_ROOT, type Config } from "../config";

const MIB = 1024 * 1024;

const schema = z.object({
  UPLOADS_DIR: z.string().min(1).optional(),
  UPLOAD_MAX_FILE_BYTES: z.coerce.number().int().min(1024).max(64 * MIB).optional().default(8 * MIB),
  UPLOAD_QUOTA_BYTES: z.coerce.number().int().min(1024).max(100 * 1024 * MIB).optional().default(50 * MIB),
  UPLOAD_MAX_PIXELS: z.coerce.number().int().min(10_000).max(268_402_689).optional().default(40_000_000),
});

export interface UploadSettings {
  /** Absolute directory for stored files. */
  dir: string;
  maxFileBytes: number;
  quotaBytes: number;
  maxPixels: number;
  /** Longest edge of a stored photo, px (larger photos are scaled down). */
  maxEdgePx: number;
  /** Longest edge of a thumbnail, px. */
  thumbEdgePx: number;
  /** multer/busboy limits: one file, a few small fields, few parts, short header lists. */
  multipart: { files: number; fields: number; parts: number; fieldSize: number; fieldNameSize: number; headerPairs: number };
  /** Uploads processed at once (decoding holds memory and libuv threads); others wait in line. */
  concurrency: number;
  /** Uploads allowed to wait; beyond that the server answers 503. */
  maxWaiting: number;
}

export function uploadSettings(config: Config, env: Record<string, string | undefined> = process.env): UploadSettings {
  const parsed = schema.safeParse(env);
  if (!parsed.success) {
    throw new Error(`Invalid upload configuration:\n${parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n")}`);
  }
  const e = parsed.data;
  const dir = e.UPLOADS_DIR ? path.resolve(PROJECT_ROOT, e.UPLOADS_DIR) : path.join(path.dirname(config.databasePath), "uploads");
  if (isInside(dir, config.clientDistDir)) {
    throw new Error(`UPLOADS_DIR (${dir}) must not be inside the built client (${config.clientDistDir}), which is served to everyone.`);
  }
  return {
    dir,
    maxFileBytes: e.UPLOAD_MAX_FILE_BYTES,
    quotaBytes: e.UPLOAD_QUOTA_BYTES,
    maxPixels: e.UPLOAD_MAX_PIXELS,
    maxEdgePx: 2400,
    thumbEdgePx: 320,
    multipart: { files: 1, fields: 8, parts: 10, fieldSize: 1024, fieldNameSize: 100, headerPairs: 50 },
    concurrency: 2,
    maxWaiting: 16,
  };
}

export function isInside(child: string, parent: string): boolean {
  const rel = path.relative(parent, child);
  return rel === "" || (!rel.startsWith("..") && !path.isAbsolute(rel));
}
