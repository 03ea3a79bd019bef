// The probe screens for scripts/screenshots.ts: the list with the upload form, a refused file,
// an uploaded matrix (facts, spectrum, placement on the demo rate map), a running and a finished
// equilibrium search. The upload is tests/fixtures/probes/probe-40.npy (numpy-written).
import path from "node:path";
import type { Page } from "playwright-core";

type Take = (page: Page, name: string) => Promise<void>;

const FIXTURE = path.resolve(import.meta.dirname, "../tests/fixtures/probes/probe-40.npy");

/** Walks the probe pages as a signed-in person; the app's worker runs the search. */
export async function probePages(page: Page, base: string, take: Take): Promise<void> {
  await page.goto(`${base}/probes`);
  await page.getByRole("button", { name: "Upload and analyse" }).waitFor();
  await take(page, "probes-empty");
  await page.getByLabel("Coupling matrix J").setInputFiles({ name: "weights.txt", mimeType: "text/plain", buffer: Buffer.from("1,2\n3,4\n") });
  await page.getByLabel("Relaxation rate μ").fill("");
  await page.getByRole("button", { name: "Upload and analyse" }).click();
  await page.getByRole("alert").first().waitFor();
  await take(page, "probe-upload-invalid");
  await page.getByLabel("Coupling matrix J").setInputFiles(FIXTURE);
  await page.getByLabel("Relaxation rate μ").fill("1");
  await page.getByLabel("Title (optional)").fill("Working-memory net after training, 40 units");
  await page.getByRole("button", { name: "Upload and analyse" }).click();
  await page.waitForURL(/\/probes\/[0-9a-f-]{36}$/);
  await page.getByTestId("probe-marker").waitFor({ timeout: 30_000 }).catch(() => undefined);
  await take(page, "probe-analysed");
  await page.getByLabel("Starts", { exact: true }).fill("32");
  await page.getByLabel("Comparison networks K").fill("4");
  await page.getByRole("button", { name: "Find equilibria" }).click();
  await page.getByRole("progressbar").first().waitFor();
  await take(page, "probe-searching");
  await page.getByRole("table", { name: "Distinct equilibria" }).waitFor({ timeout: 120_000 });
  await take(page, "probe-equilibria");
  await page.goto(`${base}/probes`);
  await take(page, "probes-list");
}
