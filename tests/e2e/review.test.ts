import { execFileSync } from "node:child_process";
import { mkdir, writeFile } from "node:fs/promises";
import path from "node:path";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD, demoPeople } from "../../server/db/seed/demo-lab";
import { DESKTOP, launchBrowser, PHONE, screenshot, SCREENSHOT_DIR, signInThroughForm, type Browser } from "../helpers/browser";
import { startE2eApp, type E2eApp } from "../helpers/e2e-app";

// The reviewer's journey in Debian's chromium against the real app, queue and worker: the demo
// lab's editor opts in to the "map finished" e-mail, replicates the demo rate map with a new
// seed, compares the two, opens the printable report, prints it to PDF (the settings table must
// be in the PDF's text, read with pdftotext), follows the e-mail's link, and imports the map's
// manifest (every cell from the cache).

const editor = demoPeople[1];
let app: E2eApp;
let browser: Browser;
let page: Page;
let rateId = "";
let replicateId = "";

async function mapStatus(id: string): Promise<{ status: string; title: string; cellsTotal: number; cellsFromCache: number }> {
  return (await page.request.get(`${app.baseUrl}/api/maps/${id}`)).json();
}

async function waitDone(id: string, timeoutMs = 180_000): Promise<void> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const m = await mapStatus(id);
    if (m.status === "done") return;
    if (m.status === "failed" || Date.now() > until) throw new Error(`map ${id} is ${m.status}`);
    await page.waitForTimeout(500);
  }
}

describe("review journey in chromium", () => {
  beforeAll(async () => {
    app = await startE2eApp({ worker: true });
    const seeded = await app.seedDemoMaps();
    rateId = seeded.find((m) => m.title.includes("rate network"))!.id;
    browser = await launchBrowser();
    page = await browser.newPage();
    await signInThroughForm(page, app.baseUrl, editor.email, DEMO_PASSWORD);
    // The field demo map would keep the one engine thread busy for a minute: stop it.
    const field = seeded.find((m) => m.title.includes("field network"))!.id;
    expect((await page.request.post(`${app.baseUrl}/api/maps/${field}/cancel`)).status()).toBe(200);
  });

  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("opts in to the map-finished e-mail on the account page", async () => {
    await page.getByRole("button", { name: "Account menu" }).click();
    await page.getByRole("menuitem", { name: "Account settings" }).click();
    await page.waitForURL("**/account");
    const box = page.getByRole("checkbox", { name: /E-mail me when a map finishes/ });
    const saved = page.waitForResponse((r) => r.url().endsWith("/api/account/preferences") && r.request().method() === "PATCH");
    await box.click(); // a controlled switch: it shows the new state once the cache updates
    expect((await saved).status()).toBe(200);
    await expect.poll(() => box.isChecked()).toBe(true);
    await screenshot(page, "review-account", [DESKTOP, PHONE]);
  });

  it("replicates the demo rate map with a new seed", async () => {
    await waitDone(rateId);
    await page.goto(`${app.baseUrl}/maps/${rateId}`);
    await page.getByRole("button", { name: "Replicate" }).click();
    const dialog = page.getByRole("dialog", { name: "Replicate with a new seed" });
    await expect.poll(() => dialog.isVisible()).toBe(true);
    await screenshot(page, "review-replicate-dialog", [DESKTOP, PHONE]);
    await dialog.getByRole("button", { name: "Launch replicate" }).click();
    await page.waitForURL((url) => /\/maps\/[0-9a-f-]{36}$/.test(url.pathname) && !url.pathname.endsWith(rateId));
    replicateId = page.url().split("/").pop()!;
    const replicate = await mapStatus(replicateId);
    expect(replicate.title).toMatch(/replicate, seed \d+/);
    await waitDone(replicateId);
  });

  it("compares the replicate with the original cell by cell", async () => {
    await page.reload();
    await page.getByRole("button", { name: "Compare" }).click();
    const dialog = page.getByRole("dialog", { name: "Compare with another map" });
    await dialog.getByRole("link", { name: /Leak against asymmetry.*original/ }).click();
    await page.waitForURL(`**/maps/${replicateId}/compare/${rateId}`);
    await expect.poll(() => page.getByText(/of 30 tested cells agree/).isVisible()).toBe(true);
    await expect.poll(() => page.getByRole("img", { name: /Difference of Stable states found/ }).isVisible()).toBe(true);
    await screenshot(page, "review-compare", [DESKTOP, PHONE]);
  });

  it("opens the report and prints it to a PDF that carries the settings table", async () => {
    await page.goto(`${app.baseUrl}/maps/${rateId}`);
    await page.getByRole("link", { name: "Report" }).click();
    await page.waitForURL(`**/maps/${rateId}/report`);
    await expect.poll(() => page.getByRole("heading", { name: "Settings" }).isVisible()).toBe(true);
    await expect.poll(() => page.getByText(/tested cells agree/).isVisible(), { timeout: 20_000 }).toBe(true);
    await screenshot(page, "review-report", [DESKTOP, PHONE]);
    await page.emulateMedia({ media: "print" });
    const pdf = await page.pdf({ format: "A4", printBackground: true });
    await page.emulateMedia({ media: "screen" });
    expect(pdf.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    await mkdir(SCREENSHOT_DIR, { recursive: true });
    const file = path.join(SCREENSHOT_DIR, "review-report.pdf");
    await writeFile(file, pdf);
    const text = execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
    for (const label of ["Software version", "Git commit", "Engine version", "Networks per cell", "Starts per network", "Base seed", "Integrator rtol / atol", "Verification", "Engine time of stored cells", "Boundary estimate", "Replication"]) {
      expect(text, `PDF text lacks "${label}"`).toContain(label);
    }
    expect(text).toContain("20261201"); // the demo rate map's base seed
    expect(text).not.toContain("Print or save as PDF"); // the toolbar stays off paper
  });

  it("e-mails the editor when the replicate is done, with a link that opens it", async () => {
    const until = Date.now() + 30_000;
    let mail = await app.lastMailTo(editor.email);
    while (!mail && Date.now() < until) {
      await page.waitForTimeout(300);
      mail = await app.lastMailTo(editor.email);
    }
    expect(mail?.subject).toMatch(/^Map finished: Leak against asymmetry/);
    const link = /(http:\/\/\S+\/maps\/[0-9a-f-]{36})/.exec(mail!.text)![1];
    expect(link).toBe(`${app.baseUrl}/maps/${replicateId}`);
    await page.goto(link);
    await expect.poll(() => page.getByRole("heading", { name: /replicate, seed/ }).isVisible()).toBe(true);
  });

  it("imports the original's manifest: every cell comes from the cache", async () => {
    const exported = await (await page.request.get(`${app.baseUrl}/api/maps/${rateId}/export.json`)).text();
    await page.goto(`${app.baseUrl}/maps/import`);
    await page.getByLabel(/or paste it/).fill(exported);
    await page.getByLabel("Title (optional)").fill("Imported leak sweep");
    await screenshot(page, "review-import", [DESKTOP, PHONE]);
    await page.getByRole("button", { name: "Create the map" }).click();
    await page.waitForURL((url) => /\/maps\/[0-9a-f-]{36}$/.test(url.pathname));
    const imported = await mapStatus(page.url().split("/").pop()!);
    expect(imported).toMatchObject({ title: "Imported leak sweep", status: "done", cellsTotal: 30, cellsFromCache: 30 });
    expect(browser.problems).toEqual([]);
  });
});
