// Debian's Chromium through playwright-core: no browser download. A fresh profile per context.
import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { chromium, type BrowserContext } from "playwright-core";

const FLAGS = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

let clients = 0;

/**
 * A distinct client address per browser or API context, sent as X-Forwarded-For as a proxy would.
 * Sign-in is rate-limited per client (better-auth: 3 tries per 10 s); without this every test would
 * be one client. 203.0.113.0/24 is the documentation range (RFC 5737): only a header, never a target.
 */
export function clientHeaders(): Record<string, string> {
  clients += 1;
  return { "x-forwarded-for": `203.0.113.${(process.pid + clients) % 250}` };
}

export interface Browsing {
  context: BrowserContext;
  close(): Promise<void>;
}

export async function openBrowser(
  options: { viewport?: { width: number; height: number } } = {},
): Promise<Browsing> {
  const profile = mkdtempSync(path.join(os.tmpdir(), "sagwise-chromium-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: FLAGS,
    viewport: options.viewport ?? { width: 1280, height: 800 },
    extraHTTPHeaders: clientHeaders(),
  });
  return {
    context,
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** Messages the mail fake holds for one address, newest first. */
export async function mailFor(mailUrl: string, to: string) {
  const response = await fetch(`${mailUrl}/emails?to=${encodeURIComponent(to)}`);
  if (!response.ok) throw new Error(`mail fake answered ${response.status}`);
  const list = (await response.json()) as {
    data: { id: string; subject: string; html?: string; text?: string }[];
  };
  return list.data;
}
