import { existsSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';

export const baseUrl = process.env.E2E_BASE_URL ?? 'http://127.0.0.1:3100';

const screenshotDir = join(import.meta.dirname, '../../test-results/e2e');

function chromiumPath(): string {
  const candidates = [process.env.CHROMIUM_PATH, '/usr/lib/chromium/chromium', '/usr/bin/chromium'];
  const found = candidates.find((path): path is string => !!path && existsSync(path));
  if (!found) throw new Error("Debian's chromium is not installed (apt-get install -y chromium)");
  return found;
}

/** Headless Debian Chromium with its background traffic off (this machine has no outside network). */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: chromiumPath(),
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  });
}

/** Saves a full-page screenshot to client/test-results/e2e (git-ignored) for review. */
export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(screenshotDir, { recursive: true });
  await page.screenshot({ path: join(screenshotDir, `${name}.png`), fullPage: true });
}
