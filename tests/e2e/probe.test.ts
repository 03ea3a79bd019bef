import { readFile } from "node:fs/promises";
import path from "node:path";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD, demoPeople } from "../../server/db/seed/demo-lab";
import { DESKTOP, launchBrowser, PHONE, screenshot, signInThroughForm, type Browser } from "../helpers/browser";
import { startE2eApp, type E2eApp } from "../helpers/e2e-app";

// The probe journey in Debian's chromium against the real app, queue and an in-process worker:
// sign in → upload tests/fixtures/probes/probe-40.npy (numpy-written) → see N, ĝ, τ̂ and the 40
// eigenvalues against the ellipse → place it on a small rate map → run the equilibrium search
// and watch it finish → download one equilibrium as CSV and check it.

const editor = demoPeople[1];
const FIXTURE = path.resolve(import.meta.dirname, "../fixtures/probes/probe-40.npy");
const SHOTS = [DESKTOP, PHONE];

let app: E2eApp;
let browser: Browser;
let page: Page;

/** A small rate map (g = 1) through the API of the running app; the in-process worker fills it. */
async function createRateMap(p: Page): Promise<string> {
  const body = {
    title: "Leak sweep for the probe",
    ensemble: "rate",
    settings: { N: 10, g: 1, nonlinearity: "tanh", input: 0 },
    mu: { min: 0.4, max: 1.6, steps: 4, scale: "linear" },
    tau: { min: 0, max: 1, steps: 3, scale: "linear" },
    budget: { networks: 2, starts: 4, tMax: 60 },
    seed: 3,
    visibility: "private",
  };
  const res = await p.evaluate(async (b) => {
    const r = await fetch("/api/maps", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(b) });
    return { status: r.status, body: await r.json() };
  }, body);
  expect(res.status).toBe(201);
  return res.body.id as string;
}

describe("probe journey in chromium", () => {
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

  it("signs in, creates a rate map, and opens Probe from the navigation", async () => {
    await signInThroughForm(page, app.baseUrl, editor.email, DEMO_PASSWORD);
    await createRateMap(page);
    await page.getByRole("navigation", { name: "Main" }).first().getByRole("link", { name: "Probe" }).click();
    await page.waitForURL("**/probes");
    await expect.poll(() => page.getByText("Limits: N ≤ 2000 and at most 40 MB per file.").isVisible()).toBe(true);
    await screenshot(page, "probe-01-empty", SHOTS);
  });

  it("refuses a file with the wrong extension on the form, then uploads the .npy fixture", async () => {
    await page.getByLabel("Coupling matrix J").setInputFiles({ name: "couplings.txt", mimeType: "text/plain", buffer: Buffer.from("1,2\n3,4\n") });
    await page.getByRole("button", { name: "Upload and analyse" }).click();
    await expect.poll(() => page.getByText('"couplings.txt" is not .csv, .npy, .mtx').isVisible()).toBe(true);
    await page.getByLabel("Coupling matrix J").setInputFiles(FIXTURE);
    await page.getByLabel("Relaxation rate μ").fill("1");
    await page.getByLabel("Title (optional)").fill("Recurrent net, trained 40 units");
    await page.getByRole("button", { name: "Upload and analyse" }).click();
    await page.waitForURL(/\/probes\/[0-9a-f-]{36}$/);
    await expect.poll(() => page.getByRole("heading", { name: "Recurrent net, trained 40 units", level: 1 }).isVisible()).toBe(true);
  });

  it("shows N, ĝ, τ̂, the spectrum against the ellipse, and the placement on the map", async () => {
    // ĝ = 1.51 and τ̂ = 0.384 are numpy's values for this file (tests/reference/probe-stats.json).
    await expect.poll(() => page.getByText(/^1\.51 ± /).isVisible()).toBe(true);
    await expect.poll(() => page.getByText(/^0\.384 ± /).isVisible()).toBe(true);
    const spectrum = page.getByRole("img", { name: "Eigenvalues of J (40) against the elliptic law" });
    await expect.poll(() => spectrum.isVisible()).toBe(true);
    expect(await spectrum.locator("circle").count()).toBe(40);
    expect(await spectrum.locator("path").first().getAttribute("d")).toMatch(/^M/);
    const marker = page.getByTestId("probe-marker");
    await expect.poll(() => marker.isVisible(), { timeout: 20_000 }).toBe(true);
    expect(await marker.getAttribute("aria-label")).toMatch(/The probe at μ\/g = 0\.661, τ = 0\.384/);
    await expect.poll(() => page.getByRole("heading", { name: /Nearest cell \(1, 1\)/ }).isVisible()).toBe(true);
    await screenshot(page, "probe-02-analysed", SHOTS);
  });

  it("runs the equilibrium search and shows the equilibria and the ensemble beside them", async () => {
    await page.getByLabel("Starts", { exact: true }).fill("16");
    await page.getByLabel("Comparison networks K").fill("2");
    await page.getByRole("button", { name: "Find equilibria" }).click();
    await expect.poll(() => page.getByRole("progressbar", { name: "Starts on the uploaded matrix" }).isVisible(), { timeout: 10_000 }).toBe(true);
    await screenshot(page, "probe-03-searching", [DESKTOP]);
    const table = page.getByRole("table", { name: "Distinct equilibria" });
    await expect.poll(() => table.isVisible(), { timeout: 60_000 }).toBe(true);
    expect(await table.locator("tbody tr").count()).toBeGreaterThan(0);
    await expect.poll(() => page.getByRole("table", { name: "Matrix and ensemble side by side" }).isVisible()).toBe(true);
    await expect.poll(() => page.getByText(/How the 16 runs ended/).isVisible()).toBe(true);
    await screenshot(page, "probe-04-equilibria", SHOTS);
  });

  it("downloads one equilibrium as CSV with one value per unit", async () => {
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Equilibrium 0 as CSV" }).click()]);
    expect(download.suggestedFilename()).toBe("Recurrent-net-trained-40-units-equilibrium-0.csv");
    const text = await readFile((await download.path())!, "utf8");
    const rows = text.trim().split("\n").filter((l) => !l.startsWith("#"));
    expect(rows[0]).toBe("unit,x");
    expect(rows).toHaveLength(41);
    expect(rows.slice(1).every((r) => Number.isFinite(Number(r.split(",")[1])))).toBe(true);
    await page.goto(`${app.baseUrl}/probes`);
    await expect.poll(() => page.getByRole("link", { name: "Recurrent net, trained 40 units" }).isVisible()).toBe(true);
    await screenshot(page, "probe-05-list", SHOTS);
    expect(browser.problems).toEqual([]);
  });
});
