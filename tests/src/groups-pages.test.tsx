// @vitest-environment jsdom
import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { renderApp, routeFetchTo, useServedClient } from "../helpers/client-harness";
import { signedInPerson, tokenFromMail } from "../helpers/test-app";

// Group pages against the real server: create, invite, roles as each member sees them,
// the invitation page signed out and signed in, and a group that is not yours.

const served = useServedClient();

async function groupWithViewer() {
  const owner = await signedInPerson(served.app, "owner");
  const viewer = await signedInPerson(served.app, "viewer");
  const created = await owner.client.post("/api/groups", { name: "Hollow basin reading group" });
  const groupId = created.body.id as string;
  await owner.client.post(`/api/groups/${groupId}/invites`, { email: viewer.email, role: "viewer" });
  const token = tokenFromMail((await served.app.lastMailTo(viewer.email)).text, "invite");
  await viewer.client.post(`/api/invites/${token}/accept`);
  return { owner, viewer, groupId };
}

describe("groups list", () => {
  it("shows the empty state, then the group just created", async () => {
    const person = await signedInPerson(served.app, "lister");
    routeFetchTo(served.app.baseUrl, person.client.jar);
    renderApp("/groups");
    expect(await screen.findByText("No groups yet")).toBeTruthy();
    const user = userEvent.setup();
    await user.type(screen.getByLabelText("Group name"), "Ridge and saddle seminar");
    await user.click(screen.getByRole("button", { name: "Create group" }));
    const card = await screen.findByRole("link", { name: /Ridge and saddle seminar/ });
    expect(within(card).getByText("Owner")).toBeTruthy();
    expect(within(card).getByText(/1 member/)).toBeTruthy();
  });

  it("rejects an empty name with the shared schema's message", async () => {
    const person = await signedInPerson(served.app, "blank");
    routeFetchTo(served.app.baseUrl, person.client.jar);
    renderApp("/groups");
    const user = userEvent.setup();
    await user.click(await screen.findByRole("button", { name: "Create group" }));
    expect(await screen.findByText("Enter a group name")).toBeTruthy(); // shared/schemas/groups.ts
  });
});

describe("group detail", () => {
  it("lets the owner invite, and lists the pending invitation", async () => {
    const { owner, groupId } = await groupWithViewer();
    routeFetchTo(served.app.baseUrl, owner.client.jar);
    renderApp(`/groups/${groupId}`);
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText("E-mail address"), "newcomer@lab.example");
    await user.selectOptions(screen.getByLabelText("Role"), "editor");
    await user.click(screen.getByRole("button", { name: "Send invitation" }));
    const pending = await screen.findByText("newcomer@lab.example");
    const row = pending.closest("li")!;
    expect(within(row).getByText("Editor")).toBeTruthy();
    expect((await served.app.lastMailTo("newcomer@lab.example")).subject).toMatch(/Hollow basin reading group/);
  });

  it("changes a member's role through the owner's picker", async () => {
    const { owner, viewer, groupId } = await groupWithViewer();
    routeFetchTo(served.app.baseUrl, owner.client.jar);
    renderApp(`/groups/${groupId}`);
    const user = userEvent.setup();
    await user.selectOptions(await screen.findByLabelText(`Role of ${viewer.name}`), "editor");
    await waitFor(async () => {
      const detail = await owner.client.get(`/api/groups/${groupId}`);
      expect(detail.body.members.find((m: { userId: string }) => m.userId === viewer.id).role).toBe("editor");
    });
  });

  it("shows a viewer the members but no invite form or role pickers", async () => {
    const { viewer, owner, groupId } = await groupWithViewer();
    routeFetchTo(served.app.baseUrl, viewer.client.jar);
    renderApp(`/groups/${groupId}`);
    expect(await screen.findByRole("heading", { name: "Hollow basin reading group", level: 1 })).toBeTruthy();
    expect(screen.getByText(owner.name)).toBeTruthy();
    expect(screen.queryByRole("button", { name: "Send invitation" })).toBeNull();
    expect(screen.queryByLabelText(`Role of ${owner.name}`)).toBeNull();
    expect(screen.getByText(/Viewers read the group's maps/)).toBeTruthy();
  });

  it("answers someone else's group with the not-found page inside the shell", async () => {
    const { groupId } = await groupWithViewer();
    const stranger = await signedInPerson(served.app, "stranger");
    routeFetchTo(served.app.baseUrl, stranger.client.jar);
    renderApp(`/groups/${groupId}`);
    expect(await screen.findByText("Nothing here")).toBeTruthy();
    expect(screen.getAllByRole("navigation", { name: "Main" }).length).toBeGreaterThan(0);
  });

  it("leaves the group and returns to the list", async () => {
    const { viewer, groupId } = await groupWithViewer();
    routeFetchTo(served.app.baseUrl, viewer.client.jar);
    const view = renderApp(`/groups/${groupId}`);
    const user = userEvent.setup();
    await user.click(await screen.findByRole("button", { name: "Leave group" }));
    await user.click(screen.getByRole("button", { name: "Leave" }));
    await waitFor(() => expect(view.location().pathname).toBe("/groups"));
    expect(await screen.findByText("No groups yet")).toBeTruthy();
  });
});

describe("invitation page", () => {
  async function pendingInvite() {
    const owner = await signedInPerson(served.app, "inviter");
    const created = await owner.client.post("/api/groups", { name: "Limit cycle lunch" });
    await owner.client.post(`/api/groups/${created.body.id}/invites`, { email: "guest@lab.example", role: "viewer" });
    return tokenFromMail((await served.app.lastMailTo("guest@lab.example")).text, "invite");
  }

  it("offers sign-in and registration to a signed-out visitor, coming back afterwards", async () => {
    const token = await pendingInvite();
    routeFetchTo(served.app.baseUrl);
    renderApp(`/invites/${token}`);
    expect(await screen.findByText("Limit cycle lunch")).toBeTruthy();
    const signIn = screen.getByRole("link", { name: "Sign in to accept" });
    const href = new URL(signIn.getAttribute("href")!, "http://x");
    expect(href.pathname).toBe("/sign-in");
    expect(href.searchParams.get("next")).toBe(`/invites/${token}`);
    expect(href.searchParams.get("email")).toBe("guest@lab.example");
  });

  it("warns a signed-in account whose address differs", async () => {
    const token = await pendingInvite();
    const other = await signedInPerson(served.app, "other");
    routeFetchTo(served.app.baseUrl, other.client.jar);
    renderApp(`/invites/${token}`);
    expect(await screen.findByText(/This invitation was sent to guest@lab.example/)).toBeTruthy();
    expect(screen.getByRole("button", { name: "Switch account" })).toBeTruthy();
  });

  it("shows a broken link as not found", async () => {
    routeFetchTo(served.app.baseUrl);
    renderApp(`/invites/${"x".repeat(32)}`);
    expect(await screen.findByText("Nothing here")).toBeTruthy();
  });
});
