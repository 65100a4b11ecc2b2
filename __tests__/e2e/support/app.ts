import fs from 'node:fs';
import path from 'node:path';

import type { Page } from 'playwright-core';

import type { Viewport } from './browser';
import { loadServerState } from './server-state';

/** Seeded demo accounts and their shared password, as documented in the README. */
export const DEMO_PASSWORD = 'junctura-demo';
export const DEMO_ACCOUNTS = [
  { email: 'owner@example.com', role: 'owner' },
  { email: 'designer@example.com', role: 'designer' },
  { email: 'reviewer@example.com', role: 'reviewer' },
] as const;

/** Seeded demo studies are labelled "demo" in their titles. */
export const DEMO_TITLE = /\bdemo\b/i;

export type ApiStudy = { id: number; title: string; status: string; author: { name: string } };

export function baseUrl(): string {
  return loadServerState().baseUrl;
}

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto(`${baseUrl()}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.getByRole('heading', { name: 'Studies', exact: true }).waitFor();
}

/** The studies the API gives this browser's session: the reference the screen is checked against. */
export async function apiStudies(page: Page): Promise<ApiStudy[]> {
  const response = await page.request.get(`${baseUrl()}/api/studies`);
  if (!response.ok()) throw new Error(`GET /api/studies answered ${response.status()}`);
  return ((await response.json()) as { studies: ApiStudy[] }).studies;
}

export async function sessionStatus(page: Page): Promise<number> {
  return (await page.request.get(`${baseUrl()}/api/session`)).status();
}

/** Waits until the list has rendered its rows or cards (not the loading state). */
export async function waitForStudies(page: Page, titles: readonly string[]): Promise<void> {
  for (const title of titles) {
    await page.getByText(title, { exact: true }).first().waitFor();
  }
}

const SCREENSHOT_DIR = path.resolve(__dirname, '..', '..', '..', 'artifacts', 'screenshots');

/** Saves a full-page PNG under artifacts/screenshots and returns its path. */
export async function screenshot(page: Page, viewport: Viewport, name: string): Promise<string> {
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
  const file = path.join(SCREENSHOT_DIR, `${viewport.width}x${viewport.height}-${name}.png`);
  // Park the pointer so no hover highlight lands in the picture.
  await page.mouse.move(0, 0);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

/** Signs out the way a user would: the sidebar on a wide window, the Account tab on a phone. */
export async function signOut(page: Page, viewport: Viewport): Promise<void> {
  if (viewport.width < 1024) {
    await page.getByRole('link', { name: 'Account' }).click();
    await page.getByRole('heading', { name: 'Account', exact: true }).waitFor();
  }
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.getByRole('button', { name: 'Sign in', exact: true }).waitFor();
}
