import { existsSync } from 'node:fs';
import type { Browser } from 'playwright-core';
import { PAGE_FOOTER_META } from '../report/page-footer.ts';

/** Where Debian's `chromium` package puts the browser; the first that exists is used. */
export const CHROMIUM_PATHS = ['/usr/lib/chromium/chromium', '/usr/bin/chromium'];

/** Headless, no sandbox (containers run as root), nothing fetched or synced in the background. */
export const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

export const INSTALL_CHROMIUM = "install Debian's package (sudo apt-get install chromium), or name a Chromium or Chrome executable in SHAFTCASE_CHROMIUM";

/** The environment variable that names the browser for `--pdf`, before the Debian paths are tried. */
export const CHROMIUM_ENV = 'SHAFTCASE_CHROMIUM';

/**
 * The Chromium executable: the one `SHAFTCASE_CHROMIUM` names (it must exist), else the first
 * Debian path that exists; undefined when none is found. The tool never downloads a browser.
 */
export function findChromium(paths: readonly string[] = CHROMIUM_PATHS, named: string | undefined = process.env[CHROMIUM_ENV]): string | undefined {
  if (named !== undefined && named !== '') return existsSync(named) ? named : undefined;
  return paths.find((p) => existsSync(p));
}

/** Thrown when a command needs Chromium and there is none. */
export class ChromiumMissing extends Error {
  constructor(named: string | undefined = process.env[CHROMIUM_ENV]) {
    super(
      named
        ? `Chromium was not found at ${named} (named by ${CHROMIUM_ENV}); give the path of a Chromium or Chrome executable, or unset it to use Debian's`
        : `Chromium was not found at ${CHROMIUM_PATHS.join(' or ')}; ${INSTALL_CHROMIUM}`,
    );
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

/** Page margins of the PDF: room at the foot for the footer (the case id, the date, "page N of M"). */
const PDF_MARGIN = { top: '14mm', right: '14mm', bottom: '16mm', left: '14mm' };

/**
 * The footer every page of the PDF carries: the text the page's footer meta gives (the case id and
 * the date, from renderHtml's `pageFooter`) on the left, "page N of M" on the right. Chromium fills
 * the pageNumber and totalPages spans; the text is already escaped in the meta's attribute.
 */
export function footerTemplate(html: string): string {
  const text = new RegExp(`<meta name="${PAGE_FOOTER_META}" content="([^"]*)">`).exec(html)?.[1] ?? '';
  return (
    '<div style="font: 8pt system-ui, \'DejaVu Sans\', sans-serif; color: #5b6470; width: 100%; margin: 0 14mm; display: flex; justify-content: space-between;">' +
    `<span>${text}</span><span>page <span class="pageNumber"></span> of <span class="totalPages"></span></span></div>`
  );
}

/**
 * Prints a self-contained HTML page to PDF on `paper`, every page footed with the case id, the
 * date and its number. Uses `browser` when given (the browser test shares its one launch), or
 * starts and closes its own.
 */
export async function printPdf(html: string, paper: 'A4' | 'Letter', browser?: Browser): Promise<Uint8Array> {
  const own = browser ? undefined : await launchChromium();
  try {
    const page = await (browser ?? own!).newPage();
    await page.setContent(html, { waitUntil: 'load' });
    const pdf = await page.pdf({
      format: paper,
      printBackground: true,
      preferCSSPageSize: false,
      margin: PDF_MARGIN,
      displayHeaderFooter: true,
      headerTemplate: '<span></span>',
      footerTemplate: footerTemplate(html),
    });
    await page.close();
    return new Uint8Array(pdf);
  } finally {
    await own?.close();
  }
}
