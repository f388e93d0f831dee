import type { ReactNode } from "react";
import type { UseQueryResult } from "@tanstack/react-query";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Spinner } from "@/components/ui/spinner";
import { messageFor } from "@/api/errors";

/** Loading and error states for a home page's data, so each page only renders the happy path. */
export function QueryState<T>({ query, children }: { query: UseQueryResult<T>; children: (data: T) => ReactNode }) {
  if (query.isPending) return <Spinner label="Loading your overview" />;
  if (query.isError) {
    return (
      <Alert tone="danger" title="Your overview could not be loaded">
        <p>{messageFor(query.error)}</p>
        <Button variant="secondary" className="mt-3" onClick={() => query.refetch()}>
          Try again
        </Button>
      </Alert>
    );
  }
  return <>{children(query.data)}</>;
}
