/**
 * Debian's Chromium driven by playwright-core, allowed to reach only the local editor server.
 * Every request elsewhere is aborted and recorded, so a test can assert that none was attempted.
 */
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

export interface BlockedRequest {
  readonly url: string;
  readonly frameUrl: string;
}

export interface Session {
  readonly browser: Browser;
  readonly context: BrowserContext;
  readonly page: Page;
  readonly blocked: BlockedRequest[];
  close(): Promise<void>;
}

/** The panel's own script and stylesheet: the webview loads them through a name the route also sees. */
export const isPanelResource = (url: string): boolean => /\.vscode-resource\.vscode-cdn\.net\/.*\/(media\/panel\.css|dist\/webview\/panel\.js)$/.test(url);

export const CHROMIUM = process.env['CHROMIUM_PATH'] ?? '/usr/bin/chromium';

export async function openSession(base: string, viewport = { width: 1600, height: 1000 }): Promise<Session> {
  const browser = await chromium.launch({
    executablePath: CHROMIUM,
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      // Belt and braces: names other than the loopback server do not even resolve.
      '--host-resolver-rules=MAP * ~NOTFOUND, EXCLUDE 127.0.0.1',
    ],
  });
  const context = await browser.newContext({ viewport });
  const blocked: BlockedRequest[] = [];
  await context.route(
    (url) => !url.href.startsWith(base) && !url.href.startsWith('data:') && !url.href.startsWith('blob:'),
    (route) => {
      const request = route.request();
      let frameUrl = '';
      try {
        frameUrl = request.frame().url();
      } catch {
        // Service-worker requests have no frame.
      }
      blocked.push({ url: request.url(), frameUrl });
      return route.abort();
    },
  );
  // Requests that a service worker answers never reach the route above; note every request the
  // browser reports for another host as well (the webview host serves the panel through one).
  context.on('request', (request) => {
    const url = request.url();
    if (url.startsWith(base) || url.startsWith('data:') || url.startsWith('blob:')) return;
    if (blocked.some((entry) => entry.url === url)) return;
    let frameUrl = '';
    try {
      frameUrl = request.frame().url();
    } catch {
      frameUrl = 'service worker';
    }
    blocked.push({ url, frameUrl });
  });
  const page = await context.newPage();
  return { browser, context, page, blocked, close: () => browser.close() };
}

export function timer(): (label: string) => void {
  const started = Date.now();
  return (label) => console.log(`[${String(Date.now() - started).padStart(6)} ms] ${label}`);
}
