/**
 * All client routes. Page modules are loaded lazily (each exports `Component`,
 * and `loader` where it needs one); guards run as loaders before a page renders.
 */
import type { QueryClient } from "@tanstack/react-query";
import { createBrowserRouter, type LoaderFunctionArgs } from "react-router";
import type { Role } from "@shared/api/roles";
import { meQueryOptions } from "@/api/auth";
import { paths, routePatterns } from "@/config/paths";
import { redirectIfSignedIn, requireUser } from "./guards";
import { notebookRoutes } from "./notebook-routes";
import { ProtectedOutlet } from "./layout/protected-outlet";
import { RootLayout } from "./layout/root-layout";
import { HydrateFallback } from "./routes/hydrate-fallback";
import { Component as LandingPage } from "./routes/landing";
import { NotFoundPage } from "./routes/not-found";
import { RouteError } from "./routes/route-error";
import { adminRoutes } from "@/features/admin/routes";
import { teachRoutes } from "@/features/teach/routes";

export function createAppRouter(queryClient: QueryClient) {
  /** A role's home: check the session and role, and start fetching the overview in parallel with the page code. */
  const homeLoader = (role: Role) => async (args: LoaderFunctionArgs) => {
    const user = await requireUser(queryClient, [role])(args);
    // Dynamic import keeps the summary's schema (and zod) out of the first page's bundle.
    void import("@/api/me").then(({ meSummaryQueryOptions }) => queryClient.prefetchQuery(meSummaryQueryOptions()));
    return user;
  };

  return createBrowserRouter([
    {
      id: "root",
      Component: RootLayout,
      HydrateFallback,
      // Know who is signed in before the first paint, so the header does not flicker.
      loader: () => queryClient.ensureQueryData(meQueryOptions()).catch(() => null),
      children: [
        {
          // Errors in any page render inside the layout, keeping the header and navigation.
          errorElement: <RouteError />,
          children: [
            { path: paths.home, Component: LandingPage },
            {
              path: paths.signIn,
              loader: redirectIfSignedIn(queryClient),
              lazy: () => import("./routes/sign-in"),
            },
            // Signed out: buy a pass; signed in: renew it (self-learners) or a note (school accounts).
            { path: paths.join, lazy: () => import("@/features/join/join-page") },
            { path: paths.lab, lazy: () => import("./routes/lab-index") },
            { path: routePatterns.labSimulation, lazy: () => import("./routes/lab-simulation") },
            { path: "/invite/:token", lazy: () => import("@/features/invite/accept-page") },
            {
              Component: ProtectedOutlet,
              children: [
                { path: paths.learn, loader: homeLoader("student"), lazy: () => import("./routes/learn") },
                ...teachRoutes(queryClient),
                ...notebookRoutes(queryClient),
                ...adminRoutes(queryClient, { loader: homeLoader("admin"), lazy: () => import("./routes/admin") }),
                { path: paths.account, loader: requireUser(queryClient), lazy: () => import("./routes/account") },
                // Lessons (features/lessons): the course outline and one lesson.
                { path: paths.modules, loader: requireUser(queryClient), lazy: () => import("@/features/lessons/modules-page") },
                { path: routePatterns.lesson, loader: requireUser(queryClient), lazy: () => import("@/features/lessons/lesson-page") },
              ],
            },
            { path: "*", Component: NotFoundPage },
          ],
        },
      ],
    },
  ]);
}
