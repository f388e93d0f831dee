/**
 * Storing an upload for a notebook entry, all-or-nothing:
 *   1. quota pre-check (a full account is refused before its body is parsed);
 *   2. multer parses one file into memory (size, count and part limits);
 *   3. the type is decided by content; photos are checked against the pixel cap and re-encoded
 *      with a thumbnail, PDFs are checked and kept as sent;
 *   4. the bytes are written under new random names;
 *   5. in ONE write transaction the quota is checked again (other uploads may have landed since
 *      step 1) and the row is inserted.
 * If anything after step 4 fails, the written files are removed, so a rejected upload leaves
 * no row and no file (tested for each kind of bad upload).
 */
import type { Request, Response } from "express";
import type { NotebookFile, StorageUsage } from "../../shared/api/notebook";
import { NOTEBOOK_LIMITS } from "../../shared/api/notebook";
import type { AppContext } from "../context";
import type { NotebookEntryInstance } from "../db/models/notebook-entry";
import type { InferCreationAttributes } from "sequelize";
import type { NotebookFileInstance } from "../db/models/notebook-file";
import { HttpError, notFound } from "../errors";
import { detectUpload, type DetectedUpload } from "../uploads/detect";
import { UploadGate } from "../uploads/gate";
import { processImage } from "../uploads/images";
import { createFileReceiver } from "../uploads/multipart";
import { displayName } from "../uploads/names";
import { checkPdf } from "../uploads/pdf";
import { sendStoredFile } from "../uploads/serve";
import { uploadSettings, type UploadSettings } from "../uploads/settings";
import { UploadStore } from "../uploads/store";
import { recordAudit } from "./audit";
import { storageUsage, storageUsedBytes, toFile } from "./notebook";

export interface NotebookFiles {
  settings: UploadSettings;
  store: UploadStore;
  usage(userId: number): Promise<StorageUsage>;
  upload(req: Request, res: Response, entry: NotebookEntryInstance, actorId: number): Promise<{ file: NotebookFile; storage: StorageUsage }>;
  send(res: Response, file: NotebookFileInstance, variant: "main" | "thumb"): Promise<void>;
  remove(file: NotebookFileInstance, actorId: number): Promise<void>;
  /** Delete the bytes of rows already deleted (after an entry is deleted). */
  discard(files: Pick<NotebookFileInstance, "storedName" | "thumbName">[]): Promise<void>;
}

type FileCreation = InferCreationAttributes<NotebookFileInstance>;
/** A file row's columns that describe the stored bytes (the caller adds entryId and userId). */
export type StoredFileAttrs = Omit<FileCreation, "entryId" | "userId" | "id" | "createdAt" | "updatedAt">;

const MIB = 1024 * 1024;
const mb = (bytes: number) => `${(bytes / MIB).toFixed(1)} MB`;

function quotaExceeded(usedBytes: number, quotaBytes: number): HttpError {
  return new HttpError(
    413,
    "quota_exceeded",
    `Your notebook storage is full (${mb(usedBytes)} of ${mb(quotaBytes)} used). Delete photos or reports you no longer need, then try again.`,
  );
}

/**
 * Steps 3 and 4 for bytes whose type is known: a photo is re-encoded with a thumbnail, a PDF is
 * checked and kept as sent; the bytes go under new random names, each pushed to `written` as
 * soon as it exists, so the caller can remove them if anything later fails. The directory must
 * exist. Also used by the demo seed for its photos.
 */
export async function storeFileBytes(
  store: UploadStore,
  settings: UploadSettings,
  buffer: Buffer,
  detected: DetectedUpload,
  originalName: string,
  written: string[],
): Promise<StoredFileAttrs> {
  if (detected.kind === "image") {
    const image = await processImage(buffer, detected.format, settings);
    const main = await store.write(image.main.data, image.main.ext);
    written.push(main);
    const thumb = await store.write(image.thumb.data, "webp", { thumb: true, base: main.slice(0, 32) });
    written.push(thumb);
    return {
      kind: "image",
      mimeType: image.main.mimeType,
      storedName: main,
      thumbName: thumb,
      originalName: displayName(originalName, image.main.ext),
      sizeBytes: image.main.data.length,
      thumbBytes: image.thumb.data.length,
      width: image.main.width,
      height: image.main.height,
    };
  }
  checkPdf(buffer);
  const name = await store.write(buffer, "pdf");
  written.push(name);
  return {
    kind: "pdf",
    mimeType: "application/pdf",
    storedName: name,
    thumbName: null,
    originalName: displayName(originalName, "pdf"),
    sizeBytes: buffer.length,
    thumbBytes: 0,
    width: null,
    height: null,
  };
}

