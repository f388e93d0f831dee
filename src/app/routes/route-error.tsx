import { isRouteErrorResponse, useRouteError } from "react-router";
import { paths } from "@/config/paths";
import { ButtonLink } from "@/components/ui/button";
import { PageBody } from "@/components/ui/page-header";
import type { ForbiddenRouteData } from "../guards";
import { NotAllowedPage } from "./not-allowed";
import { NotFoundPage } from "./not-found";

function isForbidden(value: unknown): value is ForbiddenRouteData {
  return typeof value === "object" && value !== null && (value as ForbiddenRouteData).kind === "forbidden";
}

/** The error boundary for every page: 403 and 404 get their own pages, anything else a plain apology. */
export function RouteError() {
  const error = useRouteError();
  if (isRouteErrorResponse(error)) {
    if (error.status === 403 && isForbidden(error.data)) return <NotAllowedPage {...error.data} />;
    if (error.status === 404) return <NotFoundPage />;
  }
  const chunkFailed = error instanceof Error && /dynamically imported module|Importing a module script failed/i.test(error.message);

  return (
    <>
      <title>Something went wrong — Grain &amp; Edge</title>
      <PageBody className="max-w-2xl py-16 md:py-24">
        <p className="eyebrow text-ember-700">Error</p>
        <h1 className="mt-2 text-4xl font-semibold">This page could not be shown</h1>
        <p role="alert" className="mt-4 text-lg leading-relaxed text-soot-700">
          {chunkFailed
            ? "Part of the app could not be downloaded, perhaps because a new version was just published. Reload the page to continue."
            : "Something went wrong while showing this page. Reload the page, or go back to the start."}
        </p>
        <div className="mt-8">
          <ButtonLink to={paths.home}>Go to the start page</ButtonLink>
        </div>
      </PageBody>
    </>
  );
}
