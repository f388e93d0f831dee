import { paths } from "@/config/paths";
import { ButtonLink } from "@/components/ui/button";
import { PageBody } from "@/components/ui/page-header";

export function NotFoundPage() {
  return (
    <>
      <title>Page not found — Grain &amp; Edge</title>
      <PageBody className="max-w-2xl py-16 md:py-24">
        <p className="eyebrow text-ember-700">Error 404</p>
        <h1 className="mt-2 text-4xl font-semibold">Nothing on this bench</h1>
        <p className="mt-4 text-lg leading-relaxed text-soot-700">
          There is no page at this address. It may have moved, or the link may have a typing error.
        </p>
        <div className="mt-8 flex flex-wrap gap-3">
          <ButtonLink to={paths.home}>Go to the start page</ButtonLink>
          <ButtonLink to={paths.lab} variant="secondary">
            Open the simulation lab
          </ButtonLink>
        </div>
      </PageBody>
    </>
  );
}

export const Component = NotFoundPage;
