// @vitest-environment jsdom
import { render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useForm } from "react-hook-form";
import { describe, expect, it } from "vitest";
import { apiPaths, type Register } from "../../shared/schemas";
import { api, ApiError } from "../../src/lib/api-client";
import { applyServerError } from "../../src/lib/form-errors";
import { safeNext, withNext } from "../../src/lib/safe-next";
import { routeFetchTo, useServedClient } from "../helpers/client-harness";

// The client's request layer and form error mapping, fed by real answers of the real server.

const served = useServedClient();

async function failure(promise: Promise<unknown>): Promise<ApiError> {
  const error = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(ApiError);
  return error as ApiError;
}

describe("api-client", () => {
  it("turns the server's error body into a typed ApiError", async () => {
    routeFetchTo(served.app.baseUrl);
    const unauth = await failure(api.get(apiPaths.auth.me));
    expect([unauth.status, unauth.code]).toEqual([401, "UNAUTHENTICATED"]);
    const missing = await failure(api.get("/api/no-such-route"));
    expect([missing.status, missing.code]).toEqual([404, "NOT_FOUND"]);
  });

  it("carries 422 field issues with dotted paths", async () => {
    routeFetchTo(served.app.baseUrl);
    const invalid = await failure(api.post(apiPaths.auth.register, { email: "nope", password: "x", name: "" }));
    expect(invalid.status).toBe(422);
    expect(invalid.issues.map((i) => i.path).sort((a, b) => a.localeCompare(b))).toEqual(["email", "name", "password"]);
  });

  it("reports an unreachable server as a network failure, not a crash", async () => {
    routeFetchTo("http://127.0.0.1:9"); // port 9 (discard) has no listener here
    const offline = await failure(api.get(apiPaths.health));
    expect([offline.status, offline.code]).toEqual([0, "network"]);
  });
});

/** A form that, like the app's forms, meets a server failure while submitting. */
function ServerErrorForm({ error }: { error: unknown }) {
  const form = useForm<Register>();
  const { errors } = form.formState;
  const submit = form.handleSubmit(async () => applyServerError(error, form.setError, ["email", "password"]));
  return (
    <form onSubmit={submit}>
      <input {...form.register("email")} aria-label="email" />
      <input {...form.register("password")} aria-label="password" />
      <p data-testid="email">{errors.email?.message}</p>
      <p data-testid="password">{errors.password?.message}</p>
      <p data-testid="root">{errors.root?.message}</p>
      <button type="submit">Send</button>
    </form>
  );
}

describe("applyServerError", () => {
  it("puts a real 422's issues on their fields and the rest on the form", async () => {
    routeFetchTo(served.app.baseUrl);
    const invalid = await failure(api.post(apiPaths.auth.register, { email: "nope", password: "x", name: "" }));
    render(<ServerErrorForm error={invalid} />);
    await userEvent.click(screen.getByRole("button", { name: "Send" }));
    const byPath = Object.fromEntries(invalid.issues.map((i) => [i.path, i.message]));
    await waitFor(() => expect(screen.getByTestId("email").textContent).toBe(byPath.email));
    expect(screen.getByTestId("password").textContent).toBe(byPath.password);
    // "name" has no field in this form, so its message goes to the form level.
    expect(screen.getByTestId("root").textContent).toBe(byPath.name);
  });

  it("puts the duplicate-address answer (409 with an e-mail issue) on the e-mail field", async () => {
    routeFetchTo(served.app.baseUrl);
    const person = { email: "twice@lab.example", password: "long-enough-password", name: "Twice" };
    await api.post(apiPaths.auth.register, person);
    const conflict = await failure(api.post(apiPaths.auth.register, person));
    expect(conflict.status).toBe(409);
    render(<ServerErrorForm error={conflict} />);
    await userEvent.click(screen.getByRole("button", { name: "Send" }));
    const onEmail = conflict.issues.find((i) => i.path === "email")?.message;
    expect(onEmail).toBeTruthy();
    await waitFor(() => expect(screen.getByTestId("email").textContent).toBe(onEmail));
    expect(screen.getByTestId("root").textContent).toBe("");
  });

  it("puts an answer without issues (401 wrong password) on the form", async () => {
    routeFetchTo(served.app.baseUrl);
    const wrong = await failure(api.post(apiPaths.auth.login, { email: "nobody@lab.example", password: "whatever-it-is" }));
    expect([wrong.status, wrong.issues]).toEqual([401, []]);
    render(<ServerErrorForm error={wrong} />);
    await userEvent.click(screen.getByRole("button", { name: "Send" }));
    await waitFor(() => expect(screen.getByTestId("root").textContent).toBe(wrong.message));
    expect(screen.getByTestId("email").textContent).toBe("");
  });
});

describe("safeNext", () => {
  it("accepts in-app paths and refuses anything that leaves the site", () => {
    expect(safeNext("?next=%2Fgroups%2Fabc%3Ftab%3D1")).toBe("/groups/abc?tab=1");
    for (const bad of ["//evil.example", "https://evil.example/", "/\\evil.example", "groups", ""]) {
      expect(safeNext(`?next=${encodeURIComponent(bad)}`)).toBe("/");
    }
  });

  it("round-trips through withNext, with the e-mail to prefill", () => {
    const link = withNext("/sign-in", "/invites/tok", "a+b@lab.example");
    const params = new URL(link, "http://x").searchParams;
    expect(safeNext(params)).toBe("/invites/tok");
    expect(params.get("email")).toBe("a+b@lab.example");
    expect(withNext("/sign-in", "/")).toBe("/sign-in");
  });
});
