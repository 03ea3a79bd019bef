import { cleanup, configure, render } from "@testing-library/react";
import { createMemoryRouter, RouterProvider } from "react-router-dom";
import { AppProvider, createAppQueryClient } from "../../src/app/provider";
import { createRoutes } from "../../src/app/router";
import { resetToasts } from "../../src/lib/toast-store";
import { afterAll, afterEach, beforeAll } from "vitest";
import { startTestApp, type TestApp, type TestAppOptions } from "./test-app";

const nodeFetch = globalThis.fetch;

// Every page here waits on the real server, and password hashing (argon2id) on a busy 2-core
// machine can take more than the default 1 s of findBy*/waitFor.
configure({ asyncUtilTimeout: 10_000 });

/**
 * Points the client's relative `fetch("/api/…")` calls at a real test server, carrying a
 * cookie jar the way a browser profile does. Share a jar with a tests/helpers/http-client
 * TestClient (`client.jar`) to start the page signed in as that person. Returns the undo.
 */
export function routeFetchTo(baseUrl: string, jar: Map<string, string> = new Map()): () => void {
  globalThis.fetch = async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const url = new URL(typeof input === "string" ? input : input instanceof URL ? input.href : input.url, baseUrl);
    const headers = new Headers(init.headers);
    if (jar.size > 0) headers.set("cookie", [...jar].map(([k, v]) => `${k}=${v}`).join("; "));
    const response = await nodeFetch(url, { ...init, headers });
    for (const line of response.headers.getSetCookie()) {
      const [pair, ...attrs] = line.split(";");
      const eq = pair.indexOf("=");
      const name = pair.slice(0, eq).trim();
      const value = pair.slice(eq + 1).trim();
      if (!value || attrs.some((a) => /^\s*expires=thu, 01 jan 1970/i.test(a))) jar.delete(name);
      else jar.set(name, value);
    }
    return response;
  };
  return () => {
    globalThis.fetch = nodeFetch;
  };
}

/**
 * Renders the whole client (real routes, loaders and providers) at `path` in a memory router
 * with a fresh QueryClient that never retries.
 */
export function renderApp(path: string) {
  resetToasts();
  const queryClient = createAppQueryClient({ retry: false });
  const router = createMemoryRouter(createRoutes(queryClient), { initialEntries: [path] });
  const view = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...view, router, queryClient, location: () => router.state.location };
}

/**
 * The real test server for a file of client route tests: started before its tests, stopped
 * after them; after each test the rendered tree is unmounted and `fetch` goes back to Node's
 * own (undoing any routeFetchTo). Read `served.app` inside tests.
 */
export function useServedClient(options?: TestAppOptions): { readonly app: TestApp } {
  let app: TestApp | undefined;
  beforeAll(async () => {
    app = await startTestApp(options);
  });
  afterAll(async () => {
    await app?.stop();
  });
  afterEach(() => {
    cleanup();
    globalThis.fetch = nodeFetch;
  });
  return {
    get app() {
      if (!app) throw new Error("the test server is not running (use served.app inside a test)");
      return app;
    },
  };
}
