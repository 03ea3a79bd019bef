import { mkdir, mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";

/** Where screenshots go (git-ignored). */
export const SCREENSHOT_DIR = path.resolve(import.meta.dirname, "../../.data/screenshots");

export const DESKTOP = { width: 1280, height: 860 } as const;
export const PHONE = { width: 390, height: 844 } as const;

// Debian's chromium, headless, with the background services off: on a closed network they
// only flood it with refused connections.
const CHROMIUM_ARGS = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export interface Browser {
  context: BrowserContext;
  /** A new tab; console errors and failed page scripts are collected in `problems`. */
  newPage: () => Promise<Page>;
  problems: string[];
  close: () => Promise<void>;
}

/** Launches Debian's chromium through playwright-core with a fresh, throwaway profile. */
export async function launchBrowser(viewport: { width: number; height: number } = DESKTOP): Promise<Browser> {
  const profile = await mkdtemp(path.join(tmpdir(), "equilibrist-chromium-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: CHROMIUM_ARGS,
    viewport,
  });
  const problems: string[] = [];
  const watch = (page: Page) => {
    page.on("pageerror", (err) => problems.push(`pageerror: ${err.message}`));
    page.on("console", (msg) => {
      // 4xx answers the app expects (401 from "me" when signed out) show up as console noise.
      if (msg.type() === "error" && !/Failed to load resource/.test(msg.text())) problems.push(`console: ${msg.text()}`);
    });
  };
  context.pages().forEach(watch);
  context.on("page", watch);
  return {
    context,
    problems,
    newPage: async () => context.pages().find((p) => p.url() === "about:blank") ?? (await context.newPage()),
    close: async () => {
      await context.close();
      await rm(profile, { recursive: true, force: true });
    },
  };
}

/**
 * Saves a full-page PNG of `page` as .data/screenshots/<name>-<width>.png at each requested
 * width, restoring the original viewport afterwards.
 */
export async function screenshot(page: Page, name: string, widths: ReadonlyArray<{ width: number; height: number }> = [DESKTOP]) {
  await mkdir(SCREENSHOT_DIR, { recursive: true });
  const original = page.viewportSize();
  for (const size of widths) {
    await page.setViewportSize(size);
    await page.waitForTimeout(50);
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}-${size.width}.png`), fullPage: true, animations: "disabled" });
  }
  if (original) await page.setViewportSize(original);
}

/** Signs in through the sign-in page as a person would and waits for home. */
export async function signInThroughForm(page: Page, baseUrl: string, email: string, password: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(`${baseUrl}/`);
}
