/** The fetch wrapper: CSRF tokens on unsafe requests, one retry on a stale token, typed errors. */
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { api, ApiError, isApiError, resetCsrfToken } from "@/api/client";

interface Call {
  url: string;
  method: string;
  headers: Record<string, string>;
  body?: string;
  credentials?: RequestCredentials;
}

function jsonResponse(status: number, body?: unknown): Response {
  return new Response(body === undefined ? null : JSON.stringify(body), {
    status,
    headers: { "Content-Type": "application/json" },
  });
}

/** A scripted fetch: answers in order, records every call. */
function scriptFetch(answers: Array<(call: Call) => Response>) {
  const calls: Call[] = [];
  const fetchMock = vi.fn(async (url: string, init: RequestInit = {}) => {
    const call: Call = {
      url,
      method: init.method ?? "GET",
      headers: (init.headers ?? {}) as Record<string, string>,
      body: init.body as string | undefined,
      credentials: init.credentials,
    };
    calls.push(call);
    const answer = answers.shift();
    if (!answer) throw new Error(`unexpected request ${call.method} ${url}`);
    return answer(call);
  });
  vi.stubGlobal("fetch", fetchMock);
  return calls;
}

beforeEach(() => resetCsrfToken());
afterEach(() => vi.unstubAllGlobals());

describe("api client", () => {
  it("sends GETs without a CSRF token, with credentials, and returns the JSON body", async () => {
    const calls = scriptFetch([() => jsonResponse(200, { ok: true })]);
    await expect(api.get("/api/health")).resolves.toEqual({ ok: true });
    expect(calls).toHaveLength(1);
    expect(calls[0].headers["x-csrf-token"]).toBeUndefined();
    expect(calls[0].credentials).toBe("include");
  });

  it("fetches a CSRF token once and sends it on every unsafe request", async () => {
    const calls = scriptFetch([
      () => jsonResponse(200, { csrfToken: "t-1" }),
      () => jsonResponse(200, { user: { id: 1 } }),
      () => jsonResponse(204),
    ]);
    await api.post("/api/auth/login", { email: "a@b.test", password: "x" });
    await expect(api.post("/api/auth/logout")).resolves.toBeUndefined();

    expect(calls.map((c) => `${c.method} ${c.url}`)).toEqual([
      "GET /api/auth/csrf",
      "POST /api/auth/login",
      "POST /api/auth/logout",
    ]);
    expect(calls[1].headers["x-csrf-token"]).toBe("t-1");
    expect(calls[1].headers["Content-Type"]).toBe("application/json");
    expect(JSON.parse(calls[1].body!)).toEqual({ email: "a@b.test", password: "x" });
    expect(calls[2].headers["x-csrf-token"]).toBe("t-1");
  });

  it("refreshes a stale token and retries once after a 403 csrf_failed", async () => {
    const calls = scriptFetch([
      () => jsonResponse(200, { csrfToken: "old" }),
      () => jsonResponse(403, { error: { code: "csrf_failed", message: "Bad token." } }),
      () => jsonResponse(200, { csrfToken: "new" }),
      () => jsonResponse(204),
    ]);
    await api.post("/api/auth/password", { currentPassword: "a", newPassword: "b" });
    expect(calls).toHaveLength(4);
    expect(calls[1].headers["x-csrf-token"]).toBe("old");
    expect(calls[3].headers["x-csrf-token"]).toBe("new");
  });

  it("does not loop: a second csrf_failed is reported to the caller", async () => {
    scriptFetch([
      () => jsonResponse(200, { csrfToken: "old" }),
      () => jsonResponse(403, { error: { code: "csrf_failed", message: "Bad token." } }),
      () => jsonResponse(200, { csrfToken: "new" }),
      () => jsonResponse(403, { error: { code: "csrf_failed", message: "Still bad." } }),
    ]);
    await expect(api.post("/api/x")).rejects.toMatchObject({ status: 403, code: "csrf_failed", message: "Still bad." });
  });

  it("does not retry other 403s", async () => {
    const calls = scriptFetch([
      () => jsonResponse(200, { csrfToken: "t" }),
      () => jsonResponse(403, { error: { code: "forbidden", message: "Instructors only." } }),
    ]);
    await expect(api.post("/api/cohorts")).rejects.toMatchObject({ status: 403, code: "forbidden" });
    expect(calls).toHaveLength(2);
  });

  it("turns the server's error body into a typed ApiError with field messages", async () => {
    scriptFetch([
      () => jsonResponse(200, { csrfToken: "t" }),
      () =>
        jsonResponse(400, {
          error: { code: "validation_failed", message: "Check the form.", fields: { email: ["Enter a valid e-mail address."] } },
        }),
    ]);
    const error = await api.post("/api/auth/login", {}).catch((e: unknown) => e);
    expect(isApiError(error)).toBe(true);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 400, code: "validation_failed", fields: { email: ["Enter a valid e-mail address."] } });
  });

  it("gives a generic error for a non-JSON failure and a network_error when the server is unreachable", async () => {
    scriptFetch([() => new Response("<html>Bad gateway</html>", { status: 502 })]);
    await expect(api.get("/api/health")).rejects.toMatchObject({ status: 502, code: "internal_error" });

    vi.stubGlobal("fetch", vi.fn(async () => Promise.reject(new TypeError("Failed to fetch"))));
    await expect(api.get("/api/health")).rejects.toMatchObject({ status: 0, code: "network_error" });
  });
});
