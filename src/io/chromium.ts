import { existsSync } from 'node:fs';
import type { Browser } from 'playwright-core';

/** Where Debian's `chromium` package puts the browser; the first that exists is used. */
export const CHROMIUM_PATHS = ['/usr/lib/chromium/chromium', '/usr/bin/chromium'];

/** Headless, no sandbox (containers run as root), nothing fetched or synced in the background. */
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export const INSTALL_CHROMIUM = 'install Debian\'s package: sudo apt-get install chromium';

/** The Chromium executable, or undefined when none is installed. The tool never downloads a browser. */
export function findChromium(paths: readonly string[] = CHROMIUM_PATHS): string | undefined {
  return paths.find((p) => existsSync(p));
}

/** Thrown when a command needs Chromium and there is none. */
export class ChromiumMissing extends Error {
  constructor() {
    super(`Chromium was not found at ${CHROMIUM_PATHS.join(' or ')}; ${INSTALL_CHROMIUM}`);
    this.name = 'ChromiumMissing';
  }
}

/** Starts headless Chromium through playwright-core (imported only here, on first use). */
export async function launchChromium(): Promise<Browser> {
  const executablePath = findChromium();
  if (!executablePath) throw new ChromiumMissing();
  const { chromium } = await import('playwright-core');
  return chromium.launch({ executablePath, args: CHROMIUM_ARGS });
}

/**
 * Prints a self-contained HTML page to PDF on `paper`. Uses `browser` when given (the browser test
 * shares its one launch), or starts and closes its own.
 */
export async function printPdf(html: string, paper: 'A4' | 'Letter', browser?: Browser): Promise<Uint8Array> {
  const own = browser ? undefined : await launchChromium();
  try {
    const page = await (browser ?? own!).newPage();
    await page.setContent(html, { waitUntil: 'load' });
    const pdf = await page.pdf({ format: paper, printBackground: true, preferCSSPageSize: false });
    await page.close();
    return new Uint8Array(pdf);
  } finally {
    await own?.close();
  }
}
