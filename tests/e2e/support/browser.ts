import { mkdirSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";

import { BASE_URL, SCREENSHOT_DIR } from "./env";

// Flags for Debian's Chromium as root on a machine without a network (see DEVELOPERS.md).
const CHROMIUM_ARGS = [
  "--headless=new",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--disable-dev-shm-usage",
];

export type Session = { context: BrowserContext; page: Page; close: () => Promise<void> };

/** A fresh browser profile (its own cookies), closed and deleted by `close()`. */
export async function openBrowser(options: { viewport?: { width: number; height: number } } = {}): Promise<Session> {
  const dir = mkdtempSync(path.join(tmpdir(), "swarfbook-e2e-"));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: CHROMIUM_ARGS,
    baseURL: BASE_URL,
    viewport: options.viewport ?? { width: 1280, height: 900 },
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

let shot = 0;
/** Save a full-page screenshot of what the test sees, into the ignored screenshots folder. */
export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  shot += 1;
  const file = `${String(shot).padStart(3, "0")}-${name.replace(/[^a-z0-9-]+/gi, "-").toLowerCase()}.png`;
  await page.screenshot({ path: path.join(SCREENSHOT_DIR, file), fullPage: true });
}

/**
 * Holds back the page's script chunks until `release()` is called, so a test can act on the server-rendered page
 * before it hydrates, as a user on a slow line does. Inline scripts (streamed content) still run.
 */
export async function holdScripts(page: Page): Promise<{ release: () => Promise<void> }> {
  let open!: () => void;
  const gate = new Promise<void>((resolve) => (open = resolve));
  const pattern = /\/_next\/static\/chunks\/.+\.js$/;
  await page.route(pattern, async (route) => {
    await gate;
    await route.continue();
  });
  // The route stays: once the gate is open, later chunks pass straight through.
  return { release: async () => open() };
}
