/**
 * The side panel's HTML shell. It carries no document text at all: content arrives later by
 * message and is rendered with DOM calls. Deny-by-default CSP; the one script runs by nonce.
 */
export interface PanelHtmlInput {
  /** The webview's own origin for local resources (`webview.cspSource`). */
  readonly cspSource: string;
  readonly nonce: string;
  readonly scriptUri: string;
  readonly styleUri: string;
}

/**
 * The folders the webview may load from, below the extension: the panel's own script folder (no
 * other bundle in it) and media/, which in the VSIX holds only the stylesheet and icons
 * (.vscodeignore). Nothing else of dist/ (the extension and engine bundles) is reachable.
 */
export const PANEL_RESOURCE_FOLDERS: readonly (readonly string[])[] = [['dist', 'webview'], ['media']];

/** The part of Web Crypto a nonce needs; both extension hosts (Node 20 and a Web Worker) have it. */
export interface RandomSource {
  getRandomValues<T extends Uint8Array>(array: T): T;
}

/** 128 bits from the platform's CSPRNG (Web Crypto), base64 (a valid CSP nonce). */
export function makeNonce(random: RandomSource = globalThis.crypto): string {
  const bytes = random.getRandomValues(new Uint8Array(16));
  return btoa(String.fromCharCode(...bytes));
}

export function contentSecurityPolicy(cspSource: string, nonce: string): string {
  return [
    "default-src 'none'",
    `style-src ${cspSource}`,
    `font-src ${cspSource}`,
    `script-src 'nonce-${nonce}'`,
    "base-uri 'none'",
    "form-action 'none'",
    "frame-src 'none'",
  ].join('; ');
}

function attribute(value: string): string {
  return value.replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}

export function panelHtml(input: PanelHtmlInput): string {
  const csp = contentSecurityPolicy(input.cspSource, input.nonce);
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="UTF-8">
<meta http-equiv="Content-Security-Policy" content="${attribute(csp)}">
<meta name="viewport" content="width=device-width, initial-scale=1.0">
<link rel="stylesheet" href="${attribute(input.styleUri)}">
<title>Tersely summary</title>
</head>
<body>
<div id="app" aria-live="polite"></div>
<script nonce="${attribute(input.nonce)}" src="${attribute(input.scriptUri)}"></script>
</body>
</html>`;
}
