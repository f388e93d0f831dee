/** The one JSON error shape every API route returns. */
export type ApiErrorCode =
  | "validation_failed"
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "payload_too_large"
  | "unsupported_media_type"
  | "rate_limited"
  | "csrf_failed"
  | "invalid_credentials"
  | "storage_full"
  | "storage_unavailable"
  | "internal_error"
  | "invalid_json"
  | "service_unavailable"
  | (string & {});

export interface ApiErrorBody {
  error: {
    code: ApiErrorCode;
    message: string;
    /** Per-field messages for validation errors, keyed by the field's dotted path. */
    fields?: Record<string, string[]>;
  };
}
