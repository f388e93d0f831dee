/** Session state in the query cache: who is signed in, and what survives sign-in and sign-out. */
import { afterEach, describe, expect, it, vi } from "vitest";
import { QueryClient, QueryObserver } from "@tanstack/react-query";
import { authQueryKeys, fetchMe, meQueryOptions, resetCacheForUser } from "@/api/auth";

const ruth = { id: 4, email: "student@grain-edge.test", displayName: "Ruth Kettleby", role: "student" as const };

afterEach(() => vi.unstubAllGlobals());

describe("fetchMe", () => {
  it("treats the server's 401 as 'nobody signed in' rather than an error", async () => {
    vi.stubGlobal("fetch", vi.fn(async () => new Response(JSON.stringify({ error: { code: "unauthenticated", message: "Sign in." } }), { status: 401 })));
    await expect(fetchMe()).resolves.toBeNull();
  });

  it("returns the user when signed in and still throws other failures", async () => {
    vi.stubGlobal("fetch", vi.fn(async () => new Response(JSON.stringify({ user: ruth }), { status: 200 })));
    await expect(fetchMe()).resolves.toEqual(ruth);
    vi.stubGlobal("fetch", vi.fn(async () => new Response("", { status: 500 })));
    await expect(fetchMe()).rejects.toMatchObject({ status: 500 });
  });
});

describe("resetCacheForUser", () => {
  it("drops every other cached answer and tells mounted observers who is signed in now", () => {
    const queryClient = new QueryClient();
    queryClient.setQueryData(authQueryKeys.me(), ruth);
    queryClient.setQueryData(["me", "summary"], { role: "student", cohorts: [] });
    queryClient.setQueryData(["cohorts", 1], { name: "Autumn Forge Cohort" });

    // A component that is on screen while the user signs out (e.g. the page header).
    const observer = new QueryObserver(queryClient, { ...meQueryOptions(), enabled: false });
    const seen: unknown[] = [];
    const unsubscribe = observer.subscribe((result) => seen.push(result.data));

    resetCacheForUser(queryClient, null);

    expect(queryClient.getQueryData(["me", "summary"])).toBeUndefined();
    expect(queryClient.getQueryData(["cohorts", 1])).toBeUndefined();
    expect(queryClient.getQueryData(authQueryKeys.me())).toBeNull();
    // The observer saw the change without having to re-subscribe.
    expect(observer.getCurrentResult().data).toBeNull();
    expect(seen.at(-1)).toBeNull();
    unsubscribe();
  });
});
