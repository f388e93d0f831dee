import { Navigate, Outlet, useLocation } from "react-router";
import { useMe } from "@/api/auth";
import { signInPath } from "@/config/paths";

/**
 * The loader already checked the session before rendering; this catches the
 * session ending while the page is open (any 401 sets the cached user to null).
 */
export function ProtectedOutlet() {
  const me = useMe();
  const location = useLocation();
  if (me.data === null) return <Navigate to={signInPath(location.pathname + location.search)} replace />;
  return <Outlet />;
}
