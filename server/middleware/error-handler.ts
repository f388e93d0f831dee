import type { ErrorRequestHandler, RequestHandler } from "express";
import type { ApiErrorBody, ApiErrorCode } from "../../shared/api/errors";
import { HttpError } from "../errors";
import type { Logger } from "../log";

/** body-parser error types -> our JSON errors. */
const BODY_PARSER_ERRORS: Record<string, [number, ApiErrorCode, string]> = {
  "entity.too.large": [413, "payload_too_large", "The request body is too large."],
  "entity.parse.failed": [400, "invalid_json", "The request body is not valid JSON."],
  "encoding.unsupported": [415, "unsupported_media_type", "Unsupported content encoding."],
  "charset.unsupported": [415, "unsupported_media_type", "Unsupported character set."],
  "request.aborted": [400, "bad_request", "The request was aborted."],
  "request.size.invalid": [400, "bad_request", "The request body length does not match its header."],
  "stream.encoding.set": [500, "internal_error", "Something went wrong on our side."],
};

interface ClassifiedError {
  status: number;
  code: ApiErrorCode;
  message: string;
  fields?: Record<string, string[]>;
  headers?: Record<string, string>;
}

/**
 * Storage failures (reliability guide §3, §5b): the disk or the database file cannot take the
 * write. The transaction was rolled back (SQLite) or the partial file removed (uploads), so the
 * client may retry later; the process keeps serving reads.
 *   full       SQLITE_FULL, ENOSPC, EDQUOT            -> 507 storage_full
 *   unusable   SQLITE_READONLY, SQLITE_IOERR, EROFS,   -> 503 storage_unavailable (+ Retry-After)
 *              SQLITE_CANTOPEN, EIO
 */
const STORAGE_FULL = new Set(["SQLITE_FULL", "ENOSPC", "EDQUOT"]);
const STORAGE_UNUSABLE = new Set(["SQLITE_READONLY", "SQLITE_IOERR", "SQLITE_CANTOPEN", "EROFS", "EIO"]);

function classifyStorageError(code: string | undefined): ClassifiedError | undefined {
  if (code === undefined) return undefined;
  if (STORAGE_FULL.has(code)) {
    return { status: 507, code: "storage_full", message: "The server's storage is full. Your change was not saved; try again later.", headers: { "Retry-After": "60" } };
  }
  if (STORAGE_UNUSABLE.has(code)) {
    return {
      status: 503,
      code: "storage_unavailable",
      message: "The server cannot write its data right now. Your change was not saved; try again later.",
      headers: { "Retry-After": "30" },
    };
  }
  return undefined;
}

function classify(err: unknown): ClassifiedError {
  if (err instanceof HttpError) return err;
  const e = err as { type?: string; name?: string; parent?: { code?: string }; original?: { code?: string }; code?: string };
  if (e?.type && BODY_PARSER_ERRORS[e.type]) {
    const [status, code, message] = BODY_PARSER_ERRORS[e.type];
    return { status, code, message };
  }
  if (e?.name === "SequelizeUniqueConstraintError") {
    return { status: 409, code: "conflict", message: "That record already exists." };
  }
  const sqliteCode = e?.parent?.code ?? e?.original?.code ?? e?.code;
  const storage = classifyStorageError(sqliteCode);
  if (storage) return storage;
  if (sqliteCode === "SQLITE_BUSY" || e?.name === "SequelizeTimeoutError") {
    return {
      status: 503,
      code: "service_unavailable",
      message: "The service is temporarily unavailable. Try again shortly.",
      headers: { "Retry-After": "5" },
    };
  }
  return { status: 500, code: "internal_error", message: "Something went wrong on our side." };
}

/** The one JSON error handler (registered after all routes). Never sends a stack trace. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err, req, res, next) => {
    if (res.headersSent) return next(err);
    const { status, code, message, fields, headers } = classify(err);
    if (status >= 500) {
      logger.error("request failed", {
        method: req.method,
        path: req.path,
        status,
        error: err instanceof Error ? `${err.name}: ${err.message}` : String(err),
        stack: err instanceof Error ? err.stack : undefined,
      });
    } else if (status === 403) {
      logger.warn("access denied", { method: req.method, path: req.path, code, userId: req.user?.id ?? null, ip: req.ip });
    }
    for (const [name, value] of Object.entries(headers ?? {})) res.setHeader(name, value);
    const body: ApiErrorBody = { error: { code, message, ...(fields ? { fields } : {}) } };
    res.status(status).json(body);
  };
}

/** JSON 404 for unknown /api routes (mounted after the API routers). */
export const apiNotFound: RequestHandler = (req) => {
  throw new HttpError(404, "not_found", `No API route for ${req.method} ${req.baseUrl}${req.path}.`);
};
