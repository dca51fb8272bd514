// Every page of the app passes its own Content-Security-Policy: opened in Chromium, no page logs a
// CSP violation (or any other console error), and every response carries the policy and the other
// security headers (lib/security-headers.ts). Directive semantics: W3C Content Security Policy
// Level 3; a violation fires `securitypolicyviolation` and logs a console error in Chromium.
import type { Page } from "@playwright/test";
import { stableUuid } from "@/db/seed-data";
import { expect, signInWithPassword, test, uniqueLetters } from "./support/fixtures";
import { answersLike } from "./support/requests";

async function watch(page: Page) {
  const problems: string[] = [];
  page.on("console", (message) => {
    // A failed resource is reported below with its address.
    // The e-mail previews (/shop/emails) are iframes sandboxed without scripts on purpose, and
    // Playwright injects the listener below into every frame: the sandbox refusing it is expected.
    const text = message.text();
    const sandboxRefusal = text.includes("about:srcdoc") && text.includes("sandboxed");
    if (message.type() === "error" && !text.startsWith("Failed to load resource") && !sandboxRefusal)
      problems.push(`console: ${text}`);
  });
  page.on("response", (response) => {
    // No favicon is shipped; the browser asks for one anyway.
    if (response.status() >= 400 && new URL(response.url()).pathname !== "/favicon.ico")
      problems.push(`${response.status()} ${response.url()}`);
  });
  page.on("pageerror", (error) => problems.push(`page error: ${error.message}`));
  await page.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (event) => {
      console.error(`CSP violation: ${event.violatedDirective} blocked ${event.blockedURI}`);
    });
  });
  return problems;
}

async function openAndCheck(page: Page, path: string, problems: string[]) {
  const response = await page.goto(path);
  expect(response, path).not.toBeNull();
  const headers = response!.headers();
  const policy = headers["content-security-policy"] ?? "";
  expect(policy, `${path} has a policy`).toContain("script-src 'self' 'nonce-");
  expect(policy).toContain("frame-ancestors 'none'");
  expect(headers["x-content-type-options"]).toBe("nosniff");
  expect(headers["referrer-policy"]).toBe("same-origin");
  expect(headers["permissions-policy"]).toContain("camera=()");
  // Let client components hydrate and run their effects before judging.
  await page.waitForLoadState("networkidle");
  expect(problems, `${path}: no CSP violation or console error`).toEqual([]);
}

test("the public pages pass their policy", async ({ page, submitRequest }) => {
  const problems = await watch(page);
  const rider = uniqueLetters();
  const { statusUrl } = await submitRequest(
    answersLike("r01", { name: `Csp ${rider}`, email: `csp.${rider}@example.test` }),
  );
  for (const path of [
    "/",
    "/request",
    "/sign-in",
    "/my-requests",
    statusUrl,
    "/invite/not-a-real-invitation-token-0000",
  ]) {
    await openAndCheck(page, path, problems);
  }
});

test("the shop's pages pass their policy", async ({ page }) => {
  const problems = await watch(page);
  await signInWithPassword(page, "owner@sagwise.test", "/shop");
  const bike = stableUuid("bike:mx-450-4t");
  const request = stableUuid("request:r09");
  const pages = [
    "/shop",
    `/shop/requests/${request}`,
    "/shop/catalog",
    "/shop/catalog/new",
    `/shop/catalog/${bike}`,
    "/shop/stock",
    "/shop/tools",
    "/shop/emails",
    "/shop/targets",
    "/shop/team",
    "/shop/settings",
  ];
  for (const path of pages) await openAndCheck(page, path, problems);
});

test("API answers carry nosniff and the referrer policy too", async ({ request }) => {
  const response = await request.get("/api/health");
  expect(response.headers()["x-content-type-options"]).toBe("nosniff");
  expect(response.headers()["referrer-policy"]).toBe("same-origin");
});
