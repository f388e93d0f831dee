import { useEffect, useId, useRef, useState } from "react";
import { Link, NavLink, useLocation, useNavigate } from "react-router";
import { useLogout, useMe } from "@/api/auth";
import { paths } from "@/config/paths";
import { buttonClasses } from "@/components/ui/button";
import { cx } from "@/components/ui/cx";
import { LogoMark } from "@/components/ui/logo-mark";
import { navItemsFor } from "./nav-items";

const ROLE_LABEL = { student: "Student", instructor: "Instructor", admin: "Admin" } as const;

export function SiteHeader() {
  const me = useMe();
  const user = me.data ?? null;
  const logout = useLogout();
  const navigate = useNavigate();
  const location = useLocation();
  const [menuOpen, setMenuOpen] = useState(false);
  const menuId = useId();
  const menuButton = useRef<HTMLButtonElement>(null);
  const menuPanel = useRef<HTMLDivElement>(null);
  const items = navItemsFor(user);
  const onSignInPage = location.pathname === paths.signIn;

  // Close the phone menu whenever the page changes.
  useEffect(() => setMenuOpen(false), [location.pathname]);

  useEffect(() => {
    if (!menuOpen) return;
    menuPanel.current?.querySelector<HTMLElement>("a, button")?.focus();
    const onKey = (event: KeyboardEvent) => {
      if (event.key === "Escape") {
        setMenuOpen(false);
        menuButton.current?.focus();
      }
    };
    document.addEventListener("keydown", onKey);
    return () => document.removeEventListener("keydown", onKey);
  }, [menuOpen]);

  async function signOut() {
    setMenuOpen(false);
    // Leave the private page first (committed synchronously, hence flushSync), so no guard on it
    // reacts to the signed-out state by sending the user to the sign-in page.
    await navigate(paths.home, { flushSync: true });
    logout.mutate();
  }

  const navLinkClass = ({ isActive }: { isActive: boolean }) =>
    cx(
      "rounded-sm px-3 py-2 text-sm font-medium transition-colors",
      isActive ? "text-ember-300 underline decoration-2 underline-offset-8" : "text-ash-200 hover:text-bone-50",
    );

  return (
    <header className="sticky top-0 z-40 bg-soot-900 text-bone-50 shadow-forge">
      <div className="mx-auto flex h-16 max-w-page items-center gap-4 px-gutter">
        <Link to={paths.home} className="flex items-center gap-2.5 rounded-sm" aria-label="Grain & Edge, home">
          <LogoMark className="size-9" />
          <span className="font-display text-xl font-semibold tracking-tight">
            Grain <span className="text-ember-400">&amp;</span> Edge
          </span>
        </Link>

        <nav aria-label="Main" className="ml-6 hidden md:block">
          <ul className="flex items-center gap-1">
            {items.map((item) => (
              <li key={item.to}>
                <NavLink to={item.to} className={navLinkClass}>
                  {item.label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>

        <div className="ml-auto hidden items-center gap-3 md:flex">
          {user ? (
            <>
              <p className="text-right text-sm leading-tight">
                <span className="block font-medium text-bone-50">{user.displayName}</span>
                <span className="eyebrow text-2xs text-ash-300">{ROLE_LABEL[user.role]}</span>
              </p>
              <button type="button" onClick={signOut} className={buttonClasses("onDark")}>
                Sign out
              </button>
            </>
          ) : me.isPending || onSignInPage ? null : (
            <Link to={paths.signIn} className={buttonClasses("primary")}>
              Sign in
            </Link>
          )}
        </div>

        <button
          ref={menuButton}
          type="button"
          className="ml-auto inline-flex min-h-11 items-center gap-2 rounded-md border border-ash-300/40 px-3 text-sm font-medium md:hidden"
          aria-expanded={menuOpen}
          aria-controls={menuId}
          onClick={() => setMenuOpen((open) => !open)}
        >
          <MenuIcon open={menuOpen} />
          Menu
        </button>
      </div>
      <div className="temper-ribbon" aria-hidden="true" />

      <div
        id={menuId}
        ref={menuPanel}
        hidden={!menuOpen}
        className="border-b-4 border-ember-500 bg-soot-950 px-gutter pb-5 pt-3 shadow-forge md:hidden"
      >
        <nav aria-label="Main, phone">
          <ul className="flex flex-col">
            {items.map((item) => (
              <li key={item.to}>
                <NavLink
                  to={item.to}
                  className={({ isActive }) =>
                    cx(
                      "flex min-h-12 items-center border-b border-soot-700 text-base font-medium",
                      isActive ? "text-ember-300" : "text-bone-50",
                    )
                  }
                >
                  {item.label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>
        <div className="mt-4">
          {user ? (
            <div className="flex items-center justify-between gap-3">
              <p className="text-sm">
                <span className="block font-medium">{user.displayName}</span>
                <span className="eyebrow text-2xs text-ash-300">{ROLE_LABEL[user.role]}</span>
              </p>
              <button type="button" onClick={signOut} className={buttonClasses("onDark")}>
                Sign out
              </button>
            </div>
          ) : onSignInPage ? null : (
            <Link to={paths.signIn} className={buttonClasses("primary", "lg", "w-full")}>
              Sign in
            </Link>
          )}
        </div>
      </div>
      {logout.isError ? (
        <p role="alert" className="bg-danger-100 px-gutter py-2 text-sm text-danger-700">
          Signing out did not reach the server. Close the browser to end the session, or try again.
        </p>
      ) : null}
    </header>
  );
}

function MenuIcon({ open }: { open: boolean }) {
  return (
    <svg viewBox="0 0 20 20" className="size-5" aria-hidden="true" focusable="false">
      {open ? (
        <path d="M5 5l10 10M15 5L5 15" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
      ) : (
        <path d="M3 6h14M3 10h14M3 14h14" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
      )}
    </svg>
  );
}
