// @vitest-environment jsdom
import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { renderApp, routeFetchTo, useServedClient } from "../helpers/client-harness";
import { signedInPerson } from "../helpers/test-app";

// Admin pages against the real server: who may enter, site roles, and the outbox reader.

const served = useServedClient();

async function admin() {
  const person = await signedInPerson(served.app, "admin");
  await served.app.makeAdmin(person.email);
  return person;
}

describe("admin area", () => {
  it("refuses a member with the 403 page and hides the Admin tab", async () => {
    const member = await signedInPerson(served.app, "member");
    routeFetchTo(served.app.baseUrl, member.client.jar);
    renderApp("/admin/users");
    expect(await screen.findByText("Not for this account")).toBeTruthy();
    const nav = screen.getAllByRole("navigation", { name: "Main" })[0];
    expect(within(nav).queryByRole("link", { name: "Admin" })).toBeNull();
  });

  it("lists accounts, searches them, and changes a site role", async () => {
    const boss = await admin();
    const member = await signedInPerson(served.app, "promotee");
    routeFetchTo(served.app.baseUrl, boss.client.jar);
    const view = renderApp("/admin");
    expect(await screen.findByRole("heading", { name: "Site administration" })).toBeTruthy();
    expect(view.location().pathname).toBe("/admin/users");
    const user = userEvent.setup();
    await user.type(screen.getByLabelText("Search users"), `${member.email}{Enter}`);
    await waitFor(() => expect(view.location().search).toContain("q="));
    await user.selectOptions(await screen.findByLabelText(`Site role of ${member.name}`), "admin");
    await waitFor(async () => {
      const login = await served.app.client().post("/api/auth/login", { email: member.email, password: member.password });
      expect(login.body.siteRole).toBe("admin");
    });
  });

  it("opens an outbox e-mail and makes its link clickable", async () => {
    const boss = await admin();
    await served.app.client().post("/api/auth/forgot", { email: boss.email });
    routeFetchTo(served.app.baseUrl, boss.client.jar);
    renderApp("/admin/outbox");
    expect(await screen.findByText("Pick an e-mail to read it")).toBeTruthy();
    const user = userEvent.setup();
    await user.click(screen.getByRole("link", { name: /Reset your Equilibrist password/ }));
    const article = await screen.findByRole("article", { name: /E-mail: Reset your Equilibrist password/ });
    const link = within(article).getByRole("link", { name: /\/reset\?token=/ });
    expect(new URL(link.getAttribute("href")!).pathname).toBe("/reset");
    expect(within(article).getByText(boss.email)).toBeTruthy();
  });
});
