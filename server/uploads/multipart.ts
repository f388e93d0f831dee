/**
 * multer for ONE route (never global): memory storage, since every file is bounded by fileSize,
 * at most `concurrency` are in memory at once (gate.ts), and a rejected upload then leaves
 * nothing on disk. Limits on files, fields, parts, field sizes and header pairs are set, because
 * multer's defaults are Infinity (reliability guide §2). Its errors become JSON errors.
 */
import type { Request, RequestHandler, Response } from "express";
import multer from "multer";
import { HttpError } from "../errors";
import type { UploadSettings } from "./settings";

export interface ReceivedFile {
  buffer: Buffer;
  originalName: string;
}

function mapMulterError(err: unknown, settings: UploadSettings): HttpError {
  if (err instanceof HttpError) return err;
  const code = (err as { code?: string })?.code;
  const mib = (settings.maxFileBytes / (1024 * 1024)).toFixed(0);
  switch (code) {
    case "LIMIT_FILE_SIZE":
      return new HttpError(413, "payload_too_large", `The file is larger than the ${mib} MB limit. Scale the photo down or split the report.`);
    case "LIMIT_FILE_COUNT":
      return new HttpError(400, "too_many_files", "Send one file per upload.");
    case "LIMIT_PART_COUNT":
    case "LIMIT_FIELD_COUNT":
      return new HttpError(400, "too_many_parts", "The upload has too many parts. Send one file in a field named \"file\".");
    case "LIMIT_UNEXPECTED_FILE":
    case "MISSING_FIELD_NAME":
      return new HttpError(400, "unexpected_field", "Send the file in a field named \"file\".");
    case "LIMIT_FIELD_KEY":
    case "LIMIT_FIELD_VALUE":
    case "LIMIT_FIELD_NESTING":
    case "LIMIT_FIELD_ARRAY_INDEX":
    case "INVALID_FIELD_NAME":
      return new HttpError(400, "bad_request", "The upload has a field that is too long or malformed.");
    default:
      // busboy's own errors: a malformed or truncated multipart body.
      return new HttpError(400, "malformed_upload", "The upload was malformed or cut off. Try again.");
  }
}

/** Parse the multipart body of this request; resolves with the one file, or throws an HttpError. */
export function createFileReceiver(settings: UploadSettings): (req: Request, res: Response) => Promise<ReceivedFile> {
  const upload: RequestHandler = multer({
    storage: multer.memoryStorage(),
    // Browsers send UTF-8 file names without declaring a charset.
    defParamCharset: "utf8",
    limits: { fileSize: settings.maxFileBytes, ...settings.multipart },
  }).single("file");

  return (req, res) =>
    new Promise<ReceivedFile>((resolve, reject) => {
      if (!req.is("multipart/form-data")) {
        reject(new HttpError(400, "file_missing", "Send the file as multipart/form-data in a field named \"file\"."));
        return;
      }
      upload(req, res, (err?: unknown) => {
        if (err) return reject(mapMulterError(err, settings));
        const file = req.file;
        if (!file) return reject(new HttpError(400, "file_missing", "No file arrived. Choose a file and send it in a field named \"file\"."));
        resolve({ buffer: file.buffer, originalName: file.originalname });
      });
    });
}
