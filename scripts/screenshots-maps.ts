// The map screens for scripts/screenshots.ts: new-map form (defaults with the estimate, refused
// input), a map filling live and done, layers, filter, share dialog, cell pages, the home list,
// and a read-only link opened signed out. Maps are launched through the form or the API of the
// running app (its in-process worker computes them).
import type { Page } from "playwright-core";

type Take = (page: Page, name: string) => Promise<void>;

const FIELD_MAP = {
  title: "Gaussian field landscape, N = 6",
  description: "Where stable equilibria become rare: compare with m_st(τ).",
  ensemble: "field",
  settings: { N: 6, sigma: 1 },
  mu: { min: 0.4, max: 3.2, steps: 7, scale: "linear" },
  tau: { min: 0.1, max: 0.9, steps: 5, scale: "linear" },
  budget: { networks: 3, starts: 8, tMax: 100 },
  seed: 5,
  visibility: "group",
};

async function api(page: Page, method: string, path: string, body?: unknown): Promise<{ status: number; body: any }> {
  return page.evaluate(
    async ([m, p, b]) => {
      const r = await fetch(p as string, { method: m as string, headers: { "content-type": "application/json" }, body: b ? JSON.stringify(b) : undefined });
      return { status: r.status, body: await r.json().catch(() => null) };
    },
    [method, path, body] as const,
  );
}

async function waitDone(page: Page, id: string): Promise<void> {
  for (let t = 0; t < 600; t++) {
    const m = await api(page, "GET", `/api/maps/${id}`);
    if (m.body?.status === "done" || m.body?.status === "failed") return;
    await page.waitForTimeout(500);
  }
  throw new Error(`map ${id} did not finish`);
}

async function newMapForm(page: Page, base: string, take: Take): Promise<string> {
  await page.goto(`${base}/maps/new`);
  await page.getByLabel("Cost estimate").getByText("Cells to compute").waitFor();
  await take(page, "map-new");
  await page.getByLabel("Units N", { exact: true }).fill("");
  await page.getByLabel("Steps", { exact: true }).first().fill("80");
  await page.getByRole("button", { name: "Launch map" }).click();
  await page.getByRole("alert").first().waitFor();
  await take(page, "map-new-invalid");
  await page.getByLabel("Title").fill("Leak sweep, tanh units");
  await page.getByLabel("Units N", { exact: true }).fill("20");
  await page.getByLabel("Steps", { exact: true }).first().fill("8");
  await page.getByLabel("Steps", { exact: true }).nth(1).fill("5");
  await page.getByLabel("Networks per cell K").fill("4");
  await page.getByLabel("Starts per network S").fill("8");
  await page.getByRole("button", { name: "Launch map" }).click();
  await page.waitForURL(/\/maps\/[0-9a-f-]{36}$/);
  await page.getByText(/live/).waitFor({ timeout: 10_000 }).catch(() => undefined);
  await page.waitForTimeout(1500);
  await take(page, "map-filling");
  return page.url().split("/").pop()!;
}

async function rateMapViews(page: Page, base: string, take: Take, id: string): Promise<void> {
  await waitDone(page, id);
  await page.goto(`${base}/maps/${id}`);
  await page.getByRole("button", { name: /^μ .*, τ .*: Stable states found/ }).first().hover();
  await take(page, "map-done-hover");
  await page.getByLabel("Layer").selectOption("converged");
  await page.getByRole("button", { name: "Settled ≥ 90 % and ≥ 5 stable" }).click();
  await take(page, "map-layer-filter");
  await page.getByRole("button", { name: "Share" }).click();
  await page.getByRole("dialog").getByLabel("Anyone with the link").check();
  await page.getByRole("dialog").getByRole("button", { name: "Save and create link" }).click();
  await page.getByRole("dialog").getByLabel("Read-only link", { exact: true }).waitFor();
  await take(page, "map-share-dialog");
  await page.keyboard.press("Escape");
  await page.goto(`${base}/maps/${id}/cells/1/2`);
  await page.getByRole("heading", { name: "Equilibria per network" }).waitFor();
  await take(page, "map-cell-rate");
}

/** Takes every map screen; returns the read-only link it created and the private map's page. */
export async function mapPages(page: Page, base: string, take: Take, groupId: string | null): Promise<{ link: string; privateMap: string }> {
  const field = await api(page, "POST", "/api/maps", { ...FIELD_MAP, groupId, visibility: groupId ? "group" : "private" });
  if (field.status !== 201) throw new Error(`field map refused: ${JSON.stringify(field.body)}`);
  const rateId = await newMapForm(page, base, take);
  await rateMapViews(page, base, take, rateId);
  await waitDone(page, field.body.id);
  await page.goto(`${base}/maps/${field.body.id}?layer=regime`);
  await take(page, "map-field-regime");
  await page.goto(`${base}/maps/${field.body.id}?layer=kr-stable`);
  await take(page, "map-field-kac-rice");
  await page.goto(`${base}/maps/${field.body.id}/cells/0/3`);
  await page.getByRole("heading", { name: "Equilibria per network" }).waitFor();
  await take(page, "map-cell-field");
  await page.goto(`${base}/`);
  await page.getByRole("list", { name: "Maps" }).waitFor();
  await take(page, "home-with-maps");
  const rate = await api(page, "GET", `/api/maps/${rateId}`);
  return { link: `${base}/s/${rate.body.shareToken}`, privateMap: `${base}/maps/${rateId}` };
}

/** The read-only link opened signed out: the map and one of its cells. */
export async function mapPagesSignedOut(page: Page, take: Take, link: string): Promise<void> {
  await page.goto(link);
  await page.getByText("Shared with you").waitFor();
  await take(page, "map-shared-signed-out");
  await page.getByRole("button", { name: /^μ .*, τ .*: Stable states found/ }).first().click();
  await page.getByRole("heading", { name: "Equilibria per network" }).waitFor();
  await take(page, "map-shared-cell");
}
