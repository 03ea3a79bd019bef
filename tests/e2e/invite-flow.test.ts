import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { launchBrowser, screenshot, type Browser } from "../helpers/browser";
import { startE2eApp, type E2eApp } from "../helpers/e2e-app";

// The whole invitation journey in Debian's chromium against the real app and database:
// register → sign out → sign in → create a group → invite a second address → open the
// invitation link from the admin outbox → register as the second address → accept → the
// second account sees the group as a viewer.

const owner = { name: "Ines Varga", email: "ines.varga@fenwick-lab.example", password: "slow-manifold-41" };
const second = { name: "Teo Marchetti", email: "teo.marchetti@fenwick-lab.example", password: "saddle-node-2907" };
const groupName = "Fenwick rate-network club";

let app: E2eApp;
let browser: Browser;
let page: Page;

async function fillRegister(p: Page, person: { name: string; email?: string; password: string }) {
  await p.getByLabel("Name").fill(person.name);
  if (person.email) await p.getByLabel("E-mail").fill(person.email);
  await p.getByLabel("Password").fill(person.password);
  await p.getByRole("button", { name: "Create account" }).click();
}

async function signIn(p: Page, person: { email: string; password: string }) {
  await p.getByLabel("E-mail").fill(person.email);
  await p.getByLabel("Password").fill(person.password);
  await p.getByRole("button", { name: "Sign in" }).click();
}

async function signOut(p: Page) {
  await p.getByRole("button", { name: "Account menu" }).click();
  await p.getByRole("menuitem", { name: "Sign out" }).click();
  await p.waitForURL("**/sign-in");
}

describe("invitation journey in chromium", () => {
  beforeAll(async () => {
    app = await startE2eApp();
    browser = await launchBrowser();
    page = await browser.newPage();
  });

  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("sends a stranger to sign in, then registers the first account", async () => {
    await page.goto(`${app.baseUrl}/groups`);
    await page.waitForURL("**/sign-in?next=%2Fgroups");
    await screenshot(page, "flow-01-sign-in");
    await page.getByRole("link", { name: "Create an account" }).click();
    await fillRegister(page, owner);
    await page.waitForURL("**/groups");
    await expect.poll(() => page.getByRole("heading", { name: "Your groups" }).isVisible()).toBe(true);
  });

  it("signs out and back in (now a site admin, so the outbox is reachable)", async () => {
    await app.makeAdmin(owner.email);
    await signOut(page);
    await signIn(page, owner);
    await page.waitForURL(`${app.baseUrl}/`);
    await expect.poll(() => page.getByRole("heading", { name: "Welcome, Ines" }).isVisible()).toBe(true);
    await expect.poll(() => page.getByRole("navigation", { name: "Main" }).first().getByRole("link", { name: "Admin" }).isVisible()).toBe(true);
    await screenshot(page, "flow-02-home");
  });

  it("creates a group and invites a second address as viewer", async () => {
    await page.getByRole("navigation", { name: "Main" }).first().getByRole("link", { name: "Groups" }).click();
    await page.getByLabel("Group name").fill(groupName);
    await page.getByRole("button", { name: "Create group" }).click();
    await page.getByRole("link", { name: new RegExp(groupName) }).click();
    await expect.poll(() => page.getByRole("heading", { name: groupName, level: 1 }).isVisible()).toBe(true);
    await page.getByLabel("E-mail address").fill(second.email);
    await page.getByLabel("Role", { exact: true }).selectOption("viewer");
    await page.getByRole("button", { name: "Send invitation" }).click();
    const pending = page.getByRole("listitem").filter({ hasText: second.email });
    await expect.poll(() => pending.getByText("Viewer").isVisible()).toBe(true);
    await screenshot(page, "flow-03-group-detail");
  });

  it("opens the invitation link from the admin outbox", async () => {
    await page.getByRole("navigation", { name: "Main" }).first().getByRole("link", { name: "Admin" }).click();
    await page.getByRole("navigation", { name: "Administration" }).getByRole("link", { name: "Outbox" }).click();
    await page.getByRole("link", { name: new RegExp(`Invitation to ${groupName}`) }).click();
    const mail = page.getByRole("article", { name: `E-mail: Invitation to ${groupName} on Equilibrist` });
    await expect.poll(() => mail.isVisible()).toBe(true);
    await screenshot(page, "flow-04-outbox");
    await mail.getByRole("link", { name: /\/invites\// }).click();
    await page.waitForURL("**/invites/**");
    await expect.poll(() => page.getByRole("heading", { name: "You are invited" }).isVisible()).toBe(true);
    // Signed in as the owner, the page says the invitation belongs to another address.
    await expect.poll(() => page.getByText(`This invitation was sent to ${second.email}.`, { exact: false }).isVisible()).toBe(true);
  });

  it("registers the second address from the invitation and accepts it", async () => {
    const invitationUrl = page.url();
    await page.getByRole("button", { name: "Switch account" }).click();
    await page.waitForURL("**/sign-in?**");
    await page.getByRole("link", { name: "Create an account" }).click();
    await page.waitForURL("**/register?**");
    expect(await page.getByLabel("E-mail").inputValue()).toBe(second.email);
    await fillRegister(page, { name: second.name, password: second.password });
    await page.waitForURL(invitationUrl);
    await screenshot(page, "flow-05-invitation");
    await page.getByRole("button", { name: `Accept and join ${groupName}` }).click();
    await page.waitForURL("**/groups/**");
    await expect.poll(() => page.getByRole("heading", { name: groupName, level: 1 }).isVisible()).toBe(true);
  });

  it("shows the group to the second account as a viewer", async () => {
    const header = page.locator("main").getByText("Your role");
    await expect.poll(() => header.isVisible()).toBe(true);
    const members = page.getByRole("listitem").filter({ hasText: second.name });
    await expect.poll(() => members.getByText("Viewer").isVisible()).toBe(true);
    // A viewer gets no invite form.
    expect(await page.getByRole("button", { name: "Send invitation" }).count()).toBe(0);
    await screenshot(page, "flow-06-viewer");
    await page.getByRole("navigation", { name: "Main" }).first().getByRole("link", { name: "Groups" }).click();
    const card = page.getByRole("link", { name: new RegExp(groupName) });
    await expect.poll(() => card.getByText("Viewer").isVisible()).toBe(true);
    expect(browser.problems).toEqual([]);
  });
});
