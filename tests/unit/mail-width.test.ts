// Every e-mail fits a 320 px wide phone: each template is rendered as it is sent, with long real
// shapes of its links (a 43-character status token, the sheet's download address) and long names,
// loaded in Chromium (playwright-core, Debian's /usr/bin/chromium) in a 320 px wide window, and the
// page's scrollWidth must stay within 320 px. 320 CSS px is the narrowest common phone viewport
// (the width WCAG 2.1 SC 1.4.10 "Reflow" asks content to fit without scrolling sideways).
import { chromium, type Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { emailTemplateNames, emailTemplates } from "@/emails";
import { renderTemplate } from "@/lib/mail";

const TOKEN = "Q2hpcHBlZC1zdGF0dXMtdG9rZW4tZm9yLXRoZS13aWR0aC10";
const BASE = "https://setup.example-suspension-workshop.test";

// The demo props with every link and name at a long, realistic length.
function longProps(name: string): Record<string, unknown> {
  const demo = {
    ...(emailTemplates[name as keyof typeof emailTemplates].demoProps as unknown as Record<string, unknown>),
  };
  for (const key of Object.keys(demo)) {
    if (key === "statusUrl") demo[key] = `${BASE}/status/${TOKEN}`;
    if (key === "sheetUrl")
      demo[key] = `${BASE}/api/requests/0b6f1d0e-8d6a-4c5e-9f61-2a1b3c4d5e6f/sheet?version=12&token=${TOKEN}`;
    if (key === "url")
      demo[key] = `${BASE}/api/auth/magic-link/verify?token=${TOKEN}${TOKEN}&callbackURL=%2Fmy-requests`;
  }
  demo.shopName = "Backcountry Valving and Spring Workshop";
  if ("riderName" in demo) demo.riderName = "Maximiliane Oberkirchner-Vasquez";
  return demo;
}

let browser: Browser;
beforeAll(async () => {
  browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: ["--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking"],
  });
}, 60_000);
afterAll(async () => {
  await browser?.close();
});

describe.each(emailTemplateNames)("e-mail %s at 320 px", (name) => {
  it("has no part wider than the screen", async () => {
    const { html } = await renderTemplate(name, longProps(name) as never);
    const page = await browser.newPage({ viewport: { width: 320, height: 640 } });
    try {
      // Nothing may load from outside (the templates fetch nothing): refuse every request.
      await page.route("**/*", (route) => route.abort());
      await page.setContent(html, { waitUntil: "load" });
      const width = await page.evaluate(() => document.documentElement.scrollWidth);
      expect(width).toBeLessThanOrEqual(320);
      // Every link is a button or a short link: no anchor shows a whole address as its text.
      const bare = await page.evaluate(() =>
        [...document.querySelectorAll("a")].map((a) => a.textContent ?? "").filter((t) => /https?:\/\//.test(t)),
      );
      expect(bare).toEqual([]);
    } finally {
      await page.close();
    }
  });
});

it("the check can fail: a bare long link in a paragraph is wider than 320 px", async () => {
  const page = await browser.newPage({ viewport: { width: 320, height: 640 } });
  try {
    await page.setContent(`<p style="font-size:16px">Report here: ${BASE}/status/${TOKEN}</p>`);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeGreaterThan(320);
  } finally {
    await page.close();
  }
});
