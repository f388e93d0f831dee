/** Every client route path, in one place. Build links with these, never with string literals. */
export const paths = {
  home: "/",
  signIn: "/sign-in",
  join: "/join",
  learn: "/learn",
  modules: "/learn/modules",
  lesson: (moduleSlug: string, lessonSlug: string) => `/learn/${encodeURIComponent(moduleSlug)}/${encodeURIComponent(lessonSlug)}`,
  teach: "/teach",
  admin: "/admin",
  account: "/account",
  lab: "/lab",
  labSimulation: (simId: string) => `/lab/${encodeURIComponent(simId)}`,
  notebook: "/notebook",
  notebookNew: "/notebook/new",
  notebookEntry: (id: number) => `/notebook/${id}`,
  notebookEdit: (id: number) => `/notebook/${id}/edit`,
  notebookReview: "/notebook/review",
} as const;

/** Route patterns for the router (the parameterised ones differ from the link builders). */
export const routePatterns = {
  labSimulation: "/lab/:simId",
  lesson: "/learn/:moduleSlug/:lessonSlug",
  notebookEntry: "/notebook/:entryId",
  notebookEdit: "/notebook/:entryId/edit",
} as const;

/** A sign-in link that brings the user back to `next` afterwards. */
export function signInPath(next?: string): string {
  return next && isSafeNext(next) ? `${paths.signIn}?next=${encodeURIComponent(next)}` : paths.signIn;
}

/**
 * Only same-origin, absolute paths may be used as a post-sign-in target:
 * "//evil.example" or "https://..." would turn sign-in into an open redirect.
 */
export function isSafeNext(next: string | null | undefined): next is string {
  if (!next) return false;
  if (!next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return false;
  return !next.startsWith(paths.signIn);
}
