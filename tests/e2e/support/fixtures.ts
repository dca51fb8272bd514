// The browser tests' fixtures: every test gets its own browser context (fresh cookies and storage)
// and its own client address, a mailbox on the mail fake, and helpers to set up what it needs
// (a second visitor, a signed-in staff API client, a submitted request). Import `test` and `expect`
// from here instead of from @playwright/test.
import { test as base, expect, type APIRequestContext, type BrowserContext, type Page } from "@playwright/test";
import { DEMO_PASSWORD, e2eUrl } from "./env";

export { expect };

// Sign-in and submissions are rate-limited per client address (better-auth: 3 sign-in tries per 10 s;
// the request form: 8 per 15 minutes), read from X-Forwarded-For as a proxy in front would set it.
// Each context gets its own address from the three documentation ranges (RFC 5737), so they are only
// ever a header, never a target. The worker index moves the start when a worker is replaced.
const DOCUMENTATION_RANGES = ["192.0.2", "198.51.100", "203.0.113"];
let addresses = 0;
function nextClientAddress(workerIndex: number): string {
  const n = (workerIndex * 61 + addresses++) % (DOCUMENTATION_RANGES.length * 254);
  return `${DOCUMENTATION_RANGES[Math.floor(n / 254)]}.${(n % 254) + 1}`;
}

/** Distinct on every call in a run: keeps e-mail addresses and names of new rows apart. */
let stamps = 0;
export function uniqueStamp(): string {
  stamps += 1;
  return `${Date.now().toString(36)}${stamps}`;
}

/** The same, in lower-case letters only, for a person's name that no seeded or earlier row has. */
export function uniqueLetters(): string {
  return uniqueStamp().replace(/\d/g, (d) => "abcdefghij"[Number(d)]!);
}

export interface Mail {
  id: string;
  subject: string;
  html?: string;
  text?: string;
}

export interface Mailbox {
  /** Messages the mail fake holds for one address, newest first. */
  for(address: string): Promise<Mail[]>;
}

interface Fixtures {
  clientAddress: string;
  mailbox: Mailbox;
  /** Someone else at another device: a browser context of their own, closed after the test. */
  newVisitor: () => Promise<BrowserContext>;
  /** An API client signed in with a demo staff account's password, disposed after the test. */
  staffApi: (email: string) => Promise<APIRequestContext>;
  /** POSTs a rider's answers to /api/requests as the public form does; the 201 body. */
  submitRequest: (answers: unknown) => Promise<{ id: string; statusUrl: string }>;
}

export const test = base.extend<Fixtures>({
  baseURL: async ({}, provide) => provide(e2eUrl("baseUrl")),
  clientAddress: async ({}, provide, testInfo) => provide(nextClientAddress(testInfo.workerIndex)),
  extraHTTPHeaders: async ({ clientAddress }, provide) => provide({ "x-forwarded-for": clientAddress }),

  mailbox: async ({ playwright }, provide) => {
    const api = await playwright.request.newContext({ baseURL: e2eUrl("mailUrl") });
    await provide({
      async for(address) {
        const response = await api.get(`/emails?to=${encodeURIComponent(address)}`);
        expect(response.status(), "the mail fake answers").toBe(200);
        return ((await response.json()) as { data: Mail[] }).data;
      },
    });
    await api.dispose();
  },

  newVisitor: async ({ browser, baseURL, viewport }, provide, testInfo) => {
    const opened: BrowserContext[] = [];
    await provide(async () => {
      const context = await browser.newContext({
        baseURL,
        viewport,
        extraHTTPHeaders: { "x-forwarded-for": nextClientAddress(testInfo.workerIndex) },
      });
      opened.push(context);
      return context;
    });
    for (const context of opened) await context.close();
  },

  staffApi: async ({ playwright, baseURL }, provide, testInfo) => {
    const opened: APIRequestContext[] = [];
    await provide(async (email) => {
      const api = await playwright.request.newContext({
        baseURL,
        // better-auth compares the Origin with its base URL, as a browser would send it.
        extraHTTPHeaders: { origin: baseURL!, "x-forwarded-for": nextClientAddress(testInfo.workerIndex) },
      });
      opened.push(api);
      const signedIn = await api.post("/api/auth/sign-in/email", { data: { email, password: DEMO_PASSWORD } });
      expect(signedIn.status(), `${email} signs in`).toBe(200);
      return api;
    });
    for (const api of opened) await api.dispose();
  },

  submitRequest: async ({ request, baseURL }, provide) => {
    await provide(async (answers) => {
      const response = await request.post("/api/requests", { data: answers, headers: { origin: baseURL! } });
      expect(response.status(), `POST /api/requests answered ${await response.text()}`).toBe(201);
      return (await response.json()) as { id: string; statusUrl: string };
    });
  },
});

/** Signs a demo staff account in through the sign-in page, as a person does, and lands on `next`. */
export async function signInWithPassword(page: Page, email: string, next: string) {
  await page.goto(`/sign-in?next=${next}`);
  const form = page.getByRole("form", { name: "Staff sign-in" });
  await form.getByLabel("E-mail").fill(email);
  await form.getByLabel("Password").fill(DEMO_PASSWORD);
  await form.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(next);
}

/** The magic-link URL in the newest sign-in e-mail the mail fake holds for `email`. */
export async function signInLinkFor(mailbox: Mailbox, email: string): Promise<string> {
  let link: string | undefined;
  await expect
    .poll(
      async () => {
        const [newest] = await mailbox.for(email);
        link = /href="([^"]*magic-link\/verify[^"]*)"/.exec(newest?.html ?? "")?.[1]?.replaceAll("&amp;", "&");
        return link;
      },
      { message: "the e-mail carries the sign-in link" },
    )
    .toBeTruthy();
  return link!;
}
