import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

export const chromiumPath = process.env.LIMITBOOK_CHROMIUM ?? '/usr/bin/chromium';

const launchArgs = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: chromiumPath, args: launchArgs, headless: true });
}

export const viewports = {
  desktop: { width: 1440, height: 900 },
  phone: { width: 390, height: 844 },
} as const;

/** A fresh context (own cookies) with a page that records console errors and failed requests. */
export async function openPage(browser: Browser, baseUrl: string, viewport: { width: number; height: number } = viewports.desktop) {
  const context: BrowserContext = await browser.newContext({ baseURL: baseUrl, viewport, locale: 'en-GB', timezoneId: 'Europe/London' });
  context.setDefaultTimeout(15_000);
  const page: Page = await context.newPage();
  const problems: string[] = [];
  page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
  page.on('console', (message) => {
    if (message.type() === 'error') problems.push(`console: ${message.text()}`);
  });
  return { context, page, problems };
}
