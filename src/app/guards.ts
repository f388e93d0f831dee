/**
 * Route loaders that decide who may open a page. The server enforces roles on
 * every API call; these only send people to the right screen.
 */
import type { QueryClient } from "@tanstack/react-query";
import { data, redirect, type LoaderFunctionArgs } from "react-router";
import { ROLE_HOME, type Role } from "@shared/api/roles";
import type { PublicUser } from "@shared/api/auth";
import { meQueryOptions } from "@/api/auth";
import { isSafeNext, signInPath } from "@/config/paths";

/** What a 403 route error carries, so the "not allowed" page can explain itself. */
export interface ForbiddenRouteData {
  kind: "forbidden";
  role: Role;
  allowed: readonly Role[];
}

export function requireUser(queryClient: QueryClient, allowed?: readonly Role[]) {
  return async ({ request }: LoaderFunctionArgs): Promise<PublicUser> => {
    const user = await queryClient.ensureQueryData(meQueryOptions());
    if (!user) {
      const url = new URL(request.url);
      throw redirect(signInPath(url.pathname + url.search));
    }
    if (allowed && !allowed.includes(user.role)) {
      const body: ForbiddenRouteData = { kind: "forbidden", role: user.role, allowed };
      throw data(body, { status: 403 });
    }
    return user;
  };
}

/** The sign-in page is pointless when already signed in: go where the user was headed, or home. */
export function redirectIfSignedIn(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(meQueryOptions());
    if (!user) return null;
    const next = new URL(request.url).searchParams.get("next");
    throw redirect(isSafeNext(next) ? next : ROLE_HOME[user.role]);
  };
}
