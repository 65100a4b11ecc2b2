import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { chromium, type BrowserContext, type Page } from 'playwright-core';

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

// Headless Debian Chromium on a closed network: no first-run, sync or background traffic.
const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export type Viewport = { width: number; height: number };

export const PHONE: Viewport = { width: 390, height: 844 };
export const DESKTOP: Viewport = { width: 1440, height: 900 };

export type BrowserSession = { context: BrowserContext; page: Page; close: () => Promise<void> };

/** A fresh browser profile (own cookies) at the given window size. */
export async function openBrowser(viewport: Viewport): Promise<BrowserSession> {
  const profile = fs.mkdtempSync(path.join(os.tmpdir(), 'junctura-e2e-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    args: CHROMIUM_ARGS,
    headless: true,
    viewport,
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      fs.rmSync(profile, { recursive: true, force: true });
    },
  };
}
