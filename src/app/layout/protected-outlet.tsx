import { Link, Outlet, useLocation } from "react-router";
import { useMe } from "@/api/auth";
import { signInPath } from "@/config/paths";
import { buttonClasses } from "@/components/ui/button";
import { PageBody } from "@/components/ui/page-header";

/**
 * The loader checked the session before this page rendered. If the session ends while the page
 * is open (any 401 sets the cached user to null), say so plainly instead of leaving a page whose
 * data can no longer load. A deliberate sign-out navigates away on its own.
 */
export function ProtectedOutlet() {
  const me = useMe();
  const location = useLocation();
  if (me.data !== null) return <Outlet />;

  return (
    <PageBody className="max-w-2xl py-16 md:py-24">
      <title>Signed out — Grain &amp; Edge</title>
      <h1 className="text-4xl font-semibold">You are signed out</h1>
      <p className="mt-4 text-lg leading-relaxed text-soot-700">
        Your session has ended, so this page can no longer show your data. Sign in again to carry on where you were.
      </p>
      <Link to={signInPath(location.pathname + location.search)} className={buttonClasses("primary", "lg", "mt-8")}>
        Sign in again
      </Link>
    </PageBody>
  );
}
