import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { isApiError, type ApiError } from "@/api/client";

/** Put the server's per-field validation messages on the matching form fields. */
export function applyFieldErrors<T extends FieldValues>(
  error: ApiError,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
): void {
  if (!error.fields) return;
  for (const name of fieldNames) {
    const messages = error.fields[name];
    if (messages?.length) setError(name, { type: "server", message: messages[0] });
  }
}

/** A sentence for a failed request that a person can act on. */
export function messageFor(error: unknown): string {
  if (!isApiError(error)) return "Something went wrong. Please try again.";
  switch (error.code) {
    case "rate_limited":
      return "Too many attempts in a short time. Wait a few minutes, then try again.";
    case "network_error":
      return error.message;
    case "csrf_failed":
      return "Your session changed in another tab. Reload the page and try again.";
    case "unauthenticated":
      return "Your session has ended. Sign in again.";
    default:
      return error.status >= 500 ? "The server had a problem. Please try again in a moment." : error.message;
  }
}
