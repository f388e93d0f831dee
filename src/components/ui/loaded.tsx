import type { ReactNode } from "react";
import type { UseQueryResult } from "@tanstack/react-query";
import { isApiError } from "@/api/client";
import { messageFor } from "@/api/errors";
import { Alert } from "./alert";
import { Button } from "./button";
import { Spinner } from "./spinner";

/** Loading and error states for a page's main query; a 404 gets its own wording. */
export function Loaded<T>({ query, label, children }: { query: UseQueryResult<T>; label: string; children: (data: T) => ReactNode }) {
  if (query.isPending) return <Spinner label={`Loading the ${label}`} />;
  if (query.isError) {
    const missing = isApiError(query.error) && query.error.status === 404;
    return (
      <Alert tone="danger" title={missing ? `This ${label} was not found` : `The ${label} could not be loaded`}>
        <p>{missing ? "It may have been removed, or it belongs to someone else." : messageFor(query.error)}</p>
        {missing ? null : (
          <Button variant="secondary" className="mt-3" onClick={() => query.refetch()}>
            Try again
          </Button>
        )}
      </Alert>
    );
  }
  return <>{children(query.data)}</>;
}
