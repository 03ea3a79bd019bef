import { readFile } from "node:fs/promises";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD, demoPeople } from "../../server/db/seed/demo-lab";
import { launchBrowser, screenshot, signInThroughForm, type Browser } from "../helpers/browser";
import { startE2eApp, type E2eApp } from "../helpers/e2e-app";

// The map journey in Debian's chromium against the real app, queue and an in-process worker:
// sign in with a demo account → create a small map → watch cells fill in live (no reload) →
// open a cell → export CSV (header and row count) and SVG → share by link → open the link
// signed out.

const editor = demoPeople[1]; // a member (not an admin): member limits apply
const title = "Marsh basin sweep";
const MU_STEPS = 3;
const TAU_STEPS = 3;

let app: E2eApp;
let browser: Browser;
let page: Page;
let mapUrl = "";
let shareLink = "";

const pendingCells = (p: Page) => p.getByRole("button", { name: /^μ .*, τ .*: pending$/ }).count();
const allCells = (p: Page) => p.getByRole("button", { name: /^μ .*, τ .*: / }).count();

async function setNumber(p: Page, label: string, value: string, nth = 0) {
  const input = p.getByLabel(label, { exact: true }).nth(nth);
  await input.fill(value);
}

describe("map journey in chromium", () => {
  beforeAll(async () => {
    app = await startE2eApp({ worker: true });
    await app.seedDemo();
    browser = await launchBrowser();
    page = await browser.newPage();
  });

  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it("signs in with a demo account and opens the new-map form from home", async () => {
    await signInThroughForm(page, app.baseUrl, editor.email, DEMO_PASSWORD);
    await page.getByRole("link", { name: "New map" }).first().click();
    await page.waitForURL("**/maps/new");
    await expect.poll(() => page.getByRole("heading", { name: "New map", level: 1 }).isVisible()).toBe(true);
  });

  it("fills the form, sees the estimate and launches", async () => {
    await page.getByLabel("Title").fill(title);
    // N = 32 with 4 networks × 8 starts keeps each cell around a second on one engine thread,
    // long enough to watch the grid fill while the page is open.
    await setNumber(page, "Units N", "32");
    await setNumber(page, "Steps", String(MU_STEPS), 0);
    await setNumber(page, "Steps", String(TAU_STEPS), 1);
    await setNumber(page, "Networks per cell K", "4");
    await setNumber(page, "Starts per network S", "8");
    const panel = page.getByLabel("Cost estimate");
    await expect.poll(() => panel.getByText("Cells to compute").isVisible(), { timeout: 15_000 }).toBe(true);
    await expect.poll(() => panel.getByText(`${MU_STEPS} × ${TAU_STEPS} grid · 32 runs per cell`).isVisible()).toBe(true);
    await screenshot(page, "maps-01-new-map");
    await page.getByRole("button", { name: "Launch map" }).click();
    await page.waitForURL(/\/maps\/[0-9a-f-]{36}$/);
    mapUrl = page.url();
    await expect.poll(() => page.getByRole("heading", { name: title, level: 1 }).isVisible()).toBe(true);
  });

  it("fills cells in live while the page stays open", async () => {
    await page.evaluate(() => ((window as unknown as { stayedOpen: boolean }).stayedOpen = true));
    await expect.poll(() => allCells(page)).toBe(MU_STEPS * TAU_STEPS);
    const before = await pendingCells(page);
    expect(before).toBeGreaterThan(0);
    await expect.poll(() => pendingCells(page), { timeout: 60_000 }).toBeLessThan(before);
    await screenshot(page, "maps-02-filling");
    await expect.poll(() => pendingCells(page), { timeout: 120_000, interval: 500 }).toBe(0);
    await expect.poll(() => page.getByText(`${MU_STEPS * TAU_STEPS} of ${MU_STEPS * TAU_STEPS} cells`, { exact: true }).isVisible()).toBe(true);
    // Same document all along: the cells arrived over the event stream, not by reloading.
    expect(await page.evaluate(() => (window as unknown as { stayedOpen?: boolean }).stayedOpen)).toBe(true);
    await screenshot(page, "maps-03-done");
  });

  it("opens a cell with its networks, equilibria and run classes", async () => {
    await page.getByRole("button", { name: /^μ .*, τ .*: Stable states found/ }).first().click();
    await page.waitForURL(/\/cells\/0\/0$/);
    await expect.poll(() => page.getByRole("heading", { name: "Equilibria per network" }).isVisible()).toBe(true);
    await expect.poll(() => page.getByRole("heading", { name: "What the runs did" }).isVisible()).toBe(true);
    await screenshot(page, "maps-04-cell");
    await page.goBack();
    await page.waitForURL(mapUrl);
  });

  it("exports the data as CSV and the figure as SVG and PNG", async () => {
    const csvDownload = page.waitForEvent("download");
    await page.getByRole("link", { name: "Data CSV" }).click();
    const csv = await readFile((await (await csvDownload).path())!, "utf8");
    const lines = csv.trim().split(/\r?\n/).filter((l) => !l.startsWith("#"));
    expect(lines[0].startsWith("i,j,mu,tau,m,state,from_cache,networks,starts,stable_found")).toBe(true); // server/modules/maps/maps.export.ts csvColumns
    expect(lines).toHaveLength(1 + MU_STEPS * TAU_STEPS);
    expect(csv).toMatch(new RegExp(`^# Equilibrist map export: ${title}`));

    const svgDownload = page.waitForEvent("download");
    await page.getByRole("button", { name: "Figure SVG" }).click();
    const svg = await readFile((await (await svgDownload).path())!, "utf8");
    expect(svg.startsWith('<?xml version="1.0" encoding="UTF-8"?>')).toBe(true);
    expect(svg).toContain("<svg");
    expect(svg).toContain(title);
    expect(svg).toContain("relaxation rate μ");
    expect(svg).toContain("lower bound: more starts can only find more");
    expect(svg).not.toContain("tabindex");

    const pngDownload = page.waitForEvent("download");
    await page.getByRole("button", { name: "Figure PNG" }).click();
    const png = await readFile((await (await pngDownload).path())!);
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]); // PNG signature (RFC 2083 §3.1)
    expect(png.readUInt32BE(16)).toBeGreaterThan(1000); // IHDR width: the figure drawn at twice its size
  });

  it("shares the map by a read-only link", async () => {
    await page.getByRole("button", { name: "Share" }).click();
    const dialog = page.getByRole("dialog", { name: "Share this map" });
    await dialog.getByLabel("Anyone with the link").check();
    await dialog.getByRole("button", { name: "Save and create link" }).click();
    const link = dialog.getByLabel("Read-only link", { exact: true });
    await expect.poll(() => link.isVisible(), { timeout: 10_000 }).toBe(true);
    shareLink = await link.inputValue();
    expect(shareLink).toMatch(new RegExp(`^${app.baseUrl}/s/[A-Za-z0-9_-]+$`));
    await screenshot(page, "maps-05-share");
    await dialog.getByRole("button", { name: "Close" }).first().click();
  });

  it("opens the link signed out, read-only", async () => {
    await page.evaluate(() => fetch("/api/auth/logout", { method: "POST" }));
    await page.goto(shareLink);
    await expect.poll(() => page.getByRole("heading", { name: title, level: 1 }).isVisible()).toBe(true);
    await expect.poll(() => page.getByText("Shared with you").isVisible()).toBe(true);
    expect(await allCells(page)).toBe(MU_STEPS * TAU_STEPS);
    expect(await page.getByRole("button", { name: "Share" }).count()).toBe(0);
    expect(await page.getByRole("link", { name: "Sign in" }).isVisible()).toBe(true);
    await page.getByRole("button", { name: /^μ .*, τ .*: Stable states found/ }).first().click();
    await expect.poll(() => page.getByRole("heading", { name: "Equilibria per network" }).isVisible()).toBe(true);
    await screenshot(page, "maps-06-shared-signed-out");
    expect(browser.problems).toEqual([]);
  });
});