export function createNotebookFiles(ctx: AppContext): NotebookFiles {
  const settings = uploadSettings(ctx.config);
  const store = new UploadStore(settings.dir);
  const gate = new UploadGate(settings.concurrency, settings.maxWaiting);
  const receive = createFileReceiver(settings);
  const { db } = ctx;
  let dirReady: Promise<void> | null = null;
  const ensureDir = () => (dirReady ??= store.ensureDir().catch((err) => {
    dirReady = null;
    throw err;
  }));

  const usage = (userId: number) => db.read(() => storageUsage(db, userId, settings));
  const discard = async (files: Pick<NotebookFileInstance, "storedName" | "thumbName">[]) => {
    await store
      .remove(files.flatMap((f) => [f.storedName, f.thumbName]))
      .catch((err) => ctx.logger.error("could not remove stored files", { error: String(err) }));
  };

  return {
    settings,
    store,
    usage,

    async upload(req, res, entry, actorId) {
      const userId = entry.userId;
      const before = await db.read(() => storageUsedBytes(db, userId));
      if (before >= settings.quotaBytes) throw quotaExceeded(before, settings.quotaBytes);
      const fileCount = await db.read(() => db.models.NotebookFile.count({ where: { entryId: entry.id } }));
      if (fileCount >= NOTEBOOK_LIMITS.filesPerEntry) {
        throw new HttpError(409, "too_many_files", `An entry can hold at most ${NOTEBOOK_LIMITS.filesPerEntry} files. Delete one first.`);
      }

      const release = await gate.acquire();
      const written: string[] = [];
      try {
        const received = await receive(req, res);
        const detected = await detectUpload(received.buffer);
        await ensureDir();

        const attrs = await storeFileBytes(store, settings, received.buffer, detected, received.originalName, written);
        const newBytes = attrs.sizeBytes + attrs.thumbBytes;

        const row = await db.write(async (transaction) => {
          // The entry may have been deleted while the file was processed.
          const fresh = await db.models.NotebookEntry.findByPk(entry.id, { attributes: ["id"], transaction });
          if (!fresh) throw notFound("That notebook entry");
          const used = await storageUsedBytes(db, userId);
          if (used + newBytes > settings.quotaBytes) throw quotaExceeded(used, settings.quotaBytes);
          const created = await db.models.NotebookFile.create({ ...attrs, entryId: entry.id, userId }, { transaction });
          await recordAudit(
            db,
            { actorId, action: "notebook.file.upload", targetType: "notebook-entry", targetId: entry.id, details: { fileId: created.id, kind: attrs.kind, bytes: newBytes }, ip: req.ip ?? null },
            transaction,
          );
          return created;
        });
        written.length = 0; // committed: keep the files
        return { file: toFile(row), storage: await usage(userId) };
      } finally {
        release();
        if (written.length > 0) {
          await store.remove(written).catch((err) => ctx.logger.error("could not remove files of a failed upload", { error: String(err) }));
        }
      }
    },

    async send(res, file, variant) {
      if (variant === "thumb") {
        if (!file.thumbName) throw notFound("That thumbnail");
        const base = file.originalName.replace(/\.[a-z0-9]+$/i, "");
        return sendStoredFile(res, store, { storedName: file.thumbName, mimeType: "image/webp", downloadName: `${base}-thumbnail.webp`, disposition: "inline" });
      }
      return sendStoredFile(res, store, {
        storedName: file.storedName,
        mimeType: file.mimeType,
        downloadName: file.originalName,
        disposition: file.kind === "image" ? "inline" : "attachment",
      });
    },

    async remove(file, actorId) {
      await db.write(async (transaction) => {
        await db.models.NotebookFile.destroy({ where: { id: file.id }, transaction });
        await recordAudit(db, { actorId, action: "notebook.file.delete", targetType: "notebook-entry", targetId: file.entryId, details: { fileId: file.id } }, transaction);
      });
      await discard([file]);
    },

    discard,
  };
}
