// @vitest-environment jsdom
import { cleanup, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { renderApp, routeFetchTo, useServedClient } from "../helpers/client-harness";
import { newPerson, signedInPerson } from "../helpers/test-app";

// The signed-out pages against the real server: redirects, client-side validation with the
// shared zod schemas, and server answers shown where the person looks.

const served = useServedClient();

describe("sign-in guard", () => {
  it("sends a signed-out visitor of /groups to sign in, remembering where they were going", async () => {
    routeFetchTo(served.app.baseUrl);
    const view = renderApp("/groups");
    expect(await screen.findByRole("heading", { name: "Sign in" })).toBeTruthy();
    expect(view.location().pathname).toBe("/sign-in");
    expect(view.location().search).toBe("?next=%2Fgroups");
  });

  it("returns to the remembered page after signing in", async () => {
    const person = await signedInPerson(served.app, "guard");
    await person.client.post("/api/auth/logout");
    routeFetchTo(served.app.baseUrl);
    const view = renderApp("/sign-in?next=%2Fgroups");
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText("E-mail"), person.email);
    await user.type(screen.getByLabelText("Password"), person.password);
    await user.click(screen.getByRole("button", { name: "Sign in" }));
    expect(await screen.findByRole("heading", { name: "Your groups" })).toBeTruthy();
    expect(view.location().pathname).toBe("/groups");
  });

  it("ignores a next= that points off the site", async () => {
    const person = await signedInPerson(served.app, "offsite");
    routeFetchTo(served.app.baseUrl, person.client.jar);
    const view = renderApp("/sign-in?next=%2F%2Fevil.example%2F");
    // Already signed in: the sign-in loader forwards to the safe fallback, home.
    expect(await screen.findByRole("heading", { name: /^Welcome/ })).toBeTruthy();
    expect(view.location().pathname).toBe("/");
  });
});

describe("register", () => {
  it("shows the shared schema's messages before sending anything", async () => {
    routeFetchTo(served.app.baseUrl);
    renderApp("/register");
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText("E-mail"), "not-an-address");
    await user.type(screen.getByLabelText("Password"), "short");
    await user.click(screen.getByRole("button", { name: "Create account" }));
    // Messages from shared/schemas/auth.ts and common.ts.
    expect(await screen.findByText("Enter your name")).toBeTruthy();
    expect(screen.getByText("Enter a valid e-mail address")).toBeTruthy();
    expect(screen.getByText("At least 10 characters")).toBeTruthy();
    expect(screen.getByLabelText("Password").getAttribute("aria-invalid")).toBe("true");
  });

  it("creates the account, signs it in and lands on home", async () => {
    routeFetchTo(served.app.baseUrl);
    const person = newPerson("reg");
    const view = renderApp("/register");
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText("Name"), "Maren Quist");
    await user.type(screen.getByLabelText("E-mail"), person.email);
    await user.type(screen.getByLabelText("Password"), person.password);
    await user.click(screen.getByRole("button", { name: "Create account" }));
    expect(await screen.findByRole("heading", { name: "Welcome, Maren" })).toBeTruthy();
    expect(view.location().pathname).toBe("/");
    const me = await served.app.client().post("/api/auth/login", { email: person.email, password: person.password });
    expect(me.status).toBe(200);
  });

  it("puts the server's duplicate-address answer on the form", async () => {
    const existing = await signedInPerson(served.app, "dup");
    routeFetchTo(served.app.baseUrl);
    renderApp("/register");
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText("Name"), "Second Try");
    await user.type(screen.getByLabelText("E-mail"), existing.email);
    await user.type(screen.getByLabelText("Password"), "another-long-password");
    await user.click(screen.getByRole("button", { name: "Create account" }));
    const alerts = await screen.findAllByRole("alert");
    expect(alerts.map((a) => a.textContent).join(" ")).toMatch(/already/i);
  });
});

describe("sign in with a wrong password", () => {
  it("says so without revealing whether the account exists", async () => {
    const person = await signedInPerson(served.app, "wrongpw");
    routeFetchTo(served.app.baseUrl);
    renderApp("/sign-in");
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText("E-mail"), person.email);
    await user.type(screen.getByLabelText("Password"), "definitely-not-it");
    await user.click(screen.getByRole("button", { name: "Sign in" }));
    const wrong = (await screen.findByRole("alert")).textContent;
    expect(wrong).toMatch(/wrong/i);
    cleanup();
    renderApp("/sign-in");
    await user.type(await screen.findByLabelText("E-mail"), "nobody-here@lab.example");
    await user.type(screen.getByLabelText("Password"), "definitely-not-it");
    await user.click(screen.getByRole("button", { name: "Sign in" }));
    await waitFor(() => expect(screen.getByRole("alert").textContent).toBe(wrong));
  });
});

describe("password reset", () => {
  it("asks for the e-mailed link when /reset has no token", async () => {
    routeFetchTo(served.app.baseUrl);
    renderApp("/reset");
    expect(await screen.findByText(/needs the link from your reset e-mail/)).toBeTruthy();
  });

  it("requests a link, then sets a new password with the token from the outbox", async () => {
    const person = await signedInPerson(served.app, "reset");
    routeFetchTo(served.app.baseUrl);
    renderApp("/forgot-password");
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText("E-mail"), person.email);
    await user.click(screen.getByRole("button", { name: "Send reset link" }));
    expect(await screen.findByText(/a reset link is on its way/)).toBeTruthy();
    const mail = await served.app.lastMailTo(person.email);
    const link = /\/reset\?token=[^\s]+/.exec(mail.text)?.[0];
    expect(link).toBeTruthy();
    cleanup();
    const view = renderApp(link!);
    await user.type(await screen.findByLabelText("New password"), "a-brand-new-password");
    await user.click(screen.getByRole("button", { name: "Set new password" }));
    await waitFor(() => expect(view.location().pathname).toBe("/sign-in"));
    const login = await served.app.client().post("/api/auth/login", { email: person.email, password: "a-brand-new-password" });
    expect(login.status).toBe(200);
  });
});
