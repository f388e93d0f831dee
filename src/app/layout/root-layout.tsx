import { useEffect, useRef } from "react";
import { Outlet, ScrollRestoration, useLocation, useNavigation } from "react-router";
import { SiteFooter } from "./site-footer";
import { SiteHeader } from "./site-header";

export function RootLayout() {
  const location = useLocation();
  const navigation = useNavigation();
  const main = useRef<HTMLElement>(null);
  const firstRender = useRef(true);

  // After client-side navigation, move focus to the new page so screen readers announce it.
  useEffect(() => {
    if (firstRender.current) {
      firstRender.current = false;
      return;
    }
    main.current?.focus({ preventScroll: true });
  }, [location.pathname]);

  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only z-50 rounded-md bg-ember-500 px-4 py-2 font-semibold text-soot-950 focus:not-sr-only focus:fixed focus:left-3 focus:top-3"
      >
        Skip to content
      </a>
      <SiteHeader />
      {navigation.state === "loading" ? (
        <div className="fixed inset-x-0 top-0 z-50 h-0.5 animate-pulse bg-ember-400" aria-hidden="true" />
      ) : null}
      <main id="main" ref={main} tabIndex={-1} className="flex-1 outline-none">
        <Outlet />
      </main>
      <SiteFooter />
      <ScrollRestoration />
    </div>
  );
}
