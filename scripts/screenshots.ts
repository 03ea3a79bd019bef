// Takes a screenshot of every client page at 1280 px and 390 px wide into .data/screenshots/
// (tour-*.png), against the real app (with a map worker) on a private throwaway PostgreSQL
// seeded with the demo lab; the map screens come from scripts/screenshots-maps.ts, the probe
// screens from scripts/screenshots-probe.ts.
// Run: node --import tsx scripts/screenshots.ts   (SHOTS_PG_PORT picks the database port, default 54332)
import { execFileSync } from "node:child_process";
import { rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import type { Page } from "playwright-core";
import { DEMO_PASSWORD, demoPeople } from "../server/db/seed/demo-lab";
import { DESKTOP, launchBrowser, PHONE, screenshot, SCREENSHOT_DIR } from "../tests/helpers/browser";
import { prepareTemplateDatabase } from "../tests/helpers/db-template";
import { startE2eApp } from "../tests/helpers/e2e-app";
import { mapPages, mapPagesSignedOut } from "./screenshots-maps";
import { probePages } from "./screenshots-probe";

const ROOT = path.resolve(import.meta.dirname, "..");
const PORT = Number(process.env.SHOTS_PG_PORT ?? 54332);
const PG_DIR = `.data/pg-shots-${PORT}`;
// A private build: dist/ is shared with `npm test` runs that may rebuild it meanwhile. Not
// under .data/: the static server refuses paths through dot-folders.
const CLIENT_DIR = path.join(tmpdir(), `equilibrist-shots-dist-${process.pid}`);
const [head, editor, viewer, loner] = demoPeople;

function pg(command: "pg_up" | "pg_down") {
  const args = command === "pg_up" ? `${PG_DIR} ${PORT}` : `${ROOT}/${PG_DIR}`;
  execFileSync("bash", ["-c", `source scripts/pg.sh && ${command} ${args}`], { cwd: ROOT, stdio: "inherit" });
}

let shot = 0;
async function take(page: Page, name: string) {
  await page.waitForLoadState("networkidle");
  shot += 1;
  await screenshot(page, `tour-${String(shot).padStart(2, "0")}-${name}`, [DESKTOP, PHONE]);
}

async function signIn(page: Page, base: string, email: string) {
  await page.goto(`${base}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(`${base}/`);
}

async function signOut(page: Page, base: string) {
  await page.evaluate(() => fetch("/api/auth/logout", { method: "POST" }));
  await page.goto(`${base}/sign-in`);
}

/** Opens the newest outbox e-mail whose subject matches, as the admin, and returns its app link. */
async function linkFromOutbox(page: Page, base: string, subject: RegExp): Promise<string> {
  await page.goto(`${base}/admin/outbox`);
  await page.getByRole("link", { name: subject }).first().click();
  const href = await page.getByRole("article").getByRole("link").first().getAttribute("href");
  if (!href) throw new Error(`no link in the e-mail matching ${subject}`);
  return href.startsWith("http") ? href : `${base}${href}`;
}

async function signedOutPages(page: Page, base: string) {
  await page.goto(`${base}/groups`);
  await page.waitForURL("**/sign-in?**");
  await take(page, "sign-in");
  await page.getByLabel("E-mail").fill(head.email);
  await page.getByLabel("Password").fill("not-the-password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.getByRole("alert").first().waitFor();
  await take(page, "sign-in-wrong-password");
  await page.goto(`${base}/register`);
  await page.getByRole("button", { name: "Create account" }).click();
  await take(page, "register-invalid");
  await page.goto(`${base}/forgot-password`);
  await take(page, "forgot-password");
  await page.getByLabel("E-mail").fill(head.email);
  await page.getByRole("button", { name: "Send reset link" }).click();
  await page.getByRole("status").first().waitFor();
  await take(page, "forgot-password-sent");
  await page.goto(`${base}/reset`);
  await take(page, "reset-no-token");
}

async function signedInPages(page: Page, base: string) {
  await signIn(page, base, head.email);
  await take(page, "home");
  await page.getByRole("button", { name: "Account menu" }).click();
  await take(page, "account-menu");
  await page.keyboard.press("Escape");
  await page.goto(`${base}/groups`);
  await take(page, "groups");
  await page.getByRole("link", { name: /Quillfeather/ }).click();
  await page.getByLabel("E-mail address").fill(loner.email);
  await page.getByRole("button", { name: "Send invitation" }).click();
  await page.getByRole("listitem").filter({ hasText: loner.email }).waitFor();
  await take(page, "group-detail-owner");
  await page.goto(`${base}/admin/users`);
  await take(page, "admin-users");
  await page.goto(`${base}/admin/groups`);
  await take(page, "admin-groups");
  await page.goto(`${base}/admin/outbox`);
  await take(page, "admin-outbox");
  const resetLink = await linkFromOutbox(page, base, /Reset your Equilibrist password/);
  await take(page, "admin-outbox-message");
  const inviteLink = await linkFromOutbox(page, base, /Invitation to/);
  await page.goto(`${base}/no/such/page`);
  await take(page, "not-found");
  await signOut(page, base);
  await page.goto(resetLink);
  await take(page, "reset-with-token");
  return inviteLink;
}

async function otherAccounts(page: Page, base: string, inviteLink: string) {
  await page.goto(inviteLink);
  await take(page, "invitation-signed-out");
  await signIn(page, base, loner.email);
  await page.goto(`${base}/groups`);
  await take(page, "groups-empty");
  await page.goto(inviteLink);
  await take(page, "invitation-signed-in");
  await signOut(page, base);
  await signIn(page, base, viewer.email);
  await page.getByRole("link", { name: /Quillfeather/ }).first().click();
  await page.getByRole("heading", { level: 1 }).waitFor();
  await take(page, "group-detail-viewer");
  await page.goto(`${base}/admin/users`);
  await take(page, "admin-forbidden");
  await signOut(page, base);
  await signIn(page, base, editor.email);
  await page.getByRole("link", { name: /Quillfeather/ }).first().click();
  await page.getByRole("heading", { level: 1 }).waitFor();
  await take(page, "group-detail-editor");
}

/** The map screens, as the lab head (the group's maps are shared with the Quillfeather group). */
async function mapScreens(page: Page, base: string) {
  await signIn(page, base, head.email);
  const groups = await page.evaluate(() => fetch("/api/groups").then((r) => r.json()));
  const { link, privateMap } = await mapPages(page, base, take, groups.items?.[0]?.id ?? null);
  await signOut(page, base);
  await mapPagesSignedOut(page, take, link);
  await signIn(page, base, loner.email);
  await page.goto(privateMap);
  await page.getByRole("heading", { name: "Nothing here" }).waitFor();
  await take(page, "map-not-yours");
}

/** The probe screens, as the lab head (whose rate map from the map screens is on offer for placement). */
async function probeScreens(page: Page, base: string) {
  await signOut(page, base);
  await signIn(page, base, head.email);
  await probePages(page, base, take);
}

async function main() {
  pg("pg_up");
  try {
    await prepareTemplateDatabase(`postgres://postgres@127.0.0.1:${PORT}/postgres`);
    process.env.TEST_DATABASE_ADMIN_URL = `postgres://postgres@127.0.0.1:${PORT}/postgres`;
    execFileSync("npx", ["vite", "build", "--logLevel", "error", "--outDir", CLIENT_DIR], { cwd: ROOT, stdio: "inherit" });
    const app = await startE2eApp({ clientDir: CLIENT_DIR, worker: true });
    const browser = await launchBrowser();
    try {
      await app.seedDemo();
      const page = await browser.newPage();
      await signedOutPages(page, app.baseUrl);
      const inviteLink = await signedInPages(page, app.baseUrl);
      await otherAccounts(page, app.baseUrl, inviteLink);
      await signOut(page, app.baseUrl);
      await mapScreens(page, app.baseUrl);
      await probeScreens(page, app.baseUrl);
      await signOut(page, app.baseUrl);
      if (browser.problems.length) console.warn(`[screenshots] page problems:\n  ${browser.problems.join("\n  ")}`);
      console.log(`[screenshots] ${shot} pages × 2 widths in ${SCREENSHOT_DIR}`);
    } finally {
      await browser.close();
      await app.stop();
    }
  } finally {
    rmSync(CLIENT_DIR, { recursive: true, force: true });
    pg("pg_down");
  }
}

await main();
