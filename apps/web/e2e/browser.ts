import { mkdtempSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const baseUrl = process.env.LINESMITH_URL ?? 'http://127.0.0.1:3000';
const artifactsDir = process.env.ARTIFACTS_DIR ?? join(process.cwd(), 'artifacts');

export const demoPassword = 'linesmith-demo';
export const demoUsers = {
  admin: 'owner@tidewater.example',
  fabricator: 'fab@tidewater.example',
  partsClerk: 'parts@tidewater.example',
  reviewer: 'lead@tidewater.example',
} as const;

/** A fresh, isolated Chromium profile per call (the launcher refuses --user-data-dir in args). */
export async function openBrowser(): Promise<BrowserContext> {
  const context = await chromium.launchPersistentContext(mkdtempSync(join(tmpdir(), 'linesmith-e2e-')), {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    viewport: { width: 1366, height: 860 },
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  // A step that waits in vain fails with its locator named, well before the test's own time-out.
  context.setDefaultTimeout(20_000);
  failOnPolicyViolations(context);
  return context;
}

/**
 * The server's Content-Security-Policy allows run-time styles by nonce only. Any style, script or
 * image the policy refused on any page of the journey fails it when its browser closes.
 */
function failOnPolicyViolations(context: BrowserContext): void {
  const refused: string[] = [];
  const watch = (page: Page) =>
    page.on('console', (message) => {
      if (/Content Security Policy/i.test(message.text())) refused.push(`${page.url()}: ${message.text()}`);
    });
  context.pages().forEach(watch);
  context.on('page', watch);
  const close = context.close.bind(context);
  context.close = async (options) => {
    await close(options);
    if (refused.length) throw new Error(`the Content-Security-Policy refused ${refused.length} item(s):\n${refused.slice(0, 5).join('\n')}`);
  };
}

export async function signIn(page: Page, email: string, password = demoPassword): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel(/e-?mail/i).fill(email);
  await page.getByLabel(/password/i).fill(password);
  await page.getByRole('button', { name: /sign in/i }).click();
}

export async function screenshot(page: Page, name: string): Promise<string> {
  const dir = join(artifactsDir, 'screenshots');
  mkdirSync(dir, { recursive: true });
  const path = join(dir, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}
